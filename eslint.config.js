import { existsSync, readdirSync } from 'node:fs';
import js from '@eslint/js';
import checkFile from 'eslint-plugin-check-file';
import reactHooks from 'eslint-plugin-react-hooks';
import { defineConfig, globalIgnores } from 'eslint/config';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const FEATURES_DIR = 'web/src/features';
const MAX_FEATURE_DEPTH = 6;
const BOUNDARY_MESSAGE =
  'Features do not import each other: move shared code to web/src/components or web/src/lib, or compose the features in web/src/app.';

function escapeRegex(text) {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

/**
 * One no-restricted-imports block per feature folder and nesting depth, so that a file in
 * web/src/features/<a> can import neither `…/features/<b>/…` (alias or absolute style) nor
 * `../../<b>/…` (a relative path that climbs to the features folder and into another feature).
 */
function featureBoundaries() {
  if (!existsSync(FEATURES_DIR)) return [];
  const features = readdirSync(FEATURES_DIR, { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .map((entry) => entry.name);
  return features.flatMap((feature) => {
    const own = escapeRegex(feature);
    return Array.from({ length: MAX_FEATURE_DEPTH + 1 }, (_, depth) => ({
      files: [`${FEATURES_DIR}/${feature}/${'*/'.repeat(depth)}*.{ts,tsx}`],
      rules: {
        'no-restricted-imports': [
          'error',
          {
            patterns: [
              { regex: `(^|/)features/(?!${own}(/|$))[^/]+`, message: BOUNDARY_MESSAGE },
              {
                regex: `^(\\.\\./){${depth + 1}}(?!${own}(/|$)|\\.\\.(/|$))[^/]+`,
                message: BOUNDARY_MESSAGE,
              },
            ],
          },
        ],
      },
    }));
  });
}

// React Compiler-based rules of eslint-plugin-react-hooks 7 report, but do not fail, the build.
const reactCompilerRulesAsWarnings = Object.fromEntries(
  Object.entries(reactHooks.configs.flat.recommended.rules)
    .filter(([name]) => name !== 'react-hooks/rules-of-hooks' && name !== 'react-hooks/exhaustive-deps')
    .map(([name]) => [name, 'warn']),
);

export default defineConfig([
  globalIgnores([
    '**/dist/',
    '**/node_modules/',
    '.data/',
    'uploads-dev/',
    'screenshots/',
    'test-results/',
    'coverage/',
  ]),
  {
    files: ['**/*.{js,mjs,cjs,ts,tsx}'],
    extends: [js.configs.recommended, tseslint.configs.recommended],
    languageOptions: { globals: globals.node },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        {
          argsIgnorePattern: '^_',
          varsIgnorePattern: '^_',
          caughtErrorsIgnorePattern: '^_',
          destructuredArrayIgnorePattern: '^_',
          ignoreRestSiblings: true,
        },
      ],
      '@typescript-eslint/no-explicit-any': 'warn',
      '@typescript-eslint/no-empty-object-type': ['error', { allowInterfaces: 'with-single-extends' }],
      // `declare global { namespace Express { … } }` is how Express request types are extended.
      '@typescript-eslint/no-namespace': ['error', { allowDeclarations: true }],
      'no-empty': ['error', { allowEmptyCatch: true }],
      // Sanitizers legitimately match control characters (e.g. /[\x00-\x1f]/ to reject them).
      'no-control-regex': 'off',
    },
  },
  {
    files: ['web/src/**/*.{ts,tsx}'],
    extends: [reactHooks.configs.flat.recommended],
    languageOptions: { globals: globals.browser },
    rules: reactCompilerRulesAsWarnings,
  },
  {
    // File and folder names are kebab-case; `.entity`, `.test`, `.config` and other middle parts are ignored.
    files: ['**/*.{js,mjs,cjs,ts,tsx}'],
    plugins: { 'check-file': checkFile },
    rules: {
      'check-file/filename-naming-convention': [
        'error',
        { '**/*.{js,mjs,cjs,ts,tsx}': 'KEBAB_CASE' },
        { ignoreMiddleExtensions: true },
      ],
      'check-file/folder-naming-convention': ['error', { '**/': 'KEBAB_CASE' }],
    },
  },
  {
    // TypeORM migrations keep their generated name: 1733100000000-InitialSchema.ts (plus an index.ts).
    files: ['**/migrations/*.ts'],
    rules: {
      'check-file/filename-naming-convention': [
        'error',
        { '**/migrations/*.ts': '@(index|+([0-9])-+([A-Za-z0-9]))' },
        { ignoreMiddleExtensions: true },
      ],
    },
  },
  ...featureBoundaries(),
]);
