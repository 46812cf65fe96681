import { useField } from 'formik';
import { useId, type InputHTMLAttributes, type ReactNode } from 'react';

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
  const invalid = Boolean(meta.touched && meta.error);
  const describedBy = [hint ? `${id}-hint` : null, invalid ? `${id}-error` : null].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <div className="relative">
        <input
          id={id}
          type={type}
          {...field}
          value={field.value ?? ''}
          {...rest}
          aria-invalid={invalid || undefined}
          aria-describedby={describedBy}
          className={`block min-h-touch w-full rounded-lg border bg-white px-3 py-2 text-base ${suffix ? 'pr-12' : ''} ${invalid ? 'border-alert-500' : 'border-cellar-300'} focus:border-cellar-500`}
        />
        {suffix && <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm text-ink-faint">{suffix}</span>}
      </div>
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
