import { Button, Switch } from '@blueprintjs/core';
import { FlashIcon, MoonIcon } from '@blueprintjs/icons';
import { useTheme } from '../../lib/theme';

const LABELS = {
  toDark: 'Dark theme (pit lane)',
  toLight: 'Light theme (workshop)',
};

/** Icon button for the navbar: shows what a tap switches to. */
export function ThemeToggleButton({ size = 'medium' }: { size?: 'medium' | 'large' }) {
  const { theme, toggleTheme } = useTheme();
  const dark = theme === 'dark';
  const label = dark ? `Switch to ${LABELS.toLight.toLowerCase()}` : `Switch to ${LABELS.toDark.toLowerCase()}`;
  return (
    <Button
      className="fw-touch"
      variant="minimal"
      size={size}
      icon={dark ? <FlashIcon /> : <MoonIcon />}
      aria-label={label}
      title={label}
      onClick={toggleTheme}
    />
  );
}

/** Labelled switch for the drawer menu. */
export function ThemeSwitch() {
  const { theme, setTheme } = useTheme();
  return (
    <Switch
      className="fw-theme-switch"
      size="large"
      checked={theme === 'dark'}
      label={LABELS.toDark}
      onChange={(event) => setTheme(event.currentTarget.checked ? 'dark' : 'light')}
    />
  );
}
