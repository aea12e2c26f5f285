// ESLint flat config. The engine folders must stay pure: no framework, no database,
// no environment. See CONVENTIONS.md (engine rule 1).
import js from '@eslint/js';
import tseslint from 'typescript-eslint';

const engineFolders = [
  'lib/geometry/**', 'lib/kinematics/**', 'lib/features/**', 'lib/program/**',
  'lib/fitting/**', 'lib/evaluation/**', 'lib/capability/**', 'lib/packaging/**',
];

export default tseslint.config(
  { ignores: ['node_modules/**', '.next/**', '.data/**', 'drizzle/**', 'test-results/**', 'playwright-report/**', 'next-env.d.ts'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
      '@typescript-eslint/no-explicit-any': 'error',
    },
  },
  {
    files: engineFolders,
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['next', 'next/*', 'next-auth', 'next-auth/*'], message: 'The engine is framework-free.' },
          { group: ['react', 'react-dom', 'react/*'], message: 'The engine has no React.' },
          { group: ['@/db/*', '@/db', '../db/*', '../../db/*', 'db/*', 'drizzle-orm', 'drizzle-orm/*', 'mysql2', 'mysql2/*'], message: 'The engine never touches the database.' },
          { group: ['@/lib/env', '**/env'], message: 'The engine reads no environment.' },
        ],
      }],
      'no-restricted-properties': ['error', { object: 'process', property: 'env', message: 'The engine reads no environment.' }],
      'no-restricted-globals': ['error', { name: 'Date', message: 'The engine has no clock.' }],
    },
  },
);
