import { useMatch } from 'react-router-dom';
import { LinkButton } from '../../components/link-button';
import type { MenuItem } from '../navigation';

export function NavLinkButton({ item }: { item: MenuItem }) {
  const active = useMatch({ path: item.path, end: false }) !== null;
  const Icon = item.icon;
  return (
    <LinkButton
      className="fw-touch"
      variant="minimal"
      to={item.path}
      icon={<Icon />}
      text={item.label}
      active={active}
      aria-current={active ? 'page' : undefined}
    />
  );
}
