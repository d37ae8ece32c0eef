import { Button, Divider, Drawer, Menu, Position, Tag } from '@blueprintjs/core';
import { CrossIcon, LogInIcon, LogOutIcon, NewPersonIcon } from '@blueprintjs/icons';
import { useLocation, useMatch } from 'react-router-dom';
import type { UserDto } from '@fuelwright/shared';
import { LinkButton, LinkMenuItem } from '../../components/link-button';
import { Wordmark } from '../../components/wordmark';
import type { MenuItem } from '../navigation';
import { paths, signInPath } from '../paths';
import { ROLE_LABELS } from '../../lib/roles';
import { ThemeSwitch } from './theme-switch';

function DrawerMenuItem({ item, onNavigate }: { item: MenuItem; onNavigate: () => void }) {
  const active = useMatch({ path: item.path, end: false }) !== null;
  const Icon = item.icon;
  return (
    <LinkMenuItem
      className="fw-touch"
      to={item.path}
      icon={<Icon size={20} />}
      text={item.label}
      active={active}
      aria-current={active ? 'page' : undefined}
      onClick={onNavigate}
    />
  );
}

/** The phone menu: the same entries as the desktop navbar, plus the account and the theme. */
export function NavDrawer({
  isOpen,
  onClose,
  items,
  user,
  onSignOut,
  signingOut,
}: {
  isOpen: boolean;
  onClose: () => void;
  items: MenuItem[];
  user: UserDto | null;
  onSignOut: () => void;
  signingOut: boolean;
}) {
  const location = useLocation();
  return (
    <Drawer
      className="fw-nav-drawer"
      isOpen={isOpen}
      onClose={onClose}
      position={Position.LEFT}
      size="min(320px, 88vw)"
      aria-label="Menu"
    >
      <div className="fw-nav-drawer-head">
        <Wordmark size={24} />
        <Button
          className="fw-touch"
          variant="minimal"
          size="large"
          icon={<CrossIcon size={20} />}
          aria-label="Close menu"
          onClick={onClose}
        />
      </div>
      <div className="fw-nav-drawer-body">
        {user && (
          <div className="fw-nav-drawer-user">
            <strong className="fw-ellipsis">{user.displayName}</strong>
            <span className="fw-muted fw-ellipsis">{user.email}</span>
            <Tag minimal round>
              {ROLE_LABELS[user.role]}
            </Tag>
          </div>
        )}
        <nav aria-label="Main">
          <Menu size="large" className="fw-nav-drawer-menu">
            {items.map((item) => (
              <DrawerMenuItem key={item.path} item={item} onNavigate={onClose} />
            ))}
          </Menu>
        </nav>
        <Divider />
        <ThemeSwitch />
        <div className="fw-nav-drawer-actions">
          {user ? (
            <Button
              className="fw-touch"
              size="large"
              fill
              icon={<LogOutIcon />}
              text="Sign out"
              loading={signingOut}
              onClick={onSignOut}
            />
          ) : (
            <>
              <LinkButton
                className="fw-touch"
                size="large"
                fill
                intent="primary"
                icon={<LogInIcon />}
                text="Sign in"
                to={signInPath(location.pathname + location.search)}
                onClick={onClose}
              />
              <LinkButton
                className="fw-touch"
                size="large"
                fill
                icon={<NewPersonIcon />}
                text="Create account"
                to={paths.signUp}
                onClick={onClose}
              />
            </>
          )}
        </div>
      </div>
    </Drawer>
  );
}
