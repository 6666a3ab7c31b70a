// Architecture is enforced here, not by goodwill: each folder may import only what DEVELOPERS.md allows.
import js from '@eslint/js'
import reactHooks from 'eslint-plugin-react-hooks'
import globals from 'globals'
import tseslint from 'typescript-eslint'

const ban = (names, patterns = []) => [
  'error',
  {
    paths: names.map((name) => ({ name, message: 'Not allowed in this folder (see DEVELOPERS.md).' })),
    patterns: patterns.map((group) => ({ group: [group], message: 'Not allowed in this folder (see DEVELOPERS.md).' })),
  },
]

const uiLibs = ['react', 'react-dom', 'react-dom/client', 'three', '@react-three/fiber', 'zustand', 'zustand/vanilla']

export default tseslint.config(
  { ignores: ['dist/**', 'node_modules/**', 'artifacts/**', 'coverage/**'] },
  js.configs.recommended,
  ...tseslint.configs.recommended,
  {
    languageOptions: { globals: { ...globals.browser, ...globals.node } },
    rules: {
      eqeqeq: ['error', 'always'],
      'no-console': ['error', { allow: ['warn', 'error'] }],
      '@typescript-eslint/no-unused-vars': [
        'error',
        { argsIgnorePattern: '^_', varsIgnorePattern: '^_', caughtErrorsIgnorePattern: '^_' },
      ],
    },
  },
  {
    files: ['src/**', 'test/**', 'bench/**'],
    rules: {
      'no-restricted-syntax': [
        'error',
        { selector: 'ExportAllDeclaration', message: 'No export *: list exports by name.' },
        { selector: 'ExportDefaultDeclaration', message: 'Named exports only.' },
      ],
    },
  },
  {
    files: ['src/**/*.tsx', 'src/ui/**/*.ts', 'src/viewer/**/*.ts'],
    plugins: { 'react-hooks': reactHooks },
    rules: { 'react-hooks/rules-of-hooks': 'error', 'react-hooks/exhaustive-deps': 'warn' },
  },
  {
    files: ['src/model/**'],
    rules: { 'no-restricted-imports': ban([...uiLibs, 'ml-matrix'], ['@/engine*', '@/editor*', '@/viewer*', '@/ui*', '@/cli*']) },
  },
  {
    files: ['src/engine/**'],
    rules: {
      'no-restricted-imports': ban(uiLibs, ['@/editor*', '@/viewer*', '@/ui*', '@/cli*']),
      'no-restricted-globals': ['error', 'window', 'document'],
    },
  },
  {
    files: ['src/editor/**'],
    rules: {
      'no-restricted-imports': ban(
        ['react', 'react-dom', 'three', '@react-three/fiber', 'zustand', 'ml-matrix'],
        ['@/engine*', '@/viewer*', '@/ui*', '@/cli*'],
      ),
      'no-restricted-globals': ['error', 'window', 'document'],
    },
  },
  {
    files: ['src/report/**'],
    rules: {
      // Reports are pure text builders shared by the CLI and the UI: no DOM, no UI libraries.
      'no-restricted-imports': ban(uiLibs, ['@/editor*', '@/viewer*', '@/ui*', '@/cli*']),
      'no-restricted-globals': ['error', 'window', 'document'],
    },
  },
  {
    files: ['src/viewer/**'],
    rules: { 'no-restricted-imports': ban([], ['@/ui*', '@/cli*']) },
  },
  {
    files: ['src/cli/**'],
    rules: {
      'no-restricted-imports': ban(uiLibs, ['@/editor*', '@/viewer*', '@/ui*']),
      'no-console': 'off',
    },
  },
  {
    files: ['bench/**', 'test/**', 'scripts/**', '.ci/**', '*.config.*'],
    rules: { 'no-console': 'off' },
  },
  {
    files: ['test/**'],
    rules: {
      'no-restricted-properties': [
        'error',
        { object: 'it', property: 'only', message: 'No .only in tests.' },
        { object: 'describe', property: 'only', message: 'No .only in tests.' },
        { object: 'test', property: 'only', message: 'No .only in tests.' },
      ],
    },
  },
)
