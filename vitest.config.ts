import { defineConfig } from 'vitest/config';
import { fileURLToPath } from 'node:url';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

// Workspace packages resolve to their TypeScript sources in tests, so `npm test` needs no build
// except for the browser tests, which build and start the real app themselves.
const alias = {
  '@fuelwright/shared': here('./shared/src/index.ts'),
  '@fuelwright/rules': here('./rules/src/index.ts'),
  '@fuelwright/db': here('./db/src/index.ts'),
};

export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'unit',
          environment: 'node',
          include: ['shared/src/**/*.spec.ts', 'rules/src/**/*.spec.ts', 'db/src/**/*.spec.ts', 'service/src/**/*.spec.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'http',
          environment: 'node',
          include: ['service/test/**/*.e2e-spec.ts'],
          globalSetup: ['service/test/global-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'ui',
          environment: 'happy-dom',
          include: ['ui/src/**/*.test.ts', 'ui/src/**/*.test.tsx'],
          setupFiles: ['ui/src/test-setup.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          environment: 'node',
          include: ['e2e/**/*.e2e.test.ts'],
          globalSetup: ['e2e/global-setup.ts'],
          testTimeout: 90_000,
          hookTimeout: 180_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
