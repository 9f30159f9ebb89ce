import { mkdtempSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import tailwindcss from '@tailwindcss/vite';
import react from '@vitejs/plugin-react';
import { build, defaultClientConditions } from 'vite';

/**
 * Builds the bench page as the web app is built for `npm start` (Vite production build, React's
 * production bundle, the app's Tailwind styles) into a fresh temporary directory, returned.
 */
export async function buildPicturePage(): Promise<string> {
  const root = fileURLToPath(new URL('./page/', import.meta.url));
  const outDir = mkdtempSync(path.join(os.tmpdir(), 'cairn-picture-'));
  await build({
    root,
    configFile: false,
    logLevel: 'warn',
    base: './',
    plugins: [react(), tailwindcss()],
    resolve: { conditions: ['source', ...defaultClientConditions], dedupe: ['react', 'react-dom'] },
    build: { outDir, emptyOutDir: true },
  });
  return outDir;
}
