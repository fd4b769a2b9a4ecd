/**
 * Figure timings (npx tsx tests/bench/figureBench.ts): layout + SVG for 10 pathways × 50
 * points (issue 5 target < 30 ms) and PDF with font subsetting (target < 300 ms).
 * Prints the median of several runs after a warm-up.
 */
import { readFileSync } from 'node:fs';
import { layoutFigure } from '../../core/figure/layoutFigure.ts';
import { readFontMetrics } from '../../core/figure/font/fontMetrics.ts';
import { sceneToSvg } from '../../core/export/sceneToSvg.ts';
import { sceneToPdf } from '../../core/export/sceneToPdf.ts';
import { subsetFontNode } from '../../core/export/subsetFont.node.ts';
import { makeDocument } from '../../core/model/load.ts';
import type { ResolvedProfile } from '../../core/profile/types.ts';

const fontBytes = new Uint8Array(readFileSync(new URL('../../assets/fonts/DejaVuSans.ttf', import.meta.url)));
const metrics = readFontMetrics(fontBytes);

// Invented profiles: a deterministic zig-zag per pathway, offset a little per pathway.
const pathways = Array.from({ length: 10 }, (_, p) => ({
  id: `p${p}`, name: `pathway ${p + 1}`,
  points: Array.from({ length: 50 }, (_, i) => ({
    id: `p${p}-${i}`, label: i % 2 ? `TS${i}` : `I${i}`, kind: (i % 2 ? 'ts' : 'min') as 'ts' | 'min',
    kcal: (i % 2 ? 15 : -2) + 6 * Math.sin(i * 0.7 + p) + p * 0.3,
  })),
}));
const doc = makeDocument({
  figure: { preset: 'double' },
  pathways: pathways.map((p) => ({ id: p.id, name: p.name, points: p.points.map((q) => ({ id: q.id, label: q.label, kind: q.kind, energy: { mode: 'value', value: q.kcal, unit: 'kcal/mol' } })) })),
});
const profile: ResolvedProfile = {
  quantity: 'G', unit: 'kcal/mol', temperatureK: 298.15, findings: [],
  pathways: pathways.map((p) => ({ id: p.id, name: p.name, cycle: false, points: p.points.map((q) => ({
    id: q.id, label: q.label, kind: q.kind, energyJ: q.kcal * 4184, provenance: { route: 'typed', detail: 'bench', approximations: [] },
  })) })),
};

async function median(runs: number, task: () => unknown): Promise<number> {
  await task();
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const t = performance.now();
    await task();
    times.push(performance.now() - t);
  }
  return times.sort((a, b) => a - b)[Math.floor(runs / 2)]!;
}

const svgMs = await median(9, () => sceneToSvg(layoutFigure(profile, doc, { metrics })));
const scene = layoutFigure(profile, doc, { metrics });
const pdfMs = await median(5, () => sceneToPdf(scene, { fontBytes, subsetFont: subsetFontNode }));
const pdfBytes = (await sceneToPdf(scene, { fontBytes, subsetFont: subsetFontNode })).length;
console.log(`layout + SVG, 10 pathways × 50 points: ${svgMs.toFixed(1)} ms (target < 30 ms)`);
console.log(`PDF with subset font (same scene): ${pdfMs.toFixed(1)} ms, ${(pdfBytes / 1024).toFixed(1)} KB (target < 300 ms)`);
