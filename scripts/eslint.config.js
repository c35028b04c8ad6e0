// ESLint flat config. Kept under scripts/ so the top level stays as agreed; `npm run lint` points at it.
import { readdirSync } from 'node:fs';
import path from 'node:path';
import js from '@eslint/js';
import { createNodeResolver, importX } from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const root = path.resolve(import.meta.dirname, '..');
const at = (...parts) => path.join(root, ...parts);
// no-restricted-paths wants every exception to be a glob when `from` is one: @(name) matches just that file.
const exactly = (file) => path.join(path.dirname(file), `@(${path.basename(file)})`);
const folders = (dir) => readdirSync(at(dir), { withFileTypes: true }).filter((d) => d.isDirectory()).map((d) => d.name);

// Boundaries (DEVELOPERS.md, "Boundaries"): app → features → api / components / lib → shared.
// Each zone refuses imports of `from` inside `target`, whatever the path is written as (relative
// or alias): the rule compares resolved files, so an unresolved import would slip through, and
// the resolver below reads the aliases from tsconfig.json.
const FEATURES = folders('src/features');
const featureZones = FEATURES.map((feature) => ({
  target: at('src/features', feature, '**'),
  from: at('src/features/**'),
  except: [at('src/features', feature, '**')],
  message: 'Features do not import each other: move what both need down to src/api, src/components or src/lib, or compose them in a page under src/app.',
}));
const layerZones = [
  { target: at('src/features/**'), from: at('src/app/**'), message: 'Features do not import the app layer.' },
  { target: [at('src/components/**'), at('src/lib/**')], from: [at('src/features/**'), at('src/app/**'), at('src/api/**')], message: 'ui/ and lib/ sit below the query layer, features and the app.' },
  { target: at('src/api/**'), from: [at('src/features/**'), at('src/app/**'), at('src/components/**'), at('src/testing/**')], message: 'src/api sits below the features: it imports only src/lib and shared/.' },
];
const sideZones = [
  { target: at('shared/**'), from: [at('src/**'), at('server/**')], message: 'shared/ is pure: it imports neither the client nor the server.' },
  { target: at('server/**'), from: at('src/**'), message: 'The server does not import client code; share through shared/.' },
  { target: at('src/**'), from: at('server/**'), message: 'The client does not import server code; share through shared/.' },
];

// A server module reaches another module only through its public files: `<name>.service.ts`
// (what it does), `*.model.ts` (the tables, for associations and joins) and `<name>.ts` (a
// module whose one job is a function, like audit/audit.ts). Anything else is an internal.
const MODULES = folders('server/modules');
const publicFiles = [at('server/modules/*/*.service.ts'), at('server/modules/*/*.model.ts'), ...MODULES.map((m) => exactly(at('server/modules', m, `${m}.ts`)))];
const moduleZones = MODULES.map((module) => ({
  target: at('server/modules', module, '**'),
  from: at('server/modules/**'),
  except: [at('server/modules', module, '**'), ...publicFiles],
  message: "A server module uses another only through its service, models or <name>.ts file; give that module a public function instead of reaching into its internals.",
}));

const zones = (...sets) => ['error', { zones: sets.flat() }];

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', '.data/**', 'coverage/**', 'tests/e2e/screenshots/**', '.stryker-tmp/**', 'reports/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx,js,mjs}'],
    languageOptions: { globals: { ...globals.node } },
    plugins: { 'import-x': importX },
    settings: {
      'import-x/resolver-next': [createNodeResolver({ extensions: ['.ts', '.tsx', '.js', '.mjs', '.json'], tsconfig: { configFile: at('tsconfig.json') } })],
    },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      'no-console': 'off',
      'import-x/no-restricted-paths': zones(sideZones),
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: reactHooks.configs.recommended.rules,
  },
  {
    files: ['shared/**/*.ts'],
    rules: { 'no-restricted-imports': ['error', { patterns: [{ group: ['react', 'react-dom', 'express', 'sequelize'], message: 'shared/ is pure: no UI, HTTP or database library.' }] }] },
  },
  { files: ['src/**/*.{ts,tsx}'], rules: { 'import-x/no-restricted-paths': zones(sideZones, featureZones, layerZones) } },
  // A test renders its subject inside the real app providers, so tests and src/testing may reach the app layer.
  { files: ['src/**/*.test.{ts,tsx}', 'src/testing/**/*.{ts,tsx}'], rules: { 'import-x/no-restricted-paths': zones(sideZones, featureZones) } },
  { files: ['server/**/*.ts'], ignores: ['**/*.test.ts'], rules: { 'import-x/no-restricted-paths': zones(sideZones, moduleZones) } },
  // No import cycles on the server: a cycle makes the load order decide what is undefined at start-up.
  { files: ['server/**/*.ts'], rules: { 'import-x/no-cycle': ['error', { ignoreExternal: true }] } },
);
