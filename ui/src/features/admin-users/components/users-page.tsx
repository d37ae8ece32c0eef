import { useState } from 'react';
import { Button, HTMLTable, NonIdealState, Spinner, Tag } from '@blueprintjs/core';
import { ErrorIcon } from '@blueprintjs/icons';
import type { Role, UserDto } from '@fuelwright/shared';
import { Page } from '../../../components/page';
import { useNotify } from '../../../components/toaster';
import { useRequiredUser } from '../../../lib/current-user';
import { useChangeUserRole } from '../api/change-user-role';
import { useUsers } from '../api/get-users';
import { ROLE_LABELS } from '../../../lib/roles';
import { RoleSelect } from './role-select';

const dateFormat = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium' });

function UserRow({
  user,
  isSelf,
  saving,
  onChangeRole,
}: {
  user: UserDto;
  isSelf: boolean;
  saving: boolean;
  onChangeRole: (user: UserDto, role: Role) => void;
}) {
  const since = new Date(user.createdAt);
  return (
    <tr>
      <td>
        <div className="fw-user-cell">
          <strong className="fw-break-word">
            {user.displayName}
            {isSelf && (
              <Tag minimal round className="fw-inline-tag">
                you
              </Tag>
            )}
          </strong>
          <span className="fw-muted fw-break-word">{user.email}</span>
        </div>
      </td>
      <td className="fw-hide-on-phone">{Number.isNaN(since.getTime()) ? '' : dateFormat.format(since)}</td>
      <td>
        <div className="fw-role-cell">
          <RoleSelect
            id={`role-${user.id}`}
            label={`Role of ${user.displayName}`}
            value={user.role}
            disabled={isSelf || saving}
            onChange={(role) => onChangeRole(user, role)}
          />
          {saving && <Spinner size={16} aria-label="Saving" />}
        </div>
        {isSelf && <div className="fw-muted fw-small fw-role-note">Only another admin can change your role.</div>}
      </td>
    </tr>
  );
}

/** Admin: every account with its role; changing the select saves at once. */
export function UsersPage() {
  const me = useRequiredUser();
  const users = useUsers();
  const changeRole = useChangeUserRole();
  const notify = useNotify();
  const [saving, setSaving] = useState<ReadonlySet<string>>(new Set());
  const markSaving = (id: string, on: boolean) =>
    setSaving((current) => {
      const next = new Set(current);
      if (on) next.add(id);
      else next.delete(id);
      return next;
    });

  const onChangeRole = (user: UserDto, role: Role) => {
    markSaving(user.id, true);
    changeRole.mutate(
      { userId: user.id, role },
      {
        onSuccess: (changed) => notify.success(`${changed.displayName} is now ${ROLE_LABELS[changed.role].toLowerCase()}.`),
        onError: (error) => notify.error(`Role of ${user.displayName} not changed: ${error.message}`),
        onSettled: () => markSaving(user.id, false),
      },
    );
  };

  return (
    <Page title="Users" lead="Every account and its role. A change is saved as soon as you pick it.">
      {users.isPending ? (
        <Spinner aria-label="Loading users" />
      ) : users.isError ? (
        <NonIdealState
          icon={<ErrorIcon size={48} />}
          title="Users could not be loaded"
          description={users.error.message}
          action={<Button size="large" text="Try again" onClick={() => void users.refetch()} />}
        />
      ) : (
        <HTMLTable className="fw-users-table" striped>
          <thead>
            <tr>
              <th scope="col">Name and e-mail</th>
              <th scope="col" className="fw-hide-on-phone">
                Since
              </th>
              <th scope="col" className="fw-role-col">
                Role
              </th>
            </tr>
          </thead>
          <tbody>
            {users.data.map((user) => (
              <UserRow
                key={user.id}
                user={user}
                isSelf={user.id === me.id}
                saving={saving.has(user.id)}
                onChangeRole={onChangeRole}
              />
            ))}
          </tbody>
        </HTMLTable>
      )}
    </Page>
  );
}
