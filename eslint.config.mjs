import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const deepRelative = { group: ['../../*'], message: 'Import through "@/" instead.' };
const fromFeatures = {
  group: ['@/features/*'],
  message: 'A feature imports only its own files (relatively) and shared code.',
};
const fromApp = { group: ['@/app/*'], message: 'Only the app layer imports from "@/app".' };

export default tseslint.config(
  { ignores: ['**/dist/**', '**/node_modules/**', '**/coverage/**', 'data/**'] },
  js.configs.recommended,
  ...tseslint.configs.strict,
  {
    languageOptions: { globals: { ...globals.node } },
    rules: {
      'no-console': ['error', { allow: ['warn', 'error'] }],
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_' }],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      eqeqeq: ['error', 'always'],
    },
  },
  {
    // Nest injects by the constructor parameter's runtime type, so those imports must stay values.
    files: ['api/**/*.ts'],
    rules: {
      '@typescript-eslint/consistent-type-imports': 'off',
      '@typescript-eslint/no-extraneous-class': 'off',
    },
  },
  {
    // Every exported function and public method states what it returns: controller handlers and
    // service methods answer in the shapes of @loftwright/contract, checked by the compiler.
    files: ['api/src/**/*.ts'],
    ignores: ['**/*.spec.ts'],
    rules: { '@typescript-eslint/explicit-module-boundary-types': 'error' },
  },
  {
    files: ['packages/**/src/**/*.ts'],
    ignores: ['**/*.test.ts'],
    rules: {
      // The engine is pure: no I/O, no globals of a host, no logging.
      'no-restricted-imports': [
        'error',
        { patterns: ['node:*', 'fs', 'path', 'http', 'react', 'axios'] },
      ],
      'no-console': 'error',
    },
  },
  {
    files: ['web/**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser } },
    plugins: { 'react-hooks': reactHooks },
    rules: {
      ...reactHooks.configs.recommended.rules,
      'no-restricted-imports': ['error', { patterns: [deepRelative] }],
    },
  },
  {
    // Imports flow one way, shared code -> features -> app: features never import one another
    // (the app's routes compose them), and shared code imports neither (see DEVELOPERS.md).
    files: ['web/src/features/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [deepRelative, fromFeatures, fromApp] }],
    },
  },
  {
    files: ['web/src/{components,lib,config,hooks}/**/*.{ts,tsx}'],
    rules: {
      'no-restricted-imports': ['error', { patterns: [deepRelative, fromFeatures, fromApp] }],
    },
  },
  {
    // Benchmarks and developer scripts report on the console by design.
    files: ['**/bench/**', '**/scripts/**'],
    rules: { 'no-console': 'off' },
  },
  prettier,
);
