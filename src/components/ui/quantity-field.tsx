import { useField } from 'formik';
import { useEffect, useId, useRef, useState, type ReactNode } from 'react';
import { parseDecimal } from '@/lib/decimal';
import { displayDecimals, useUnits, type QuantityKind, type Units } from '@/lib/units';
import { DecimalInput, FieldShell } from './field-shell';

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
    // One digit beyond what the unit is read to: 26 L shows as 6.869 gal, not 6.868548. The
    // stored value is untouched until the brewer types.
    const shown = units.toDisplay(kind, si);
    return String(Number(shown.toFixed(displayDecimals(kind, units) + 1)));
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
  const unitKey = `${units.unitSystem}/${units.gravityUnit}/${units.gallonUnit ?? 'us'}`;
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
    const shown = parseDecimal(next);
    let value: number | '' = '';
    setConversionError(null);
    if (shown !== undefined) {
      if (Number.isNaN(shown)) {
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

  const fieldError = meta.touched && typeof meta.error === 'string' ? meta.error : null;
  const error = conversionError ?? fieldError;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} suffix={units.unit(kind)} className={className}>
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
        withUnit
      />
    </FieldShell>
  );
}
