import { useField } from 'formik';
import { useId, type SelectHTMLAttributes } from 'react';
import { clubRoleSchema, type ClubRole } from '@shared/schemas/clubs';
import { roleLabels } from './role-words';

const selectClass = 'block min-h-touch w-full rounded-lg border border-cellar-300 bg-white px-3 py-2 text-base focus:border-cellar-500';

/** A plain select of the three club roles, for use outside a form (changes apply at once). */
export function RoleSelect({ value, onChange, label, ...rest }: Omit<SelectHTMLAttributes<HTMLSelectElement>, 'onChange' | 'value'> & { value: ClubRole; onChange: (role: ClubRole) => void; label: string }) {
  return (
    <select aria-label={label} value={value} onChange={(e) => onChange(e.target.value as ClubRole)} className={selectClass} {...rest}>
      {clubRoleSchema.options.map((r) => (
        <option key={r} value={r}>
          {roleLabels[r]}
        </option>
      ))}
    </select>
  );
}

/** The same select bound to a Formik field. */
export function RoleField({ name, label }: { name: string; label: string }) {
  const [field, meta] = useField<ClubRole>(name);
  const id = useId();
  return (
    <div>
      <label htmlFor={id} className="mb-1 block text-sm font-semibold text-ink-soft">
        {label}
      </label>
      <select id={id} {...field} className={selectClass}>
        {clubRoleSchema.options.map((r) => (
          <option key={r} value={r}>
            {roleLabels[r]}
          </option>
        ))}
      </select>
      {meta.touched && meta.error && (
        <p role="alert" className="mt-1 text-sm font-semibold text-alert-700">
          {meta.error}
        </p>
      )}
    </div>
  );
}
