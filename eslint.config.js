// `npm run lint` (also run by `npm test`). Rules that need type information are left out on purpose:
// `tsc` already checks types, and without them ESLint stays quick on the whole repository.
import js from '@eslint/js';
import tseslint from 'typescript-eslint';
import reactHooks from 'eslint-plugin-react-hooks';
import jsxA11y from 'eslint-plugin-jsx-a11y';
import globals from 'globals';
import { defineConfig } from 'eslint/config';
import prettier from 'eslint-config-prettier/flat';

// Paths are the contracts' (shared/api/*.api.ts): code anywhere else reaches one through its endpoint object.
// Tests spell paths on purpose (they are the outside view), so they are not covered.
const apiPathMessage =
  'API paths are written only in shared/api/*.api.ts; use the endpoint object (urlOf, callApi, apiRoute) or API_ROOT (DEVELOPERS.md, One contract per endpoint).';
const noApiPaths = [
  { selector: 'Literal[value=/^\\/api(\\/|$)/]', message: apiPathMessage },
  { selector: 'TemplateLiteral[quasis.0.value.cooked=/^\\/api(\\/|$)/]', message: apiPathMessage },
];

// SQL only in repositories: Kysely's query starters and the `sql` tag. `with` counts only with a function
// second argument (a CTE), so Array.prototype.with(index, value) stays allowed.
const sqlMessage = 'SQL belongs in a *.repository.ts file (DEVELOPERS.md, Layers)';
const noSql = [
  {
    selector: 'CallExpression[callee.property.name=/^(selectFrom|insertInto|updateTable|deleteFrom|mergeInto|replaceInto|selectNoFrom)$/]',
    message: sqlMessage,
  },
  { selector: "CallExpression[callee.property.name='with'][arguments.1.type=/FunctionExpression$/]", message: sqlMessage },
  { selector: "TaggedTemplateExpression[tag.name='sql']", message: sqlMessage },
  { selector: "CallExpression[callee.object.name='sql']", message: sqlMessage },
];
const tests = ['**/*.test.ts', '**/*.test.tsx'];

export default defineConfig(
  { ignores: ['node_modules/', 'dist/', '.data/', 'coverage/', 'test-results/', 'tests/output/', 'uploads/', 'backups/'] },
  // A disable comment that no longer silences anything fails, so none outlive their reason.
  { linterOptions: { reportUnusedDisableDirectives: 'error' } },
  js.configs.recommended,
  tseslint.configs.recommended,
  {
    rules: {
      // As tsc's noUnusedLocals/noUnusedParameters: a leading underscore marks a name kept on purpose
      // (an Express error handler's fourth argument, a field left out of a rest copy).
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_', ignoreRestSiblings: true },
      ],
    },
  },
  {
    // Hooks live only in the client.
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'warn',
    },
  },
  {
    files: ['**/*.tsx'],
    ...jsxA11y.flatConfigs.recommended,
    rules: {
      ...jsxA11y.flatConfigs.recommended.rules,
      // A scrolling region (role="region" with a name) takes focus so keyboard users can scroll it
      // (axe-core's scrollable-region-focusable); tab panels stay allowed as in the plugin's default.
      'jsx-a11y/no-noninteractive-tabindex': ['error', { tags: [], roles: ['tabpanel', 'region'], allowExpressionValues: true }],
    },
  },
  {
    // Migrations are written against Kysely<any> on purpose: they must not depend on today's schema types.
    files: ['migrations/**/*.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    files: ['server/**/*.{ts,mjs}', 'src/**/*.{ts,tsx}', 'shared/**/*.ts'],
    ignores: ['shared/api/**', ...tests],
    rules: { 'no-restricted-syntax': ['error', ...noApiPaths] },
  },
  {
    // Both lists: a later block's options replace an earlier one's for the same rule.
    files: ['server/**/*.ts'],
    ignores: ['**/*.repository.ts', 'server/db/**', 'server/ops/**', 'server/demo/**', ...tests],
    rules: { 'no-restricted-syntax': ['error', ...noApiPaths, ...noSql] },
  },
  { files: ['**/*.{js,mjs}'], languageOptions: { globals: globals.node } },
  { files: ['**/*.cjs'], languageOptions: { globals: globals.node, sourceType: 'commonjs' } },
  // Layout is Prettier's alone (npm run format); rules that would argue with it are off.
  prettier,
);
