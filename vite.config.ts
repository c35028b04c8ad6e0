import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import { defineConfig } from 'vitest/config';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

const apiPort = process.env.PORT ?? '3000';

export default defineConfig(({ mode }) => ({
  plugins: [react()],
  resolve: { alias },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    // Source maps would publish the whole client source: only a development-mode build (`vite build --mode development`) makes them.
    sourcemap: mode !== 'production',
    // The bundler's "callbacks took N s" advice is noise on a busy 2-core machine, not a problem to act on.
    rolldownOptions: { checks: { bundlerTimings: false } },
  },
  server: {
    port: 5173,
    host: '127.0.0.1',
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  test: {
    globals: true,
    // Each API test file copies its own PostgreSQL database from the template; keep workers few on 2-core machines.
    maxWorkers: 2,
    projects: [
      {
        extends: true,
        test: {
          name: 'node',
          environment: 'node',
          include: ['shared/**/*.test.ts', 'server/**/*.test.ts', 'scripts/**/*.test.ts', 'tests/api/**/*.test.ts'],
          testTimeout: 20_000,
          hookTimeout: 60_000,
        },
      },
      {
        extends: true,
        test: {
          name: 'web',
          environment: 'jsdom',
          include: ['src/**/*.test.{ts,tsx}'],
          setupFiles: ['tests/setup/web.ts'],
          // Whole-app renders with lazy routes are slow on a busy 2-core machine; a hang still fails.
          testTimeout: 15_000,
        },
      },
      {
        extends: true,
        test: {
          // Whole journeys in Debian's Chromium against the real server; one file at a time on 2 cores.
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.e2e.ts'],
          globalSetup: ['tests/e2e/setup/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
}));
