import { useEffect } from 'react';
import { ProgressBar } from '@blueprintjs/core';
import { Outlet, useMatches, useNavigation } from 'react-router-dom';
import { useMe } from '../../features/auth/api/get-me';
import { CurrentUserProvider } from '../../lib/current-user';
import type { RouteHandle } from '../routes';
import { AppNavbar } from './app-navbar';

export const APP_NAME = 'Fuelwright';

/** The browser tab shows the deepest route's title. */
function useDocumentTitle() {
  const matches = useMatches();
  const title = [...matches].reverse().find((match) => (match.handle as RouteHandle | undefined)?.title)?.handle as
    | RouteHandle
    | undefined;
  useEffect(() => {
    document.title = title ? `${title.title} · ${APP_NAME}` : APP_NAME;
  }, [title]);
}

/** Navbar on top, the page below; the signed-in user is provided to every page. */
export function AppShell() {
  const me = useMe();
  const user = me.data ?? null;
  const navigation = useNavigation();
  useDocumentTitle();

  return (
    <CurrentUserProvider user={user}>
      <div className="fw-app">
        <a className="fw-skip-link" href="#main">
          Skip to content
        </a>
        <AppNavbar user={user} sessionPending={me.isPending} />
        <div className="fw-route-progress" aria-hidden={navigation.state === 'idle'}>
          {navigation.state !== 'idle' && <ProgressBar intent="primary" />}
        </div>
        <main id="main" className="fw-main" tabIndex={-1}>
          <Outlet />
        </main>
      </div>
    </CurrentUserProvider>
  );
}
