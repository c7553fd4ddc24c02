// Vite build of the viewer. ELK runs in a module worker (worker.format 'es'), so elkjs lands in the
// worker chunk only; `bulkhead view` serves the dist/ this produces.
import { defaultClientConditions, defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';

export default defineConfig({
  plugins: [svelte()],
  base: './',
  // Our packages from their sources, not their build output (see scripts/build.mjs).
  resolve: { conditions: ['bulkhead-source', ...defaultClientConditions] },
  worker: { format: 'es' },
  optimizeDeps: { include: ['elkjs/lib/elk.bundled.js'] },
  build: { target: 'es2022', sourcemap: false, chunkSizeWarningLimit: 600 },
});
