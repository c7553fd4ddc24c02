// Svelte compiler settings for the viewer. Compiler warnings in our own code fail the build:
// svelte-check --fail-on-warnings covers the check step, this covers `vite build`.
import { vitePreprocess } from '@sveltejs/vite-plugin-svelte';

export default {
  preprocess: vitePreprocess(),
  onwarn(warning, defaultHandler) {
    if (warning.filename && !warning.filename.includes('node_modules')) {
      throw new Error(`svelte warning treated as error: ${warning.code} ${warning.message} (${warning.filename})`);
    }
    defaultHandler(warning);
  },
};
