// Node-side test setup: database wiring is added by tests/setup/database.ts where a suite needs it.
export {};
