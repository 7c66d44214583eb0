// Lint rules of the project, and the layer rule that keeps each part in its place:
//   shared ← server;   shared ← src/resources ← src/features ← src/app
// A feature never imports another feature (pages compose them); nothing imports upwards.
import fs from 'node:fs';
import js from '@eslint/js';
import prettier from 'eslint-config-prettier';
import reactHooks from 'eslint-plugin-react-hooks';
import globals from 'globals';
import tseslint from 'typescript-eslint';

const features = fs
  .readdirSync('src/features', { withFileTypes: true })
  .filter((d) => d.isDirectory())
  .map((d) => d.name);

/** One restriction: an import specifier matching `regex` is refused with `message`. */
const refuse = (regex, message) => ({ regex, message });
const serverCode = refuse('^@server/|(^|/)server/', 'The client and shared code never import the server.');
const clientCode = refuse('^@/|(^|/)src/', 'Only the client imports client code.');
const appCode = refuse('^@/app/|(^|/)app/routes/', 'Only the app (routes, router) imports the app.');
const anyFeature = refuse('^@/features/|(^|/)features/', 'Features sit above this layer: import a resource or a primitive instead.');
const resources = refuse('^@/resources/', 'Resources sit above this layer.');

const layers = (files, patterns) => ({ files, rules: { 'no-restricted-imports': ['error', { patterns }] } });

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'test-results/**', 'playwright-report/**', 'drizzle/**', '.data/**', 'public/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.{ts,tsx}'],
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', destructuredArrayIgnorePattern: '^_' },
      ],
      '@typescript-eslint/consistent-type-imports': ['error', { fixStyle: 'inline-type-imports' }],
      eqeqeq: ['error', 'always', { null: 'ignore' }],
      'no-console': ['error', { allow: ['warn', 'error'] }],
    },
  },
  {
    files: ['src/**/*.{ts,tsx}'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'error' },
  },
  { files: ['scripts/**/*.ts', 'tests/**/*.ts', 'server/**/*.ts'], rules: { 'no-console': 'off' } },

  // ---- the layers ----
  layers(['shared/**/*.ts'], [serverCode, clientCode]),
  layers(['server/**/*.ts'], [clientCode]),
  layers(['src/lib/**/*.{ts,tsx}', 'src/components/**/*.{ts,tsx}', 'src/config/**/*.ts'], [serverCode, appCode, anyFeature, resources]),
  layers(['src/resources/**/*.ts'], [serverCode, appCode, anyFeature]),
  ...features.map((feature) =>
    layers(
      [`src/features/${feature}/**/*.{ts,tsx}`],
      [
        serverCode,
        appCode,
        refuse(
          `^@/features/(?!${feature}/)`,
          `A feature never imports another feature: move what ${feature} needs into a resource, a primitive or shared/.`,
        ),
        refuse('^\\.\\./\\.\\./', 'Import other parts of the client by their alias (@/…), not by climbing out of the feature.'),
      ],
    ),
  ),
  layers(['src/app/**/*.{ts,tsx}', 'src/main.tsx'], [serverCode]),
  prettier,
);
