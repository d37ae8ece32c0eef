import { fileURLToPath } from 'node:url';
import { defineConfig, searchForWorkspaceRoot } from 'vite';
import react from '@vitejs/plugin-react';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));

// The UI talks to the NestJS service under /api. In development Vite proxies /api to it; in
// production the service serves ui/dist itself (same origin, so the session cookie just works).
export default defineConfig({
  root: here('.'),
  plugins: [react()],
  resolve: {
    alias: {
      '@fuelwright/shared': here('../shared/src/index.ts'),
    },
  },
  server: {
    port: 5173,
    proxy: {
      '/api': { target: process.env.FUELWRIGHT_API_URL ?? 'http://localhost:3000', changeOrigin: false },
    },
    fs: {
      allow: [searchForWorkspaceRoot(process.cwd()), here('.'), here('../fonts'), here('../shared')],
    },
  },
  preview: { port: 4173 },
  build: {
    outDir: here('dist'),
    emptyOutDir: true,
    // Icons, fonts and scripts are all bundled: nothing is fetched from outside the app.
    assetsInlineLimit: 0,
  },
});
