import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// Pages are lazily loaded route modules; the first import of one is transformed on demand, which
// can take over a second when every test file runs at once. findBy*/waitFor wait up to 5 s.
configure({ asyncUtilTimeout: 5000 });

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  window.localStorage.clear();
  document.documentElement.className = '';
  delete document.documentElement.dataset.theme;
});
