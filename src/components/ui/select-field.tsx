import { useField } from 'formik';
import { useId, type ReactNode, type SelectHTMLAttributes } from 'react';
import { FieldShell, fieldAria, inputClass } from './field-shell';

type SelectProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'children'> & {
  hint?: ReactNode;
  /** Shown, and announced, only when present. */
  error?: string | null;
  /** The `<option>`s. */
  children: ReactNode;
  /** Classes of the wrapper (label, select, hint). */
  className?: string;
} & (
    | { label: ReactNode; hideLabel?: false }
    /** Not drawn, only read out (`aria-label`): the row already says what the choice is for. */
    | { label: string; hideLabel: true }
  );

/**
 * A labelled choice among a few options, for use outside a form or under its own state: the
 * label, hint and error are wired to the select as in every other field (FieldShell).
 */
export function Select({ id: givenId, label, hint, error = null, hideLabel, className = '', children, ...rest }: SelectProps) {
  const generated = useId();
  const id = givenId ?? generated;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} hideLabel={hideLabel} className={className}>
      <select
        {...rest}
        aria-label={hideLabel ? (label as string) : undefined}
        {...fieldAria(id, { invalid: Boolean(error), hint })}
        className={inputClass(Boolean(error), 'min-h-touch px-3 py-2 text-base')}
      >
        {children}
      </select>
    </FieldShell>
  );
}

type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'children' | 'name' | 'value'> & {
  /** The Formik field holding the chosen option's value (a string). */
  name: string;
  label: ReactNode;
  hint?: ReactNode;
  children: ReactNode;
  className?: string;
};

/**
 * The same select bound to a Formik field. Its error shows once the field was touched (a submit
 * touches every field); an `onChange` of its own replaces Formik's and sets the value itself.
 */
export function SelectField({ name, onChange, onBlur, ...rest }: SelectFieldProps) {
  const [field, meta] = useField<string>(name);
  const error = meta.touched && typeof meta.error === 'string' ? meta.error : null;
  return <Select {...rest} name={name} value={field.value ?? ''} onChange={onChange ?? field.onChange} onBlur={onBlur ?? field.onBlur} error={error} />;
}
