// Vite build of the viewer. ELK runs in a module worker (worker.format 'es'), so elkjs lands in the
// worker chunk only; `bulkhead view` serves the dist/ this produces.
import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';

export default defineConfig({
  plugins: [svelte()],
  base: './',
  worker: { format: 'es' },
  optimizeDeps: { include: ['elkjs/lib/elk.bundled.js'] },
  build: { target: 'es2022', sourcemap: false, chunkSizeWarningLimit: 600 },
});
