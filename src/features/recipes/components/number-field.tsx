import { useField } from 'formik';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';

interface NumberFieldProps {
  /** Formik field holding the stored value (number, or '' when empty). */
  name: string;
  label: ReactNode;
  /** The unit shown inside the field, e.g. "min", "%", "pH". */
  unit: string;
  hint?: ReactNode;
  className?: string;
  /** Stored → shown, e.g. a fraction shown as a percentage. Identity by default. */
  toShown?: (stored: number) => number;
  shownToStored?: (shown: number) => number;
  /** Decimals kept when re-showing a stored value (typed text is never rounded). */
  decimals?: number;
}

function show(value: unknown, toShown: (v: number) => number, decimals: number) {
  return typeof value === 'number' && Number.isFinite(value) ? String(Number(toShown(value).toFixed(decimals))) : '';
}

const same = (v: number) => v;

/**
 * A number without a unit system behind it (minutes, percentages, pH, extract potential): the
 * counterpart of QuantityField for quantities metric and US brewers write the same way, or that
 * the recipe form converts itself. Keeps the text as typed; the Formik value is a number.
 */
export function NumberField({ name, label, unit, hint, className = '', toShown = same, shownToStored = same, decimals = 4 }: NumberFieldProps) {
  const [field, meta, helpers] = useField<number | ''>(name);
  const id = useId();
  const [text, setText] = useState(() => show(field.value, toShown, decimals));
  const lastSet = useRef<unknown>(field.value);

  // A value set from outside (a reset, "load latest", a suggested rate) is shown afresh.
  useEffect(() => {
    if (!Object.is(field.value, lastSet.current)) {
      lastSet.current = field.value;
      setText(show(field.value, toShown, decimals));
    }
  }, [field.value, toShown, decimals]);

  function onChange(next: string) {
    setText(next);
    const trimmed = next.trim().replace(',', '.');
    const value = trimmed === '' ? '' : Number.isFinite(Number(trimmed)) ? shownToStored(Number(trimmed)) : Number.NaN;
    lastSet.current = value;
    void helpers.setValue(value as number | '');
  }

  const invalid = Boolean(meta.touched && meta.error);
  const error = typeof meta.error === 'string' ? meta.error : undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <div className="relative">
        <input
          id={id}
          name={name}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={text}
          onChange={(e) => onChange(e.target.value)}
          onBlur={field.onBlur}
          aria-invalid={invalid || undefined}
          aria-describedby={invalid ? `${id}-error` : hint ? `${id}-hint` : undefined}
          className={`block min-h-touch w-full rounded-lg border bg-white py-2 pl-3 pr-16 text-base tabular-nums ${invalid ? 'border-alert-500' : 'border-cellar-300'} focus:border-cellar-500`}
        />
        <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm font-semibold text-ink-faint">{unit}</span>
      </div>
      {hint && !invalid && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {invalid && (
        <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-semibold text-alert-700">
          {error}
        </p>
      )}
    </div>
  );
}
