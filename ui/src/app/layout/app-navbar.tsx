import { useEffect, useState } from 'react';
import { Alignment, Button, Navbar, NavbarDivider, NavbarGroup, NavbarHeading, Tag } from '@blueprintjs/core';
import { LogOutIcon, MenuIcon, UserIcon } from '@blueprintjs/icons';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import type { UserDto } from '@fuelwright/shared';
import { LinkButton } from '../../components/link-button';
import { useNotify } from '../../components/toaster';
import { Wordmark } from '../../components/wordmark';
import { useSignOut } from '../../features/auth/api/sign-out';
import { useCompactNav } from '../../lib/use-media-query';
import { menuItemsFor } from '../navigation';
import { paths, signInPath } from '../paths';
import { NavDrawer } from './nav-drawer';
import { NavLinkButton } from './nav-link-button';
import { ROLE_LABELS } from '../../lib/roles';
import { ThemeToggleButton } from './theme-switch';

/**
 * The navbar: wordmark, the menu of what this viewer may use (inline on desktop, in a drawer on
 * phone and small tablet widths), the theme switch, and the account (name and sign-out, or sign-in for visitors).
 */
export function AppNavbar({ user, sessionPending }: { user: UserDto | null; sessionPending: boolean }) {
  const isPhone = useCompactNav();
  // Until the session check answers, show no entries rather than the visitor's menu.
  const items = sessionPending ? [] : menuItemsFor(user);
  const [drawerOpen, setDrawerOpen] = useState(false);
  const location = useLocation();
  const navigate = useNavigate();
  const notify = useNotify();
  const signOut = useSignOut({
    // flushSync: the start page must replace the guarded page before the sign-out settles, else
    // that page's guard would see no session and send the user to sign-in.
    onSignedOut: () => navigate(paths.landing, { replace: true, flushSync: true }),
  });

  // Any navigation closes the drawer (also the browser's back button).
  useEffect(() => setDrawerOpen(false), [location.pathname]);
  // Leaving phone width with the drawer open would leave an orphan overlay.
  useEffect(() => {
    if (!isPhone) setDrawerOpen(false);
  }, [isPhone]);

  const handleSignOut = () =>
    signOut.mutate(undefined, {
      onError: (error) => notify.error(`Could not sign out: ${error.message}`),
    });

  const here = location.pathname + location.search;

  return (
    <>
      <Navbar className="fw-navbar" fixedToTop={false}>
        <NavbarGroup align={Alignment.START} className="fw-navbar-group">
          {isPhone && (
            <Button
              className="fw-touch"
              variant="minimal"
              size="large"
              icon={<MenuIcon size={20} />}
              aria-label="Open menu"
              aria-expanded={drawerOpen}
              onClick={() => setDrawerOpen(true)}
            />
          )}
          <NavbarHeading className="fw-navbar-heading">
            <Link to={user ? paths.home : paths.landing} className="fw-brand-link">
              <Wordmark size={isPhone ? 24 : 28} />
            </Link>
          </NavbarHeading>
          {!isPhone && items.length > 0 && (
            <>
              <NavbarDivider />
              <nav aria-label="Main" className="fw-navbar-menu">
                {items.map((item) => (
                  <NavLinkButton key={item.path} item={item} />
                ))}
              </nav>
            </>
          )}
        </NavbarGroup>
        <NavbarGroup align={Alignment.END} className="fw-navbar-group">
          <ThemeToggleButton size={isPhone ? 'large' : 'medium'} />
          {!isPhone && user && (
            <>
              <NavbarDivider />
              <span className="fw-navbar-user" title={user.email}>
                <UserIcon />
                <span className="fw-ellipsis">{user.displayName}</span>
                <Tag minimal round>
                  {ROLE_LABELS[user.role]}
                </Tag>
              </span>
              <Button
                className="fw-touch"
                variant="minimal"
                icon={<LogOutIcon />}
                text="Sign out"
                loading={signOut.isPending}
                onClick={handleSignOut}
              />
            </>
          )}
          {!isPhone && !user && !sessionPending && (
            <>
              <NavbarDivider />
              <LinkButton className="fw-touch" variant="minimal" text="Sign in" to={signInPath(here)} />
              <LinkButton className="fw-touch" intent="primary" text="Create account" to={paths.signUp} />
            </>
          )}
        </NavbarGroup>
      </Navbar>
      {isPhone && (
        <NavDrawer
          isOpen={drawerOpen}
          onClose={() => setDrawerOpen(false)}
          items={items}
          user={user}
          onSignOut={handleSignOut}
          signingOut={signOut.isPending}
        />
      )}
    </>
  );
}
