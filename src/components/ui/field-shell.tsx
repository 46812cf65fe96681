import type { FocusEvent, ReactNode } from 'react';

/** Ids a field's input must carry so its label, hint and error are read with it. */
export function fieldAria(id: string, { invalid, hint }: { invalid: boolean; hint?: ReactNode }) {
  return {
    id,
    'aria-invalid': invalid || undefined,
    'aria-describedby': invalid ? `${id}-error` : hint ? `${id}-hint` : undefined,
  } as const;
}

export function inputClass(invalid: boolean, extra = '') {
  return `block w-full rounded-lg border bg-white ${invalid ? 'border-alert-500' : 'border-cellar-300'} focus:border-cellar-500 disabled:bg-cellar-50 ${extra}`;
}

interface FieldShellProps {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  /** Shown, and announced, only when present. */
  error?: string | null;
  /** A unit shown inside the input's right edge. */
  suffix?: ReactNode;
  className?: string;
  /** No drawn label: the input names itself with `aria-label` (its row already says what it is for). */
  hideLabel?: boolean;
  children: ReactNode;
}

/** Label above, the input (with an optional unit inside its right edge), then a hint or the error. */
export function FieldShell({ id, label, hint, error, suffix, className = '', hideLabel = false, children }: FieldShellProps) {
  return (
    <div className={className}>
      {!hideLabel && (
        <label htmlFor={id} className="mb-1 block text-sm font-semibold text-ink-soft">
          {label}
        </label>
      )}
      <div className="relative">
        {children}
        {suffix && <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm font-semibold text-ink-faint">{suffix}</span>}
      </div>
      {hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} role="alert" className="mt-1 text-sm font-semibold text-alert-700">
          {error}
        </p>
      )}
    </div>
  );
}

interface DecimalInputProps {
  /** The shell's id: the label, hint and error are wired to it. */
  id: string;
  name: string;
  text: string;
  onText: (text: string) => void;
  onBlur: (event: FocusEvent<HTMLInputElement>) => void;
  error: string | null;
  hint?: ReactNode;
  placeholder?: string;
  disabled?: boolean;
  size?: 'normal' | 'large';
  /** A unit is drawn inside the right edge: the text keeps clear of it. */
  withUnit: boolean;
}

/**
 * The text box of every number field (NumberField, QuantityField, the late-boil check's own): a
 * decimal keyboard on phones, no autofill, read with its label and message, big for a reading.
 */
export function DecimalInput({ id, name, text, onText, onBlur, error, hint, placeholder, disabled, size = 'normal', withUnit }: DecimalInputProps) {
  return (
    <input
      name={name}
      type="text"
      inputMode="decimal"
      autoComplete="off"
      value={text}
      placeholder={placeholder}
      disabled={disabled}
      onChange={(e) => onText(e.target.value)}
      onBlur={onBlur}
      {...fieldAria(id, { invalid: Boolean(error), hint })}
      // Laid out on its own (size and layout contained), so a keystroke does not lay out the page
      // around it again; its height is therefore set, never taken from the text: one line and the
      // padding, at least a touch target, whatever the font size.
      className={inputClass(
        Boolean(error),
        `relative [contain:size_layout] py-2 pl-3 ${withUnit ? 'pr-16' : 'pr-3'} tabular-nums ${size === 'large' ? 'min-h-[max(4rem,calc(3.25rem+2px))] text-3xl font-bold' : 'min-h-[max(44px,calc(2.5rem+2px))] text-base'}`,
      )}
    />
  );
}
