import type { QueryClient } from '@tanstack/react-query';
import { replaceSession } from '../features/auth/api/get-me';
import { setUnauthorizedHandler } from '../lib/api-client';
import { paths, signInPath } from './paths';

/** The part of a data router the handler needs (real or memory router). */
export interface NavigatingRouter {
  state: { location: { pathname: string; search: string; hash: string } };
  navigate: (to: string, options?: { replace?: boolean }) => unknown;
}

/**
 * When an API call answers 401 (the session expired or was revoked), forget the session and every
 * cached answer, and go to sign-in with the current page as the return target.
 */
export function installSessionExpiry(queryClient: QueryClient, router: NavigatingRouter): () => void {
  return setUnauthorizedHandler(() => {
    const { pathname, search, hash } = router.state.location;
    replaceSession(queryClient, null);
    if (pathname === paths.signIn) return;
    void router.navigate(signInPath(pathname + search + hash), { replace: true });
  });
}
