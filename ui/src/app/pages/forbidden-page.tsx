import { NonIdealState } from '@blueprintjs/core';
import { LockIcon } from '@blueprintjs/icons';
import { LinkButton } from '../../components/link-button';
import { Page } from '../../components/page';
import { useCurrentUser } from '../../lib/current-user';
import { ROLE_LABELS } from '../../lib/roles';
import { paths } from '../paths';

/** Shown in place of a page the signed-in role may not use (the API answers 403 there too). */
export function ForbiddenPage() {
  const user = useCurrentUser();
  return (
    <Page title="Not for your role">
      <NonIdealState
        icon={<LockIcon size={48} />}
        description={
          user
            ? `This screen is not part of what a ${ROLE_LABELS[user.role].toLowerCase()} account can use. If you need it, ask an admin to change your role.`
            : 'This screen needs a different role.'
        }
        action={<LinkButton size="large" intent="primary" to={paths.home} text="Go to your home page" />}
      />
    </Page>
  );
}
