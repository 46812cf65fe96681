import { useField } from 'formik';
import { useId, type ReactNode, type TextareaHTMLAttributes } from 'react';
import { FieldShell, fieldAria, inputClass } from './field-shell';

/** A Formik-bound multi-line field with its label, hint and inline error. */
export function TextAreaField({ name, label, hint, rows = 3, className = '', ...rest }: Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'name'> & { name: string; label: ReactNode; hint?: ReactNode }) {
  const [field, meta] = useField(name);
  const id = useId();
  const error = meta.touched && typeof meta.error === 'string' ? meta.error : null;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} className={className}>
      <textarea rows={rows} {...field} value={field.value ?? ''} {...rest} {...fieldAria(id, { invalid: Boolean(error), hint })} className={inputClass(Boolean(error), 'min-h-touch px-3 py-2 text-base')} />
    </FieldShell>
  );
}
