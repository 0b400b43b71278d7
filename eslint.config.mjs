// Type-aware lint for the whole monorepo. STYLE.md's dependency rules are checked on resolved
// file paths (import-x/no-restricted-paths, zones in eslint.zones.mjs), so `../../features/x`
// cannot slip past a string pattern; package bans stay as restricted imports.
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';
import { boundaryZones } from './eslint.zones.mjs';

/** Builds a no-restricted-imports rule from [regex, message] pairs. */
const restrict = (...pairs) => ['error', { patterns: pairs.map(([regex, message]) => ({ regex, message })) }];

const TS_PROJECTS = ['apps/api/tsconfig.json', 'apps/web/tsconfig.json', 'apps/web/e2e/tsconfig.json', 'libs/*/tsconfig.json', 'seeds/tsconfig.json'];
const KONVA_BAN = ['^(react-konva|konva)(/|$)', 'Only features/annotate draws with Konva (STYLE.md layout).'];

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/drizzle/**', 'uploads/**', 'data/**', '.artifacts/**', '**/*.cjs', 'tools/lint-probe/fixtures/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommendedTypeChecked,
  {
    plugins: { 'import-x': importX },
    languageOptions: {
      parserOptions: {
        projectService: { allowDefaultProject: ['*.mjs', '*.mts', 'apps/*/scripts/*.mjs', 'apps/*/bench/*.mjs'] },
        tsconfigRootDir: import.meta.dirname,
      },
      globals: { ...globals.node },
    },
    settings: {
      'import-x/resolver-next': [createTypeScriptImportResolver({ project: TS_PROJECTS, alwaysTryTypes: true, noWarnOnMultipleProjects: true })],
    },
    rules: {
      eqeqeq: ['error', 'always'],
      '@typescript-eslint/no-floating-promises': 'error',
      '@typescript-eslint/switch-exhaustiveness-check': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/only-throw-error': ['error', { allowThrowingUnknown: true, allow: [{ from: 'lib', name: 'Response' }] }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports', disallowTypeAnnotations: false }],
      'import-x/no-restricted-paths': ['error', { basePath: import.meta.dirname, zones: boundaryZones(import.meta.dirname) }],
      'import-x/no-cycle': ['error', { ignoreExternal: true }],
      // STYLE.md habit 9: split by responsibility before a file or function grows past these.
      'max-lines': ['error', { max: 300, skipBlankLines: true, skipComments: true }],
      'max-lines-per-function': ['error', { max: 50, skipBlankLines: true, skipComments: true, IIFEs: true }],
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
    rules: {
      'no-restricted-imports': restrict([
        '^(?!\\.{1,2}/|zod$|@benchproof/domain$|@benchproof/annotation$)',
        'libs/contracts depends only on zod, @benchproof/domain and @benchproof/annotation (rule 3).',
      ]),
    },
  },
  {
    files: ['libs/annotation/src/**'],
    rules: {
      'no-restricted-imports': restrict([
        '^(?!\\.{1,2}/|@benchproof/domain$|zod$|simplify-js$)',
        'libs/annotation is pure TypeScript: no React, no Konva; zod for its schema, simplify-js for strokes (rule 2).',
      ]),
    },
  },
  {
    files: ['libs/*/src/**/*.test.ts'],
    rules: {
      'no-restricted-imports': restrict([
        '^(?!\\.{1,2}/|mathjs$|i18n-iso-countries$|zod$|@benchproof/domain$)',
        'Lib tests may add only the reference oracles: mathjs, i18n-iso-countries (country codes).',
      ]),
    },
  },
  {
    files: ['apps/api/**'],
    rules: { 'no-restricted-imports': restrict(['^@benchproof/web$', 'The apps never import each other (rule 4).']) },
  },
  {
    // better-sqlite3 in autocommit: INSERT/UPDATE … RETURNING read with .get() hands back the row from the first step,
    // and a failed COMMIT (full disk) surfaces only at the statement's reset, where it is lost (issue 20).
    files: ['apps/api/src/**/*.ts'],
    rules: {
      'no-restricted-syntax': [
        'error',
        {
          selector: "CallExpression[callee.property.name='get'][callee.object.type='CallExpression'][callee.object.callee.property.name='returning']",
          message:
            'No .returning().get(): a failed commit is lost in autocommit. Use .returning().all()[0] (all() steps to the end, so the error throws), inside uow.run for more than one write.',
        },
        {
          // One way to declare a route's input: the decorator that validates also documents (core/http/zod.ts).
          selector: "Decorator > CallExpression[callee.name=/^(Body|Query|Param)$/] > NewExpression[callee.name='ZodPipe']",
          message: 'Declare route input with @ZodBody(Schema), @ZodQuery(Schema) or @ZodParam(name, Schema): they validate and document it in one place.',
        },
      ],
    },
  },
  {
    files: ['apps/web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': restrict(['^@benchproof/api$', 'The apps never import each other (rule 4).'], KONVA_BAN),
    },
  },
  {
    files: ['apps/web/src/features/annotate/**'],
    rules: { 'no-restricted-imports': restrict(['^@benchproof/api$', 'The apps never import each other (rule 4).']) },
  },
  {
    files: ['**/*.test.ts', '**/*.test.tsx', '**/*.spec.ts', '**/*.e2e-spec.ts', '**/*.e2e.ts', 'apps/api/test/**', 'apps/web/e2e/**'],
    rules: {
      '@typescript-eslint/no-unsafe-member-access': 'off',
      '@typescript-eslint/no-unsafe-assignment': 'off',
      '@typescript-eslint/no-unsafe-argument': 'off',
      '@typescript-eslint/no-unsafe-call': 'off',
      '@typescript-eslint/no-unsafe-return': 'off',
      // A describe() callback holds a whole suite, so a function-length limit would measure the suite, not a function.
      'max-lines-per-function': 'off',
    },
  },
);
