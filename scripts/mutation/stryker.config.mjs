// `npm run mutation`: Stryker over the diagnosis engine (shared/domain) against the shared/ tests.
// Version 9.6.1 is the newest whose engines allow Node 20 (10.x needs Node 22).
/** @type {import('@stryker-mutator/api/core').PartialStrykerOptions} */
export default {
  mutate: ['shared/domain/**/*.ts', '!shared/domain/**/*.test.ts', '!shared/domain/testing/**'],
  testRunner: 'vitest',
  vitest: { configFile: 'scripts/mutation/vitest.config.ts', related: false },
  // Two cores shared with other work.
  concurrency: 2,
  // Re-runs test only the mutants whose code or tests changed; the file is git-ignored.
  incremental: true,
  incrementalFile: 'reports/mutation/stryker-incremental.json',
  reporters: ['clear-text', 'progress', 'html', 'json'],
  htmlReporter: { fileName: 'reports/mutation/mutation.html' },
  jsonReporter: { fileName: 'reports/mutation/mutation.json' },
  clearTextReporter: { allowColor: false, logTests: false, reportTests: false, reportMutants: true, reportScoreTable: true },
  // The sandbox copy needs only the engine, its schemas and data, and the config files.
  ignorePatterns: ['/.data', '/dist', '/coverage', '/reports', '/src', '/server', '/tests', '/public', '*.log'],
  tempDirName: '.stryker-tmp',
  cleanTempDir: 'always',
  timeoutMS: 10_000,
};
