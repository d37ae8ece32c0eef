import { useSyncExternalStore } from 'react';

/**
 * Below this width the navbar has no room for a role's menu, the name and sign-out: the menu
 * moves into a drawer (phones and small tablets). Phone styles in app.css start at 767px.
 */
export const COMPACT_NAV_QUERY = '(max-width: 1199px)';

export function useMediaQuery(query: string): boolean {
  return useSyncExternalStore(
    (onChange) => {
      if (typeof window.matchMedia !== 'function') return () => undefined;
      const list = window.matchMedia(query);
      list.addEventListener('change', onChange);
      return () => list.removeEventListener('change', onChange);
    },
    () => typeof window.matchMedia === 'function' && window.matchMedia(query).matches,
    () => false,
  );
}

export function useCompactNav(): boolean {
  return useMediaQuery(COMPACT_NAV_QUERY);
}
