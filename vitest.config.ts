import { defineConfig } from 'vitest/config'
import { alias } from './vite.config'

export default defineConfig({
  resolve: { alias },
  test: {
    environment: 'node',
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    exclude: ['test/browser/**', 'node_modules/**'],
    testTimeout: 30000,
  },
})
