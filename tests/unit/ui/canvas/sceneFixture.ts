import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { readFontMetrics } from '../../../../core/figure/font/fontMetrics.ts';
import { layoutFigure } from '../../../../core/figure/layoutFigure.ts';
import type { DocumentStore } from '../../../../ui/state/documentStore.svelte.ts';

/** The figure font the app ships (DejaVu Sans), read from assets (tests run from the repository root; jsdom's import.meta.url is not a file URL). */
export const metrics = readFontMetrics(new Uint8Array(readFileSync(resolve(process.cwd(), 'assets/fonts/DejaVuSans.ttf'))));

/** The scene the canvas would draw for a store's document. */
export const sceneOf = (store: DocumentStore) => layoutFigure(store.profile, store.doc, { metrics });
