// Vitest setup for mutation runs only: the shared/ tests (pure code, no database, no browser), so each
// mutant of the engine is judged by the engine's own checks.
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

export default defineConfig({
  root: fileURLToPath(new URL('../..', import.meta.url)),
  test: {
    globals: true,
    environment: 'node',
    include: ['shared/**/*.test.ts'],
    testTimeout: 20_000,
  },
});
