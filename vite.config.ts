/// <reference types="vitest/config" />
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const alias = {
  '@': here('./src'),
  '@server': here('./server'),
  '@shared': here('./shared'),
  '@tests': here('./tests'),
};
const apiPort = process.env.PORT ?? '8080';

const root = here('.');

export default defineConfig({
  // The client's index.html lives in src/; the repo root stays the project's own top level.
  root: here('./src'),
  plugins: [react(), tailwindcss()],
  resolve: { alias },
  // Copied as they are to the root of the build: the home-screen manifest and its icons (fixed names it refers to),
  // and the service worker (/sw.js: its scope is the folder it is served from).
  publicDir: here('./src/public'),
  // asset-manifest.json lists the build's files: the service worker (src/public/sw.js) keeps them all for offline use.
  build: { outDir: here('./dist/client'), emptyOutDir: true, sourcemap: false, manifest: 'asset-manifest.json' },
  server: {
    port: Number(process.env.VITE_PORT ?? 5173),
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
    fs: { allow: [root] },
  },
  test: {
    root,
    // Every core (Vitest's own default leaves one free: one worker on a 2-core machine, with most of the time spent
    // waiting on PostgreSQL). API files get a database per worker (tests/support/db.ts).
    maxWorkers: '100%',
    // One config, three projects (see DEVELOPERS.md).
    projects: [
      {
        resolve: { alias },
        root,
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
        },
      },
      {
        resolve: { alias },
        root,
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['tests/support/global-setup.ts'],
          setupFiles: ['tests/support/api-setup.ts'],
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        plugins: [react()],
        resolve: { alias },
        root,
        test: {
          name: 'client',
          include: ['tests/client/**/*.test.tsx'],
          environment: 'jsdom',
          setupFiles: ['tests/support/client-setup.ts'],
        },
      },
    ],
  },
});
