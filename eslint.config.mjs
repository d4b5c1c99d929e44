// Next's own rules, plus the layering rule of STYLE.md: the pure layers (geometry, layout, checks)
// import nothing of the UI, the framework or the database.
import nextVitals from 'eslint-config-next/core-web-vitals';
import nextTs from 'eslint-config-next/typescript';

const uiAndServer = [
  { name: 'react', message: 'lib/geometry, lib/layout and lib/checks are pure: no React.' },
  { name: 'react-dom', message: 'Pure layer: no React.' },
  { name: 'konva', message: 'Pure layer: no Konva.' },
  { name: 'react-konva', message: 'Pure layer: no Konva.' },
  { name: 'zustand', message: 'Pure layer: no stores.' },
  { name: 'next', message: 'Pure layer: no Next.' },
  { name: 'server-only', message: 'Pure layer: runs on client and server alike.' },
];
const uiAndServerPatterns = [
  { group: ['next/*', 'react/*', 'konva/*', 'zustand/*'], message: 'Pure layer: no UI or framework code.' },
  { group: ['@/db', '@/db/*', '**/db/*', '../db', '../../db', '@/components/*', '@/app/*', 'drizzle-orm', 'drizzle-orm/*', '@electric-sql/*', 'pg'], message: 'Pure layer: no database, components or routes.' },
];

const config = [
  ...nextVitals,
  ...nextTs,
  {
    ignores: ['.next/**', '.next-*/**', 'bench/results.json', 'node_modules/**', 'data/**', 'drizzle/**', 'test-results/**', 'playwright-report/**', 'artifacts/**', 'next-env.d.ts'],
  },
  {
    files: ['lib/geometry/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        paths: uiAndServer,
        patterns: [...uiAndServerPatterns, { group: ['@/lib/*', '../layout/*', '../checks/*', '../layout', '../checks'], message: 'lib/geometry imports nothing of ours: plain numbers in, plain numbers out.' }],
      }],
    },
  },
  {
    files: ['lib/layout/**/*.ts', 'lib/checks/**/*.ts', 'lib/planning/**/*.ts', 'lib/symbols/**/*.ts', 'lib/sheet/**/*.ts', 'lib/format.ts', 'lib/look.ts'],
    rules: { 'no-restricted-imports': ['error', { paths: uiAndServer, patterns: uiAndServerPatterns }] },
  },
  {
    // Server code logs through lib/log, which cuts out tokens, hashes and query parameters.
    files: ['app/**/*.ts', 'lib/**/*.ts', 'db/**/*.ts', 'auth.ts', 'auth.config.ts', 'proxy.ts', 'instrumentation*.ts'],
    ignores: ['lib/fakes/stripe/run.ts'],
    rules: { 'no-console': 'error' },
  },
  {
    // Tests poke at untyped JSON bodies on purpose.
    files: ['tests/**/*.ts', 'tests/**/*.tsx'],
    rules: { '@typescript-eslint/no-explicit-any': 'off' },
  },
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      // TanStack Table and react-hook-form are the stack's choices; the compiler simply skips memoising those components.
      'react-hooks/incompatible-library': 'off',
    },
  },
];

export default config;
