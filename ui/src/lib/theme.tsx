import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import { Classes } from '@blueprintjs/core';

/** Dark for the pit lane, light for the workshop. */
export type Theme = 'light' | 'dark';

export const THEME_STORAGE_KEY = 'fuelwright.theme';

export function readStoredTheme(): Theme | null {
  try {
    const value = window.localStorage.getItem(THEME_STORAGE_KEY);
    return value === 'dark' || value === 'light' ? value : null;
  } catch {
    return null; // storage blocked (private mode, policy): fall back to the system's choice
  }
}

function storeTheme(theme: Theme): void {
  try {
    window.localStorage.setItem(THEME_STORAGE_KEY, theme);
  } catch {
    // not remembered, but the switch still works for this visit
  }
}

/** The stored choice, else the system's preference, else light. */
export function initialTheme(): Theme {
  const stored = readStoredTheme();
  if (stored) return stored;
  return typeof window.matchMedia === 'function' && window.matchMedia('(prefers-color-scheme: dark)').matches
    ? 'dark'
    : 'light';
}

/** Puts Blueprint's dark class on the root element (overlays get it through the portal provider). */
export function applyTheme(theme: Theme, root: HTMLElement = document.documentElement): void {
  root.classList.toggle(Classes.DARK, theme === 'dark');
  root.dataset.theme = theme;
  root.style.colorScheme = theme;
}

interface ThemeContextValue {
  theme: Theme;
  setTheme: (theme: Theme) => void;
  toggleTheme: () => void;
}

const ThemeContext = createContext<ThemeContextValue | null>(null);

export function ThemeProvider({ children, defaultTheme }: { children: ReactNode; defaultTheme?: Theme }) {
  const [theme, setThemeState] = useState<Theme>(() => {
    const first = defaultTheme ?? initialTheme();
    applyTheme(first);
    return first;
  });

  const setTheme = useCallback((next: Theme) => {
    storeTheme(next);
    applyTheme(next);
    setThemeState(next);
  }, []);

  const value = useMemo<ThemeContextValue>(
    () => ({ theme, setTheme, toggleTheme: () => setTheme(theme === 'dark' ? 'light' : 'dark') }),
    [theme, setTheme],
  );
  return <ThemeContext.Provider value={value}>{children}</ThemeContext.Provider>;
}

export function useTheme(): ThemeContextValue {
  const value = useContext(ThemeContext);
  if (!value) throw new Error('useTheme must be used inside <ThemeProvider>');
  return value;
}
