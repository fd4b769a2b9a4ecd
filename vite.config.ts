import { defineConfig } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';

// The renderer lives in ui/; its build goes to dist/renderer and is loaded by
// Electron from disk (relative base) and by the e2e tests through `vite preview`.
export default defineConfig({
  root: 'ui',
  base: './',
  plugins: [svelte()],
  build: { outDir: '../dist/renderer', emptyOutDir: true, target: 'es2022' },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
});
