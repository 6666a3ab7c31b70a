import { fileURLToPath } from 'node:url'
import { defineConfig } from 'vitest/config'

const alias = { '@': fileURLToPath(new URL('./src', import.meta.url)) }

// Browser tests: playwright-core drives Debian's /usr/bin/chromium against the built app (dist/).
export default defineConfig({
  resolve: { alias },
  test: {
    environment: 'node',
    include: ['test/browser/**/*.test.ts'],
    testTimeout: 120000,
    hookTimeout: 120000,
    fileParallelism: false,
  },
})
