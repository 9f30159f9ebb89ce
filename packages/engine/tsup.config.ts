import { defineConfig } from 'tsup';

// The pool's worker is an entry of its own, so dist/pool/index.js finds it at ./worker.js.
export default defineConfig({
  entry: { index: 'src/index.ts', 'pool/index': 'src/pool/index.ts', 'pool/worker': 'src/pool/worker.ts' },
  format: ['esm'],
  dts: { entry: { index: 'src/index.ts', 'pool/index': 'src/pool/index.ts' } },
  sourcemap: true,
  clean: true,
  target: 'node20',
});
