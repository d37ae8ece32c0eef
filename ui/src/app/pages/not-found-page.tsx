import { NonIdealState } from '@blueprintjs/core';
import { MapMarkerIcon } from '@blueprintjs/icons';
import { useLocation } from 'react-router-dom';
import { LinkButton } from '../../components/link-button';
import { Page } from '../../components/page';
import { useCurrentUser } from '../../lib/current-user';
import { paths } from '../paths';

export function NotFoundPage() {
  const location = useLocation();
  const user = useCurrentUser();
  return (
    <Page title="Page not found">
      <NonIdealState
        icon={<MapMarkerIcon size={48} />}
        description={
          <>
            There is no page at <code className="fw-break">{location.pathname}</code>. The link may be old or mistyped.
          </>
        }
        action={
          <LinkButton
            size="large"
            intent="primary"
            to={user ? paths.home : paths.landing}
            text={user ? 'Go to your home page' : 'Go to the start page'}
          />
        }
      />
    </Page>
  );
}
