import type { UserDto } from '@fuelwright/shared';
import { showsInMenu } from './access';
import { appRoutes, type AppRoute, type IconComponent } from './routes';

export interface MenuItem {
  path: string;
  label: string;
  icon: IconComponent;
}

/** The menu for this viewer: only the routes they may open, in menu order. */
export function menuItemsFor(user: UserDto | null, routes: readonly AppRoute[] = appRoutes): MenuItem[] {
  return routes
    .filter((route): route is AppRoute & { menu: NonNullable<AppRoute['menu']> } => route.menu !== undefined)
    .filter((route) => showsInMenu(route.access, user))
    .filter((route) => !route.menu.roles || (user !== null && route.menu.roles.includes(user.role)))
    .sort((a, b) => a.menu.order - b.menu.order)
    .map((route) => ({ path: route.path, label: route.menu.label ?? route.title, icon: route.menu.icon }));
}
