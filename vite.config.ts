import { fileURLToPath } from 'node:url'
import react from '@vitejs/plugin-react'
import { defineConfig } from 'vite'
import { contentSecurityPolicy } from './vite.csp'

const alias = { '@': fileURLToPath(new URL('./src', import.meta.url)) }

export default defineConfig({
  plugins: [react(), contentSecurityPolicy()],
  resolve: { alias },
  worker: { format: 'es' },
  build: { sourcemap: true, chunkSizeWarningLimit: 2000 },
})
