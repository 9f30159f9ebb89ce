import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { defaultClientConditions, defineConfig } from 'vite';

// In development the API runs separately (pnpm dev:server); Vite forwards /api to it.
const apiTarget = `http://127.0.0.1:${process.env.CAIRN_PORT ?? '4780'}`;

export default defineConfig({
  plugins: [react(), tailwindcss()],
  resolve: { conditions: ['source', ...defaultClientConditions] },
  server: { host: '127.0.0.1', proxy: { '/api': apiTarget } },
  build: { outDir: 'dist', emptyOutDir: true, sourcemap: true },
});
