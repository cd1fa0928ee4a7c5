// The one lint configuration for the workspace (ESLint flat config), run by `pnpm lint` and by
// `npm test` before the suites. Type checking is tsc's job (`tsc -b`); these rules need no type
// information, which keeps the whole run well under a minute on two cores.
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import { defineConfig } from 'eslint/config';
import tseslint from 'typescript-eslint';

/** The workspace packages an app may name; packages never name an app. */
const APP_IMPORT = { regex: '^@porestack/(api|web)(/|$)|(^|/)apps/', message: 'Packages never import apps: move what is shared into a package.' };

export default defineConfig(
  {
    ignores: ['**/dist/**', '**/node_modules/**', '**/.tsc/**', 'apps/web/test-results/**', 'apps/web/screenshots/**', '.data/**', '.run/**'],
  },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { ecmaVersion: 2023, sourceType: 'module', globals: { ...globals.node } },
    linterOptions: { reportUnusedDisableDirectives: 'error' },
    rules: {
      // Unused code is dead code; a leading underscore marks a parameter kept for its position.
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrors: 'none' }],
      // Type-only imports stay type-only (verbatimModuleSyntax asks the same of tsc).
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
    },
  },

  // ── The web app: browser globals and the rules of hooks ────────────────────────────────────
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      'react-hooks/rules-of-hooks': 'error',
      'react-hooks/exhaustive-deps': 'error',
    },
  },

  // ── Import direction ───────────────────────────────────────────────────────────────────────
  // geo-core is pure computation: nothing from the workspace.
  {
    files: ['packages/geo-core/**/*.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            { regex: '^@porestack/', message: 'geo-core imports nothing from the workspace: it is the bottom of the dependency graph.' },
            APP_IMPORT,
          ],
        },
      ],
    },
  },
  // types is the contract: zod, and geo-core's types (type-only) for the compile-time checks.
  {
    files: ['packages/types/src/**/*.ts'],
    ignores: ['packages/types/src/**/*.test.ts'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            { regex: '^(?!zod$|@porestack/geo-core$|\\.)', message: 'packages/types imports only zod (and geo-core, type-only, for the contract checks).' },
            { regex: '^@porestack/geo-core$', allowTypeImports: true, message: 'packages/types may import geo-core for its types only: write `import type`.' },
            APP_IMPORT,
          ],
        },
      ],
    },
  },
  // In the web app, a feature never reaches into another feature: the app layer composes them.
  // Every feature file sits at features/<feature>/<part>/<file>, so `../../x` from one is another
  // feature; shared code is `../../../components|lib|config`.
  {
    files: ['apps/web/src/features/**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        {
          patterns: [
            {
              regex: '^\\.\\./\\.\\./(?!\\.\\./)|/features/',
              message: 'One feature never imports another: move the shared part to src/components or src/lib, or compose the two in src/app.',
            },
          ],
        },
      ],
    },
  },
  // Shared web code serves every feature, so it imports none.
  {
    files: ['apps/web/src/{components,lib,config}/**/*.{ts,tsx}'],
    rules: {
      '@typescript-eslint/no-restricted-imports': [
        'error',
        { patterns: [{ regex: '/features/', message: 'Shared components and libraries import no feature: the feature imports them.' }] },
      ],
    },
  },
);
