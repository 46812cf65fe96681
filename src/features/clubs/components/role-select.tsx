import type { SelectHTMLAttributes } from 'react';
import { clubRoleSchema, type ClubRole } from '@shared/schemas/clubs';
import { Select, SelectField } from '@/components/ui/select-field';
import { roleLabels } from './role-words';

const roleOptions = clubRoleSchema.options.map((r) => (
  <option key={r} value={r}>
    {roleLabels[r]}
  </option>
));

/** A select of the three club roles, for use outside a form (changes apply at once); its row names the member, so the label is read out only. */
export function RoleSelect({ value, onChange, label, ...rest }: Omit<SelectHTMLAttributes<HTMLSelectElement>, 'onChange' | 'value' | 'children'> & { value: ClubRole; onChange: (role: ClubRole) => void; label: string }) {
  return (
    <Select {...rest} label={label} hideLabel value={value} onChange={(e) => onChange(e.target.value as ClubRole)}>
      {roleOptions}
    </Select>
  );
}

/** The same select bound to a Formik field. */
export function RoleField({ name, label }: { name: string; label: string }) {
  return (
    <SelectField name={name} label={label}>
      {roleOptions}
    </SelectField>
  );
}
