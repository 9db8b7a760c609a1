// Lint settings: the recommended rules of ESLint and typescript-eslint, over sources, tests and the
// benchmark. Type-checking itself is `npm run typecheck` (tsc, strict).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

export default tseslint.config(
  { ignores: ['dist/', 'node_modules/', 'coverage/'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    files: ['**/*.ts'],
    rules: {
      '@typescript-eslint/consistent-type-imports': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      eqeqeq: 'error',
      'no-console': ['error', { allow: ['log'] }],
    },
  },
  {
    files: ['bin/**/*.js', 'bench/**/*.js', 'scripts/**/*.js', 'test/**/*.mjs'],
    languageOptions: { globals: { process: 'readonly', console: 'readonly', URL: 'readonly', Buffer: 'readonly', performance: 'readonly', setTimeout: 'readonly' } },
  },
  {
    // The launcher is CommonJS (bin/package.json): it starts without Node's ES module loader.
    files: ['bin/**/*.js'],
    languageOptions: { sourceType: 'commonjs', globals: { require: 'readonly', __dirname: 'readonly' } },
    rules: { '@typescript-eslint/no-require-imports': 'off' },
  },
);
