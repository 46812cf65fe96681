// Lint rules that keep the architecture honest: shared imports neither side, features never
// import each other, the server never imports the client.
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const featureZones = ['auth', 'recipes', 'instruments', 'brews', 'late-boil', 'fermentation', 'clubs', 'admin'].map((feature) => ({
  target: `./src/features/${feature}`,
  from: './src/features',
  except: [`./${feature}`],
  message: 'A feature never imports another feature; compose them in src/app.',
}));

export default tseslint.config(
  { ignores: ['dist', '.data', 'node_modules', 'migrations', 'coverage'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    plugins: { 'import-x': importX, 'react-hooks': reactHooks },
    settings: { 'import-x/resolver-next': [createTypeScriptImportResolver({ project: './tsconfig.json' })] },
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' }],
      '@typescript-eslint/no-namespace': 'off',
      'import-x/no-cycle': 'error',
      'import-x/no-restricted-paths': [
        'error',
        {
          zones: [
            { target: './shared', from: ['./src', './server'], message: 'shared/ imports neither side.' },
            { target: './server', from: './src', message: 'The server never imports client code.' },
            { target: './src', from: './server', message: 'The client talks to the server over HTTP only.' },
            { target: ['./src/features', './src/components', './src/lib'], from: './src/app', message: 'Only src/app composes features.' },
            { target: ['./src/components', './src/lib'], from: './src/features', message: 'Shared UI and lib never import a feature.' },
            ...featureZones,
          ],
        },
      ],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    rules: reactHooks.configs.recommended.rules,
  },
  {
    // Every rate limit is built in one place, from configuration, with the shared store.
    files: ['server/**/*.ts'],
    ignores: ['server/lib/rate-limit.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          paths: [
            { name: 'express-rate-limit', message: 'Add a named limit to server/lib/rate-limit.ts and take its middleware as a router argument.' },
            { name: 'rate-limit-redis', message: 'The Redis store is wired in server/lib/rate-limit.ts only.' },
          ],
        },
      ],
    },
  },
);
