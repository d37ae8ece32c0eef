import type { ComponentProps, MouseEvent } from 'react';
import { AnchorButton, MenuItem } from '@blueprintjs/core';
import { useHref, useLinkClickHandler, type To } from 'react-router-dom';

type AnchorButtonProps = Omit<ComponentProps<typeof AnchorButton>, 'href'>;

/**
 * A Blueprint button that is a real link: a proper `href` (open in a new tab works), and a plain
 * click navigates inside the app without reloading.
 */
export function LinkButton({ to, replace, onClick, ...props }: AnchorButtonProps & { to: To; replace?: boolean }) {
  const href = useHref(to);
  const navigate = useLinkClickHandler<HTMLAnchorElement>(to, { replace });
  return (
    <AnchorButton
      {...props}
      href={href}
      onClick={(event: MouseEvent<HTMLElement>) => {
        onClick?.(event as MouseEvent<HTMLAnchorElement>);
        if (!event.defaultPrevented) navigate(event as MouseEvent<HTMLAnchorElement>);
      }}
    />
  );
}

type MenuItemProps = Omit<ComponentProps<typeof MenuItem>, 'href'>;

/** A Blueprint menu item that links to a route. */
export function LinkMenuItem({ to, onClick, ...props }: MenuItemProps & { to: To }) {
  const href = useHref(to);
  const navigate = useLinkClickHandler<HTMLAnchorElement>(to);
  return (
    <MenuItem
      {...props}
      href={href}
      onClick={(event: MouseEvent<HTMLElement>) => {
        onClick?.(event as MouseEvent<HTMLAnchorElement>);
        if (!event.defaultPrevented) navigate(event as MouseEvent<HTMLAnchorElement>);
      }}
    />
  );
}
