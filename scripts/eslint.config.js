// ESLint flat config. Kept under scripts/ so the top level stays as agreed; `npm run lint` points at it.
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const restrict = (patterns) => ['error', { patterns }];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'coverage/**', 'tests/e2e/screenshots/**', '.stryker-tmp/**', 'reports/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    languageOptions: { globals: { ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      'no-console': 'off',
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  // Boundaries (STYLE.md): app → features → ui/lib → shared; features never import each other.
  {
    files: ['shared/**/*.ts'],
    rules: { 'no-restricted-imports': restrict([{ group: ['**/src/**', '**/server/**', '@/*', 'react', 'express', 'sequelize'], message: 'shared/ is pure: it imports neither the client nor the server.' }]) },
  },
  {
    files: ['server/**/*.ts'],
    rules: { 'no-restricted-imports': restrict([{ group: ['**/src/**', '@/*'], message: 'The server does not import client code; share through shared/.' }]) },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict([{ group: ['**/server/**'], message: 'The client does not import server code; share through shared/.' }]) },
  },
  {
    files: ['src/features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': restrict([
        { group: ['@/features/*', '**/features/*', '**/server/**'], message: 'Features do not import each other or the server: compose them in a page under src/app/.' },
        { group: ['@/app/*', '**/app/*'], message: 'Features do not import the app layer.' },
      ]),
    },
  },
  {
    files: ['src/components/**/*.{ts,tsx}', 'src/lib/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': restrict([{ group: ['@/features/*', '@/app/*', '**/features/*', '**/app/*', '**/server/**'], message: 'ui/ and lib/ sit below features and the app.' }]),
    },
  },
  // A test renders its subject inside the real app providers, so tests may reach the app layer.
  {
    files: ['src/**/*.test.{ts,tsx}', 'src/testing/**/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict([{ group: ['**/server/**'], message: 'The client does not import server code.' }]) },
  },
);
