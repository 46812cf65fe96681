// Lint rules that keep the architecture honest: shared imports neither side, features never
// import each other, the server never imports the client.
import { readdirSync } from 'node:fs';
import { URL } from 'node:url';
import js from '@eslint/js';
import { createTypeScriptImportResolver } from 'eslint-import-resolver-typescript';
import importX from 'eslint-plugin-import-x';
import reactHooks from 'eslint-plugin-react-hooks';
import { builtinRules } from 'eslint/use-at-your-own-risk';
import globals from 'globals';
import tseslint from 'typescript-eslint';

// Every folder in src/features is a feature, so a new one is fenced in without editing this file.
const features = readdirSync(new URL('./src/features', import.meta.url), { withFileTypes: true })
  .filter((entry) => entry.isDirectory())
  .map((entry) => entry.name);

// The core rule under a second name, so the UI-primitive restrictions below do not replace the
// other no-restricted-syntax lists (in flat config, a later entry for a rule overrides earlier ones).
const wortwise = { rules: { 'ui-primitives': builtinRules.get('no-restricted-syntax') } };

const featureZones = features.map((feature) => ({
  target: `./src/features/${feature}`,
  from: './src/features',
  except: [`./${feature}`],
  message: 'A feature never imports another feature; compose them in src/app.',
}));

/** Libraries wrapped once, so nothing else imports them; schema folders are imported whole. */
const oneWayImports = {
  patterns: [
    { group: ['csv-parse', 'csv-parse/*', 'csv-stringify', 'csv-stringify/*'], message: 'Read and write CSV through server/lib/csv.ts (readCsv, writeCsv, formulaSafe).' },
    { group: ['**/schemas/*/inputs', '**/schemas/*/responses'], message: 'Import a schema folder through its index: @shared/schemas/<resource>.' },
  ],
  paths: [
    { name: 'express-rate-limit', message: 'Add a named limit to server/lib/rate-limit.ts; a router takes it from ctx.limits.' },
    { name: 'rate-limit-redis', message: 'The Redis store is wired in server/lib/rate-limit.ts only.' },
  ],
};

/** Syntax with one home: day lengths, the id schema, and a number a brewer types (shared/schemas/fields.ts). */
const oneWaySyntax = [
  { selector: 'Literal[value=86400000]', message: 'Use DAY_MS from shared/dates.ts.' },
  { selector: "Literal[value='Expected a numeric id.']", message: 'Use idSchema or idParamSchema from shared/schemas/common.ts.' },
  {
    selector: "CallExpression[callee.object.name='z'][callee.property.name='number'][arguments.length>0]",
    message: 'Build a number field with num (or checkedNumber, ranged, boundedNumber) from shared/schemas/fields.ts.',
  },
];

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
    // One way to do each thing: CSV goes through server/lib/csv.ts (one reader, one writer, one
    // formula guard); every rate limit is built in server/lib/rate-limit.ts, from configuration.
    files: ['**/*.{ts,tsx}'],
    ignores: ['server/lib/csv.ts', 'server/lib/rate-limit.ts', 'server/*/router.ts'],
    rules: { 'no-restricted-imports': ['error', oneWayImports] },
  },
  {
    // One way to count days: spans use DAY_MS, calendar days localDay/utcDay (shared/dates.ts, decision 0011);
    // one schema for an id in a URL (idSchema in shared/schemas/common.ts); one number builder (num,
    // and checkedNumber, ranged, boundedNumber on top of it, in shared/schemas/fields.ts).
    files: ['**/*.{ts,tsx}'],
    ignores: ['shared/dates.ts', 'shared/schemas/common.ts', 'shared/schemas/fields.ts', '**/*.test.ts', '**/*.test.tsx'],
    rules: {
      'no-restricted-syntax': [
        'error',
        ...oneWaySyntax,
      ],
    },
  },
  {
    // One query-key scheme: every key comes from the feature's api/keys.ts.
    files: ['src/features/**/*.{ts,tsx}'],
    ignores: ['src/features/*/api/keys.ts', '**/*.test.tsx'],
    rules: {
      'no-restricted-syntax': [
        'error',
        { selector: "Property[key.name='queryKey'] > ArrayExpression", message: "Build query keys in the feature's api/keys.ts." },
        ...oneWaySyntax,
      ],
    },
  },
  {
    // A router is thin: it validates, checks who is signed in and calls a service. It never touches
    // tables or the pool; its one argument is the RouterContext (server/context.ts).
    files: ['server/*/router.ts'],
    rules: {
      'no-restricted-imports': [
        'error',
        {
          patterns: [
            ...oneWayImports.patterns,
            { group: ['**/db/schema', '**/db/schema/*', '**/db/client'], message: 'A router never touches tables: call a service (server/<feature>/service.ts).' },
            { group: ['drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*'], message: 'A router never touches tables: call a service (server/<feature>/service.ts).' },
          ],
          paths: oneWayImports.paths,
        },
      ],
      'no-restricted-syntax': [
        'error',
        ...oneWaySyntax,
        { selector: "MemberExpression[property.name='pool']", message: 'A router never queries the database: call a service (server/<feature>/service.ts).' },
      ],
    },
  },
  {
    // One way to draw the common pieces (src/components/ui): a labelled select, a segmented
    // choice, a label-and-value figure, and one parser for a number as typed.
    files: ['src/**/*.{ts,tsx}'],
    ignores: [
      'src/components/ui/select-field.tsx',
      'src/components/ui/segmented-control.tsx',
      'src/components/ui/figure.tsx',
      'src/lib/decimal.ts',
      '**/*.test.ts',
      '**/*.test.tsx',
      // The public check's "Read with" choice stays native radio inputs, each with its <label>:
      // the page anyone can open keeps the form semantics it was published with.
      'src/features/late-boil/components/late-boil-check.tsx',
    ],
    plugins: { wortwise },
    rules: {
      'wortwise/ui-primitives': [
        'error',
        { selector: "JSXOpeningElement[name.name='select']", message: 'Use Select or SelectField from src/components/ui/select-field.tsx.' },
        { selector: "JSXOpeningElement[name.name='Field'] > JSXAttribute[name.name='as'][value.value='select']", message: 'Use SelectField from src/components/ui/select-field.tsx.' },
        { selector: "JSXAttribute[name.name='role'][value.value='radiogroup']", message: 'Use SegmentedControl from src/components/ui/segmented-control.tsx.' },
        { selector: "JSXOpeningElement[name.name='dt']", message: 'Use Figure from src/components/ui/figure.tsx for a label and its value.' },
        { selector: "CallExpression[callee.property.name='replace'][arguments.0.value=',']", message: 'Read a typed number with parseDecimal from src/lib/decimal.ts.' },
      ],
    },
  },
  {
    // A client file is read in one sitting: a form that grows past this becomes a folder of sections
    // (as src/features/recipes/components/recipe-form/ did).
    files: ['src/**/*.tsx'],
    ignores: ['**/*.test.tsx'],
    rules: { 'max-lines': ['error', { max: 400, skipBlankLines: true, skipComments: true }] },
  },
);
