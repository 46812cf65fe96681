import { useField } from 'formik';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';

interface NumberFieldProps {
  /** Formik field holding a number ('' when empty, NaN while the text is not a number). */
  name: string;
  label: ReactNode;
  /** Shown inside the field's right edge: "°Bx", "min", "%". */
  unit?: string;
  hint?: ReactNode;
  /** Shown value = stored value × scale (e.g. 100 to show a fraction as %). */
  scale?: number;
  size?: 'normal' | 'large';
  className?: string;
  placeholder?: string;
}

function shown(value: unknown, scale: number): string {
  return typeof value === 'number' && Number.isFinite(value) ? String(Number((value * scale).toFixed(6))) : '';
}

/**
 * A plain number input for quantities with no unit system (°Brix, pH, minutes),
 * keeping the text as typed. Its error shows as soon as the value is wrong, not only after blur:
 * beside a kettle, the brewer should not have to leave the field to learn a number is impossible.
 */
export function NumberField({ name, label, unit, hint, scale = 1, size = 'normal', className = '', placeholder }: NumberFieldProps) {
  const [field, meta, helpers] = useField<number | '' | null>(name);
  const id = useId();
  const [text, setText] = useState(() => shown(field.value, scale));
  const lastSet = useRef<unknown>(field.value);

  useEffect(() => {
    if (!Object.is(field.value, lastSet.current)) {
      lastSet.current = field.value;
      setText(shown(field.value, scale));
    }
  }, [field.value, scale]);

  function onChange(next: string) {
    setText(next);
    const trimmed = next.trim().replace(',', '.');
    const value = trimmed === '' ? '' : Number(trimmed) / scale;
    lastSet.current = value;
    void helpers.setValue(value);
  }

  const invalid = Boolean(meta.touched && meta.error);
  const big = size === 'large';
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
          placeholder={placeholder}
          onChange={(e) => onChange(e.target.value)}
          onBlur={field.onBlur}
          aria-invalid={invalid || undefined}
          aria-describedby={invalid ? `${id}-error` : hint ? `${id}-hint` : undefined}
          className={`block w-full rounded-lg border bg-white py-2 pl-3 ${unit ? 'pr-16' : 'pr-3'} tabular-nums ${big ? 'min-h-16 text-3xl font-bold' : 'min-h-touch text-base'} ${invalid ? 'border-alert-500' : 'border-cellar-300'} focus:border-cellar-500`}
        />
        {unit && <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm font-semibold text-ink-faint">{unit}</span>}
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
