import type { ReactNode } from 'react';
import { BlueprintProvider, Classes } from '@blueprintjs/core';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { ToasterProvider } from '../components/toaster';
import { ThemeProvider, useTheme, type Theme } from '../lib/theme';

/** Overlays (drawer, toasts, popovers) render in portals: they get the dark class from here. */
function ThemedBlueprint({ children }: { children: ReactNode }) {
  const { theme } = useTheme();
  return (
    <BlueprintProvider portalClassName={theme === 'dark' ? Classes.DARK : undefined}>
      <ToasterProvider>{children}</ToasterProvider>
    </BlueprintProvider>
  );
}

export function AppProviders({
  queryClient,
  defaultTheme,
  children,
}: {
  queryClient: QueryClient;
  defaultTheme?: Theme;
  children: ReactNode;
}) {
  return (
    <QueryClientProvider client={queryClient}>
      <ThemeProvider defaultTheme={defaultTheme}>
        <ThemedBlueprint>{children}</ThemedBlueprint>
      </ThemeProvider>
    </QueryClientProvider>
  );
}
