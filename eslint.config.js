// `npm run lint` (scripts/lint.mjs) runs this over every workspace, after `tsc --noEmit` on each.
import js from '@eslint/js';
import stylistic from '@stylistic/eslint-plugin';
import reactHooks from 'eslint-plugin-react-hooks';
import { defineConfig, globalIgnores } from 'eslint/config';
import globals from 'globals';
import tseslint from 'typescript-eslint';

export default defineConfig([
  // shared/src/api/openapi.ts is generated from the server's OpenAPI document (`npm run api:types`).
  globalIgnores(['**/dist/', '**/node_modules/', '.data/', 'media/store/', '**/test-results/', '**/.vite/', 'shared/src/api/openapi.ts']),
  js.configs.recommended,
  { languageOptions: { globals: globals.node } },
  {
    files: ['**/*.{ts,tsx}'],
    extends: [tseslint.configs.recommendedTypeChecked],
    languageOptions: {
      parserOptions: {
        // The first listed project that holds a file types it: the server's test project also
        // holds its sources, so the server's build project is not listed.
        project: [
          'shared/tsconfig.json',
          'server/tsconfig.test.json',
          'studio/tsconfig.json',
          'kiosk/tsconfig.json',
          'test/tsconfig.json',
        ],
        tsconfigRootDir: import.meta.dirname,
      },
    },
  },
  {
    files: ['{studio,kiosk,shared}/src/**/*.{ts,tsx}'],
    extends: [reactHooks.configs.flat.recommended],
  },
  {
    files: ['{studio,kiosk}/src/**', 'shared/bench/frame-page/**'],
    languageOptions: { globals: globals.browser },
  },
  {
    // Bench scripts hand functions to page.evaluate, which run in the browser.
    files: ['{shared,kiosk}/bench/**'],
    languageOptions: { globals: { ...globals.node, ...globals.browser } },
  },
  {
    files: ['kiosk/build/service-worker.js'],
    languageOptions: { globals: globals.serviceworker },
  },
  {
    files: ['**/*.{ts,tsx}'],
    rules: {
      // Rest destructuring drops a field by binding it to an underscore name (`{ passwordHash: _, ...view }`).
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', ignoreRestSiblings: true }],
      // The code marks indexed reads that may miss with `!` (`rows[0]!`), as noUncheckedIndexedAccess
      // would require; this rule calls each of those (some 410) unnecessary and would strip them.
      '@typescript-eslint/no-unnecessary-type-assertion': 'off',
    },
  },
  {
    // Supertest's and fetch's `response.body` is `any`; a test's expectations are its type check,
    // so a cast per response would add noise and no safety (about 2,200 hits in tests alone).
    files: ['**/*.{spec,test}.{ts,tsx}', 'server/test/**', 'test/**'],
    rules: {
      // A test's stand-in for an async dependency is written `async` so that it rejects rather than throws.
      '@typescript-eslint/require-await': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
    },
  },
  // The formatter check: the style the code is already written in, so it needs no mass reformat.
  stylistic.configs.customize({ indent: 2, quotes: 'single', semi: true, jsx: true, arrowParens: true, braceStyle: '1tbs' }),
  {
    rules: {
      // A string holding an apostrophe or SQL quotes is written in double quotes (or backticks) rather than escaped.
      '@stylistic/quotes': ['error', 'single', { avoidEscape: true, allowTemplateLiterals: 'always' }],
      // Operators end the line they continue from (`a &&` / `b`); a ternary's `?` and `:` and a
      // type's `|` and `&` may lead.
      '@stylistic/operator-linebreak': ['error', 'after', { overrides: { '?': 'ignore', ':': 'ignore', '|': 'ignore', '&': 'ignore' } }],
      // Short lists (imports, arguments, array items) share lines freely; one item a line is not the house style.
      '@stylistic/list-style': 'off',
      // A ternary breaks where it reads best, not always or never.
      '@stylistic/multiline-ternary': 'off',
      // Keys are quoted where they read as data (language tags, HTTP headers) beside unquoted ones.
      '@stylistic/quote-props': 'off',
      // A one-line `try { … } catch { … }` or small callback is the house style.
      '@stylistic/max-statements-per-line': 'off',
      // Short JSX such as `<b>{name}</b>` or an icon beside its label stays on one line.
      '@stylistic/jsx-one-expression-per-line': 'off',
    },
  },
]);
