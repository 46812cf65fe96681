import { useField } from 'formik';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { displayDecimals, useUnits, type QuantityKind, type Units } from '@/lib/units';

interface QuantityFieldProps {
  /** Formik field holding the SI value (number, or '' / null when empty). */
  name: string;
  kind: QuantityKind;
  label: ReactNode;
  hint?: ReactNode;
  className?: string;
  /** Bigger text for the numbers a brewer acts on. */
  size?: 'normal' | 'large';
  /** Override the signed-in user's units (e.g. a public page or a test). */
  units?: Units;
  disabled?: boolean;
  placeholder?: string;
}

function shownText(kind: QuantityKind, units: Units, si: unknown): string {
  if (typeof si !== 'number' || !Number.isFinite(si)) return '';
  try {
    // Trim float noise (0.1 + 0.2) without hiding the precision a brewer typed.
    const shown = units.toDisplay(kind, si);
    return String(Number(shown.toFixed(displayDecimals(kind, units) + 2)));
  } catch {
    return '';
  }
}

/**
 * A number input in the user's units whose Formik value is SI. The text the brewer types is kept
 * as typed; only when the value changes from outside (a reset, a unit switch) is it re-shown.
 */
export function QuantityField({ name, kind, label, hint, className = '', size = 'normal', units: unitsOverride, disabled, placeholder }: QuantityFieldProps) {
  const [field, meta, helpers] = useField<number | '' | null>(name);
  const userUnits = useUnits();
  const units = unitsOverride ?? userUnits;
  const id = useId();
  const [text, setText] = useState(() => shownText(kind, units, field.value));
  const [conversionError, setConversionError] = useState<string | null>(null);
  const lastSet = useRef<unknown>(field.value);
  const unitKey = `${units.unitSystem}/${units.gravityUnit}`;
  const lastUnitKey = useRef(unitKey);

  useEffect(() => {
    // Object.is: NaN (text that is not a number yet, such as a lone "-") equals itself here.
    if (!Object.is(field.value, lastSet.current) || unitKey !== lastUnitKey.current) {
      lastSet.current = field.value;
      lastUnitKey.current = unitKey;
      setText(shownText(kind, units, field.value));
      setConversionError(null);
    }
  }, [field.value, unitKey, kind, units]);

  function onChange(next: string) {
    setText(next);
    const trimmed = next.trim().replace(',', '.');
    let value: number | '' = '';
    setConversionError(null);
    if (trimmed !== '') {
      const shown = Number(trimmed);
      if (!Number.isFinite(shown)) {
        value = Number.NaN;
        setConversionError('Enter a number.');
      } else {
        try {
          value = units.fromDisplay(kind, shown);
        } catch (error) {
          value = Number.NaN;
          setConversionError((error as Error).message);
        }
      }
    }
    lastSet.current = value;
    void helpers.setValue(value);
  }

  const error = conversionError ?? (meta.touched ? meta.error : undefined);
  const invalid = Boolean(error) && (meta.touched || Boolean(conversionError));
  const unit = units.unit(kind);
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
          disabled={disabled}
          placeholder={placeholder}
          onChange={(e) => onChange(e.target.value)}
          onBlur={field.onBlur}
          aria-invalid={invalid || undefined}
          aria-describedby={invalid ? `${id}-error` : hint ? `${id}-hint` : undefined}
          className={`block w-full rounded-lg border bg-white py-2 pl-3 pr-16 tabular-nums ${big ? 'min-h-16 text-3xl font-bold' : 'min-h-touch text-base'} ${invalid ? 'border-alert-500' : 'border-cellar-300'} focus:border-cellar-500 disabled:bg-cellar-50`}
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
