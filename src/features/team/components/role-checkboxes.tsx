import { ROLES, ROLE_LABELS, type Role } from '@shared/roles';
import { Checkbox, CheckboxGroup } from '../../../components/ui/checkbox';

interface RoleCheckboxesProps {
  value: Role[];
  onChange: (roles: Role[]) => void;
  error?: string;
  legend?: string;
  /** The roles offered, in the order shown; alert rules leave out viewers. */
  roles?: readonly Role[];
}

export function RoleCheckboxes({ value, onChange, error, legend = 'Roles', roles = ROLES }: RoleCheckboxesProps) {
  function toggle(role: Role, checked: boolean) {
    // Keep the table's order whatever order they were ticked in.
    onChange(roles.filter((each) => (each === role ? checked : value.includes(each))));
  }
  return (
    <CheckboxGroup legend={legend} error={error}>
      {roles.map((role) => (
        <Checkbox
          key={role}
          label={ROLE_LABELS[role]}
          checked={value.includes(role)}
          onChange={(event) => toggle(role, event.target.checked)}
        />
      ))}
    </CheckboxGroup>
  );
}
