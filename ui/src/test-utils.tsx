import { render } from '@testing-library/react';
import { RouterProvider } from 'react-router-dom';
import { vi } from 'vitest';
import type { Role, UserDto } from '@fuelwright/shared';
import { AppProviders } from './app/providers';
import { createTestRouter } from './app/router';
import { installSessionExpiry } from './app/session-expiry';
import { createQueryClient } from './lib/query-client';
import type { Theme } from './lib/theme';

export function makeUser(role: Role, overrides: Partial<UserDto> = {}): UserDto {
  return {
    id: `user-${role}`,
    email: `${role}@example.test`,
    displayName: `Test ${role}`,
    role,
    emailVerified: true,
    createdAt: '2026-01-15T10:00:00.000Z',
    ...overrides,
  };
}

export type ApiReply = { status: number; body?: unknown };
/** Key "METHOD /path" (path without the /api prefix) to a reply or a function of the request. */
export type ApiRoutes = Record<string, ApiReply | ((init: RequestInit) => ApiReply)>;

export interface ApiCall {
  method: string;
  path: string;
  init: RequestInit;
}

/** Replaces fetch with a fake API; unknown routes answer 404. Returns the list of calls made. */
export function mockApi(routes: ApiRoutes): ApiCall[] {
  const calls: ApiCall[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
      const url = typeof input === 'string' ? input : input instanceof URL ? input.pathname : input.url;
      const path = url.replace(/^\/api/, '');
      const method = (init.method ?? 'GET').toUpperCase();
      calls.push({ method, path, init });
      const route = routes[`${method} ${path}`];
      const reply = typeof route === 'function' ? route(init) : (route ?? { status: 404, body: { statusCode: 404, error: 'Not Found', message: 'No route' } });
      return new Response(reply.body === undefined ? null : JSON.stringify(reply.body), {
        status: reply.status,
        headers: { 'Content-Type': 'application/json' },
      });
    }),
  );
  return calls;
}

/** The session answer for GET /auth/me: a user, or 401 for a visitor. */
export function meReply(user: UserDto | null): ApiReply {
  return user
    ? { status: 200, body: { user } }
    : { status: 401, body: { statusCode: 401, error: 'Unauthorized', message: 'Sign in first.' } };
}

/** Renders the whole app (providers, router, guards, shell) at `path`. */
export function renderApp(path: string, { theme }: { theme?: Theme } = {}) {
  const queryClient = createQueryClient();
  const router = createTestRouter(path);
  const uninstall = installSessionExpiry(queryClient, router);
  const view = render(
    <AppProviders queryClient={queryClient} defaultTheme={theme}>
      <RouterProvider router={router} />
    </AppProviders>,
  );
  return { ...view, router, queryClient, uninstall };
}

/** Sets what `matchMedia` answers (happy-dom has no layout): phone width or not. */
export function setPhoneWidth(phone: boolean) {
  vi.spyOn(window, 'matchMedia').mockImplementation(
    (query: string) =>
      ({
      matches: query.includes('max-width') ? phone : false,
      media: query,
      onchange: null,
      addEventListener: () => undefined,
      removeEventListener: () => undefined,
      addListener: () => undefined,
      removeListener: () => undefined,
      dispatchEvent: () => false,
    }) as unknown as MediaQueryList,
  );
}
