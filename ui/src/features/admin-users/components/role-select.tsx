import { HTMLSelect } from '@blueprintjs/core';
import { ROLES, type Role } from '@fuelwright/shared';
import { ROLE_OPTIONS } from '../../../lib/roles';

export function RoleSelect({
  id,
  value,
  disabled,
  onChange,
  label,
}: {
  id: string;
  value: Role;
  disabled?: boolean;
  onChange: (role: Role) => void;
  label: string;
}) {
  return (
    <HTMLSelect
      id={id}
      className="fw-role-select"
      large
      value={value}
      disabled={disabled}
      aria-label={label}
      options={ROLE_OPTIONS}
      onChange={(event) => {
        const next = event.currentTarget.value as Role;
        if (ROLES.includes(next) && next !== value) onChange(next);
      }}
    />
  );
}
