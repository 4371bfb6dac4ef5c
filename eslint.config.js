// Lint rules: typescript-eslint recommended, plus import boundaries between runtimes
// (STYLE.md §14): core/ is pure TypeScript, renderer/ never reaches Node or Electron.
import tseslint from 'typescript-eslint';

const nodeBuiltins = ['node:*', 'fs', 'path', 'os', 'child_process', 'crypto', 'url', 'util', 'stream', 'worker_threads'];

export default tseslint.config(
  { ignores: ['node_modules/**', 'dist/**', 'out/**', 'tests/browser/artifacts/**', '**/*.js'] },
  ...tseslint.configs.recommended,
  {
    rules: {
      '@typescript-eslint/no-explicit-any': 'error',
      '@typescript-eslint/no-unused-vars': ['error', { argsIgnorePattern: '^_', varsIgnorePattern: '^_' }],
    },
  },
  {
    files: ['core/**/*.ts'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [
          { group: ['react', 'react-*', 'konva', 'konva/*', 'electron', ...nodeBuiltins], message: 'core/ is pure TypeScript: no DOM, Node, Electron, React or Konva.' },
        ],
      }],
      'no-restricted-globals': ['error', 'window', 'document', 'process', 'require', 'Buffer'],
    },
  },
  {
    files: ['renderer/**/*.ts', 'renderer/**/*.tsx'],
    rules: {
      'no-restricted-imports': ['error', {
        patterns: [{ group: ['electron', ...nodeBuiltins], message: 'renderer/ talks to its host only through renderer/host.' }],
      }],
    },
  },
);
