import { useField } from 'formik';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { parseDecimal } from '@/lib/decimal';
import { DecimalInput, FieldShell } from './field-shell';

interface NumberFieldProps {
  /** Formik field holding a number ('' when empty, NaN while the text is not a number). */
  name: string;
  label: ReactNode;
  /** Shown inside the field's right edge: "°Bx", "min", "%", "pH". */
  unit?: string;
  hint?: ReactNode;
  /** Shown value = stored value × scale (e.g. 100 to show a fraction as %). */
  scale?: number;
  /** Stored → shown and back, for conversions a scale cannot express; they override `scale`. */
  toShown?: (stored: number) => number;
  shownToStored?: (shown: number) => number;
  /** Decimals kept when re-showing a stored value (typed text is never rounded). */
  decimals?: number;
  size?: 'normal' | 'large';
  className?: string;
  placeholder?: string;
  disabled?: boolean;
}

/**
 * A number without a unit system behind it (°Brix, minutes, percentages, pH, a correction
 * factor), the counterpart of QuantityField. Keeps the text as typed; the Formik value is a
 * number. Its error shows as soon as the value is wrong, not only after blur: beside a kettle the
 * brewer should not have to leave the field to learn a number is impossible.
 */
export function NumberField({ name, label, unit, hint, scale = 1, toShown, shownToStored, decimals = 6, size = 'normal', className = '', placeholder, disabled }: NumberFieldProps) {
  const [field, meta, helpers] = useField<number | '' | null>(name);
  const id = useId();
  const show = (value: unknown) =>
    typeof value === 'number' && Number.isFinite(value) ? String(Number((toShown ? toShown(value) : value * scale).toFixed(decimals))) : '';
  const [text, setText] = useState(() => show(field.value));
  const lastSet = useRef<unknown>(field.value);

  // A value set from outside (a reset, "load latest", a suggested figure) is shown afresh.
  useEffect(() => {
    if (!Object.is(field.value, lastSet.current)) {
      lastSet.current = field.value;
      setText(show(field.value));
    }
    // `show` depends only on these props.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [field.value, scale, toShown, decimals]);

  function onChange(next: string) {
    setText(next);
    const shown = parseDecimal(next);
    const value = shown === undefined ? '' : Number.isNaN(shown) ? Number.NaN : shownToStored ? shownToStored(shown) : shown / scale;
    lastSet.current = value;
    void helpers.setValue(value);
  }

  const error = meta.touched && typeof meta.error === 'string' ? meta.error : null;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} suffix={unit} className={className}>
      <DecimalInput
        id={id}
        name={name}
        text={text}
        onText={onChange}
        onBlur={field.onBlur}
        error={error}
        hint={hint}
        placeholder={placeholder}
        disabled={disabled}
        size={size}
        withUnit={Boolean(unit)}
      />
    </FieldShell>
  );
}
