// Type-aware lint for the whole monorepo, with STYLE.md's dependency rules as restricted imports.
import js from '@eslint/js';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const FEATURE_ESCAPE = 'A feature uses another only through its index.ts (STYLE.md rule 5).';

/** Builds a no-restricted-imports rule from [regex, message] pairs. */
const restrict = (...pairs) => ['error', { patterns: pairs.map(([regex, message]) => ({ regex, message })) }];

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/drizzle/**', 'uploads/**', 'data/**', '.artifacts/**', '**/*.cjs'] },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    languageOptions: {
      parserOptions: { projectService: { allowDefaultProject: ['*.mjs', '*.mts', 'apps/*/scripts/*.mjs', 'apps/*/bench/*.mjs'] }, tsconfigRootDir: import.meta.dirname },
      globals: { ...globals.node },
    },
    rules: {
      eqeqeq: ['error', 'always'],
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/switch-exhaustiveness-check': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/only-throw-error': ['error', { allowThrowingUnknown: true, allow: [{ from: 'lib', name: 'Response' }] }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false }],
    },
  },
  {
    files: ['**/*.mjs'],
    ...tseslint.configs.disableTypeChecked,
  },
  {
    files: ['libs/domain/src/**'],
    rules: { 'no-restricted-imports': restrict(['^(?!\\.{1,2}/)', 'libs/domain is pure: it imports nothing outside itself (STYLE.md rule 1).']) },
  },
  {
    files: ['libs/contracts/src/**'],
    rules: { 'no-restricted-imports': restrict(['^(?!\\.{1,2}/|zod$|@benchproof/domain$)', 'libs/contracts depends only on zod and @benchproof/domain (rule 3).']) },
  },
  {
    files: ['libs/annotation/src/**'],
    rules: { 'no-restricted-imports': restrict(['^(?!\\.{1,2}/|@benchproof/domain$)', 'libs/annotation is pure TypeScript: no React, no Konva (rule 2).']) },
  },
  {
    files: ['libs/*/src/**/*.test.ts'],
    rules: { 'no-restricted-imports': restrict(['^(?!\\.{1,2}/|mathjs$|zod$|@benchproof/domain$)', 'Lib tests may add only the mathjs reference oracle.']) },
  },
  {
    files: ['apps/api/**'],
    rules: { 'no-restricted-imports': restrict(['(^|/)apps/web(/|$)|^@benchproof/web$', 'The apps never import each other (rule 4).']) },
  },
  {
    files: ['apps/api/src/*/**'],
    rules: {
      'no-restricted-imports': restrict(['(^|/)apps/web(/|$)|^@benchproof/web$', 'The apps never import each other (rule 4).'], ['^\\.\\./(?!core/|db/|infra/|config/)[a-z-]+/.+', FEATURE_ESCAPE]),
    },
  },
  {
    files: ['apps/api/src/core/**', 'apps/api/src/infra/**'],
    rules: { 'no-restricted-imports': restrict(['^\\.\\./\\.\\./(?!config|core|infra|db)', 'core/ and infra/ never import features (rule 5).']) },
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': restrict(['(^|/)apps/api(/|$)|^@benchproof/api$', 'The apps never import each other (rule 4).'], ['^(react-konva|konva)$', 'Only features/annotate draws with Konva.']),
    },
  },
  {
    files: ['apps/web/src/features/annotate/**'],
    rules: { 'no-restricted-imports': 'off' },
  },
  {
    files: ['apps/web/src/features/*/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict(['^\\.\\./(?!\\.\\.)', 'No cross-feature imports: features meet in app/routes (rule 6).']) },
  },
  {
    files: ['apps/web/src/features/*/*/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict(['^\\.\\./\\.\\./(?!\\.\\.)', 'No cross-feature imports: features meet in app/routes (rule 6).']) },
  },
  {
    files: ['apps/web/src/features/*/*/*/*.{ts,tsx}'],
    rules: { 'no-restricted-imports': restrict(['^\\.\\./\\.\\./\\.\\./(?!\\.\\.)', 'No cross-feature imports: features meet in app/routes (rule 6).']) },
  },
  {
    files: ['apps/web/src/components/**', 'apps/web/src/lib/**'],
    rules: { 'no-restricted-imports': restrict(['(^|/)features/', 'Shared UI and lib know no features (rule 6).']) },
  },
  {
    files: ['**/*.test.ts', '**/*.test.tsx', '**/*.spec.ts', '**/*.e2e-spec.ts', '**/*.e2e.ts', 'apps/api/test/**', 'apps/web/e2e/**'],
    rules: { '@typescript-eslint/no-unsafe-member-access': 'off', '@typescript-eslint/no-unsafe-assignment': 'off', '@typescript-eslint/no-unsafe-argument': 'off', '@typescript-eslint/no-unsafe-call': 'off', '@typescript-eslint/no-unsafe-return': 'off' },
  },
);
