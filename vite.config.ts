import { defineConfig, type Plugin } from 'vite';
import { svelte } from '@sveltejs/vite-plugin-svelte';

/**
 * Asks the browser for the figure font while it still parses the app's script: the canvas
 * cannot lay text out before the font's metrics are read (ui/state/figureFont.svelte.ts),
 * and without this the request starts only once the whole bundle has run. `crossorigin`
 * matches fetch()'s default mode, so the app's fetch reuses the preloaded response.
 */
function preloadFigureFont(): Plugin {
  return {
    name: 'passline-preload-figure-font',
    transformIndexHtml: {
      order: 'post',
      handler(_html, ctx) {
        const font = Object.keys(ctx.bundle ?? {}).find((name) => /DejaVuSans-[\w-]+\.ttf$/.test(name));
        if (!font) return [];
        return [{ tag: 'link', attrs: { rel: 'preload', href: `./${font}`, as: 'fetch', type: 'font/ttf', crossorigin: '' }, injectTo: 'head' }];
      },
    },
  };
}

// The renderer lives in ui/; its build goes to dist/renderer and is loaded by
// Electron from disk (relative base) and by the e2e tests through `vite preview`.
export default defineConfig({
  root: 'ui',
  base: './',
  plugins: [svelte(), preloadFigureFont()],
  build: { outDir: '../dist/renderer', emptyOutDir: true, target: 'es2022' },
  preview: { host: '127.0.0.1', port: 4173, strictPort: true },
});
