import { createBrowserRouter, createMemoryRouter, type RouteObject } from 'react-router-dom';
import { PageSpinner } from '../components/page-spinner';
import { RequireAccess } from './guards/require-access';
import { AppShell } from './layout/app-shell';
import { NotFoundPage } from './pages/not-found-page';
import { RouteErrorPage } from './pages/route-error-page';
import { appRoutes, type AppRoute, type RouteHandle } from './routes';

/** One table entry becomes a guard (pathless layout route) around the lazily loaded page. */
function toRouteObject(route: AppRoute): RouteObject {
  const handle: RouteHandle = { title: route.title, comingNext: route.comingNext };
  return {
    element: <RequireAccess access={route.access} />,
    children: [
      {
        path: route.path,
        handle,
        lazy: async () => ({ Component: await route.page() }),
      },
    ],
  };
}

export function buildRoutes(routes: readonly AppRoute[] = appRoutes): RouteObject[] {
  return [
    {
      id: 'root',
      element: <AppShell />,
      errorElement: <RouteErrorPage />,
      hydrateFallbackElement: <PageSpinner />,
      children: [
        {
          // Errors inside a page render here, below the navbar, so the menu stays usable.
          errorElement: <RouteErrorPage />,
          children: [
            ...routes.map(toRouteObject),
            { path: '*', element: <NotFoundPage />, handle: { title: 'Page not found' } satisfies RouteHandle },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter() {
  return createBrowserRouter(buildRoutes());
}

/** For tests: the same routes in memory, starting at `initialPath`. */
export function createTestRouter(initialPath: string, routes?: readonly AppRoute[]) {
  return createMemoryRouter(buildRoutes(routes), { initialEntries: [initialPath] });
}

export type AppRouter = ReturnType<typeof createAppRouter>;
