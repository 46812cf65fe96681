import { useField } from 'formik';
import { useId, type InputHTMLAttributes, type ReactNode } from 'react';
import { FieldShell, fieldAria, inputClass } from './field-shell';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name'> {
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  /** A unit shown inside the field's right edge, e.g. "L" or "°C". */
  suffix?: ReactNode;
}

/** A Formik-bound input with its label, hint and inline error. */
export function TextField({ name, label, hint, suffix, className = '', type = 'text', ...rest }: TextFieldProps) {
  const [field, meta] = useField(name);
  const id = useId();
  const error = meta.touched && typeof meta.error === 'string' ? meta.error : null;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} suffix={suffix} className={className}>
      <input
        type={type}
        {...field}
        value={field.value ?? ''}
        {...rest}
        {...fieldAria(id, { invalid: Boolean(error), hint })}
        className={inputClass(Boolean(error), `min-h-touch px-3 py-2 text-base ${suffix ? 'pr-12' : ''}`)}
      />
    </FieldShell>
  );
}
