import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { FocusStyleManager } from '@blueprintjs/core';
import { RouterProvider } from 'react-router-dom';
import '@blueprintjs/core/lib/css/blueprint.css';
import '@blueprintjs/icons/lib/css/blueprint-icons.css';
import '../../fonts/noto-sans.css';
import './styles/app.css';
import { AppProviders } from './app/providers';
import { createAppRouter } from './app/router';
import { installSessionExpiry } from './app/session-expiry';
import { createQueryClient } from './lib/query-client';
import { applyTheme, initialTheme } from './lib/theme';

// Theme before the first paint, so a dark-theme user never sees a white flash.
applyTheme(initialTheme());
// Focus rings for keyboard users only.
FocusStyleManager.onlyShowFocusOnTabs();

const queryClient = createQueryClient();
const router = createAppRouter();
installSessionExpiry(queryClient, router);

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProviders queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProviders>
  </StrictMode>,
);
