import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';
import tseslint from 'typescript-eslint';

/** Next's rules (core web vitals) with typescript-eslint's recommended set; warnings fail `npm test` too. */
export default tseslint.config(
  ...nextVitals,
  ...nextTs,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' }],
      '@typescript-eslint/no-unused-expressions': 'error',
    },
  },
  {
    // Migrations use Kysely<any> on purpose: they are frozen in time and must not follow today's Database type.
    files: ['migrations/**/*.ts', 'db/migrator.ts'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  { ignores: ['.next/**', 'node_modules/**', 'data/**', 'test-results/**', 'playwright-report/**', 'blob-report/**', 'uploads/**', 'next-env.d.ts'] },
);
