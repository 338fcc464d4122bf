import type { Role } from '@/shared/api/groups';
import { Choice } from './Choice';

/** A choice among the roles the current user may give. */
export function RolePicker({ value, options, onChange, label }: {
  value: Role;
  options: readonly Role[];
  onChange: (role: Role) => void;
  label: string;
}) {
  return <Choice label={label} options={options.map((role) => ({ value: role, label: role }))} value={value} onChange={onChange} />;
}
