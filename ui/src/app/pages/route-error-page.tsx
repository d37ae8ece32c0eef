import { Button, NonIdealState } from '@blueprintjs/core';
import { ErrorIcon } from '@blueprintjs/icons';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Page } from '../../components/page';

/**
 * Last line of defence for errors while loading or rendering a route, most often a page chunk
 * that failed to download (the app was updated, or the connection dropped).
 */
export function RouteErrorPage() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <Page title="This page could not be shown">
      <NonIdealState
        icon={<ErrorIcon size={48} />}
        description={
          <>
            <p>Reload to try again. If the app was just updated, a reload fetches the new version.</p>
            <p className="fw-muted fw-break">{detail}</p>
          </>
        }
        action={<Button size="large" intent="primary" text="Reload" onClick={() => window.location.reload()} />}
      />
    </Page>
  );
}
