/**
 * The late-boil check's number inputs: the same markup, labels and messages as the shared
 * NumberField and QuantityField, but controlled by the check's own state instead of Formik, and
 * memoised, so a keystroke renders only the field typed in (issue 14: typing speed).
 */
import { memo, useId, useState, type ReactNode } from 'react';
import { DecimalInput, FieldShell } from '@/components/ui/field-shell';
import { displayDecimals, type QuantityKind, type Units } from '@/lib/units';
import { parseDecimal } from '@/lib/decimal';
import type { NumberValue } from './form-values';

export type SetValue = (name: string, value: NumberValue) => void;
export type Touch = (name: string) => void;

interface CommonProps {
  name: string;
  value: NumberValue;
  /** Shown, and announced, when present: the parent passes it only once the field is touched. */
  error?: string;
  onValue: SetValue;
  onTouch: Touch;
  label: ReactNode;
  hint?: ReactNode;
  size?: 'normal' | 'large';
  placeholder?: string;
}

/** The text typed, or the stored value re-shown when it was changed from outside (a unit switch). */
function useShownText(value: NumberValue, show: (value: NumberValue) => string, showKey: string) {
  const [state, setState] = useState(() => ({ text: show(value), value, showKey }));
  if (!Object.is(state.value, value) || state.showKey !== showKey) {
    const next = { text: show(value), value, showKey };
    setState(next);
    return [next.text, setState] as const;
  }
  return [state.text, setState] as const;
}

const parseTyped = (text: string) => parseDecimal(text) ?? null;

/** A number without a unit system behind it (°Brix, minutes, a percentage, a correction factor). */
export const CheckNumberField = memo(function CheckNumberField({
  name,
  value,
  error,
  onValue,
  onTouch,
  label,
  hint,
  size = 'normal',
  placeholder,
  unit,
  scale = 1,
}: CommonProps & { unit?: string; scale?: number }) {
  const id = useId();
  const show = (v: NumberValue) => (typeof v === 'number' && Number.isFinite(v) ? String(Number((v * scale).toFixed(6))) : '');
  const [text, setState] = useShownText(value, show, String(scale));
  function onChange(next: string) {
    const shown = parseTyped(next);
    const stored: NumberValue = shown === null ? '' : !Number.isFinite(shown) ? Number.NaN : shown / scale;
    setState({ text: next, value: stored, showKey: String(scale) });
    onValue(name, stored);
  }
  const shownError = error ?? null;
  return (
    <FieldShell id={id} label={label} hint={hint} error={shownError} suffix={unit}>
      <DecimalInput id={id} name={name} text={text} onText={onChange} onBlur={() => onTouch(name)} error={shownError} hint={hint} placeholder={placeholder} size={size} withUnit={Boolean(unit)} />
    </FieldShell>
  );
});

function shownQuantity(kind: QuantityKind, units: Units, si: NumberValue): string {
  if (typeof si !== 'number' || !Number.isFinite(si)) return '';
  try {
    // One digit beyond what the unit is read to, as QuantityField shows it.
    return String(Number(units.toDisplay(kind, si).toFixed(displayDecimals(kind, units) + 1)));
  } catch {
    return '';
  }
}

/** A number in the brewer's units whose value is SI, as QuantityField. */
export const CheckQuantityField = memo(function CheckQuantityField({ name, value, error, onValue, onTouch, label, hint, size = 'normal', placeholder, kind, units }: CommonProps & { kind: QuantityKind; units: Units }) {
  const id = useId();
  const unitKey = `${units.unitSystem}/${units.gravityUnit}/${units.gallonUnit ?? 'us'}`;
  const [text, setState] = useShownText(value, (v) => shownQuantity(kind, units, v), unitKey);
  const [conversion, setConversion] = useState<{ text: string; error: string } | null>(null);
  function onChange(next: string) {
    const shown = parseTyped(next);
    let stored: NumberValue = '';
    let conversionError: string | null = null;
    if (shown !== null) {
      if (!Number.isFinite(shown)) {
        stored = Number.NaN;
        conversionError = 'Enter a number.';
      } else {
        try {
          stored = units.fromDisplay(kind, shown);
        } catch (e) {
          stored = Number.NaN;
          conversionError = (e as Error).message;
        }
      }
    }
    setState({ text: next, value: stored, showKey: unitKey });
    setConversion(conversionError ? { text: next, error: conversionError } : null);
    onValue(name, stored);
  }
  // A conversion message belongs to the text it was about; a value set from outside clears it.
  const shownError = (conversion && conversion.text === text ? conversion.error : null) ?? error ?? null;
  return (
    <FieldShell id={id} label={label} hint={hint} error={shownError} suffix={units.unit(kind)}>
      <DecimalInput id={id} name={name} text={text} onText={onChange} onBlur={() => onTouch(name)} error={shownError} hint={hint} placeholder={placeholder} size={size} withUnit />
    </FieldShell>
  );
});
