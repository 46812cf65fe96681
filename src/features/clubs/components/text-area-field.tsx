import { useField } from 'formik';
import { useId, type ReactNode, type TextareaHTMLAttributes } from 'react';

/** A Formik-bound multi-line field with its label, hint and inline error. */
export function TextAreaField({ name, label, hint, rows = 3, ...rest }: Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'name'> & { name: string; label: ReactNode; hint?: ReactNode }) {
  const [field, meta] = useField(name);
  const id = useId();
  const invalid = Boolean(meta.touched && meta.error);
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <textarea
        id={id}
        rows={rows}
        {...field}
        value={field.value ?? ''}
        {...rest}
        aria-invalid={invalid || undefined}
        aria-describedby={invalid ? `${id}-error` : hint ? `${id}-hint` : undefined}
        className={`block min-h-touch w-full rounded-lg border bg-white px-3 py-2 text-base ${invalid ? 'border-alert-500' : 'border-cellar-300'} focus:border-cellar-500`}
      />
      {hint && !invalid && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {invalid && (
        <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-semibold text-alert-700">
          {meta.error}
        </p>
      )}
    </div>
  );
}
