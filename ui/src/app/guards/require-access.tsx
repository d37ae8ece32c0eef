import { Button, NonIdealState } from '@blueprintjs/core';
import { OfflineIcon } from '@blueprintjs/icons';
import { Navigate, Outlet, useLocation, useNavigation, useSearchParams } from 'react-router-dom';
import { useMe } from '../../features/auth/api/get-me';
import { useSigningOut } from '../../features/auth/api/sign-out';
import { PageSpinner } from '../../components/page-spinner';
import { decideAccess, type Access } from '../access';
import { ForbiddenPage } from '../pages/forbidden-page';
import { NEXT_PARAM, paths, safeNextPath, signInPath } from '../paths';

/**
 * Wraps every route (see router.tsx): waits for the session check, then shows the page, sends a
 * visitor to sign-in (remembering the page), sends a signed-in user away from sign-in/sign-up, or
 * shows "not for your role".
 */
export function RequireAccess({ access }: { access: Access }) {
  const me = useMe();
  const location = useLocation();
  const [searchParams] = useSearchParams();
  const signingOut = useSigningOut();
  // While another navigation is under way (sign-out going to the start page, an expired session
  // going to sign-in) this page is on its way out: redirecting from it would race that navigation.
  const leaving = useNavigation().state !== 'idle';

  if (access === 'anyone') return <Outlet />;

  if (me.data === undefined) {
    if (me.isError) {
      return (
        <NonIdealState
          icon={<OfflineIcon size={48} />}
          title="Cannot check your sign-in"
          description={me.error.message}
          action={
            <Button size="large" intent="primary" text="Try again" loading={me.isFetching} onClick={() => void me.refetch()} />
          }
        />
      );
    }
    return <PageSpinner label="Checking your sign-in" />;
  }

  switch (decideAccess(access, me.data)) {
    case 'allow':
      return <Outlet />;
    case 'sign-in':
      // Signing out on purpose: the sign-out handler is taking the user elsewhere.
      if (signingOut) return <PageSpinner label="Signing out" />;
      if (leaving) return <PageSpinner />;
      return <Navigate to={signInPath(location.pathname + location.search + location.hash)} replace />;
    case 'home':
      if (leaving) return <PageSpinner />;
      return <Navigate to={safeNextPath(searchParams.get(NEXT_PARAM)) ?? paths.home} replace />;
    case 'forbidden':
      return <ForbiddenPage />;
  }
}
