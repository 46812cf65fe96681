import { useField } from 'formik';
import { useId, type ReactNode, type SelectHTMLAttributes } from 'react';
import { FieldShell, fieldAria, inputClass } from './field-shell';

interface SelectProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'children'> {
  label: ReactNode;
  hint?: ReactNode;
  /** Shown, and announced, only when present. */
  error?: string | null;
  /** The label is read out but not drawn (a row that already says what the choice is for). */
  hideLabel?: boolean;
  /** The `<option>`s. */
  children: ReactNode;
  /** Classes of the wrapper (label, select, hint). */
  className?: string;
}

/**
 * A labelled choice among a few options, for use outside a form or under its own state: the
 * label, hint and error are wired to the select as in every other field (FieldShell).
 */
export function Select({ id: givenId, label, hint, error = null, hideLabel, className = '', children, ...rest }: SelectProps) {
  const generated = useId();
  const id = givenId ?? generated;
  return (
    <FieldShell id={id} label={label} hint={hint} error={error} hideLabel={hideLabel} className={className}>
      <select {...rest} {...fieldAria(id, { invalid: Boolean(error), hint })} className={inputClass(Boolean(error), 'min-h-touch px-3 py-2 text-base')}>
        {children}
      </select>
    </FieldShell>
  );
}

interface SelectFieldProps extends Omit<SelectProps, 'name' | 'value' | 'error'> {
  /** The Formik field holding the chosen option's value (a string). */
  name: string;
}

/**
 * The same select bound to a Formik field. Its error shows once the field was touched (a submit
 * touches every field); an `onChange` of its own replaces Formik's and sets the value itself.
 */
export function SelectField({ name, onChange, onBlur, ...rest }: SelectFieldProps) {
  const [field, meta] = useField<string>(name);
  const error = meta.touched && typeof meta.error === 'string' ? meta.error : null;
  return <Select {...rest} name={name} value={field.value ?? ''} onChange={onChange ?? field.onChange} onBlur={onBlur ?? field.onBlur} error={error} />;
}
