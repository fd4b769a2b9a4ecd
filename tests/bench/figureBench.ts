/**
 * Figure timings (npx tsx tests/bench/figureBench.ts): layout + SVG for 10 pathways × 50
 * points (issue 5 target < 30 ms), PDF with font subsetting (target < 300 ms), the whole
 * `passline render` process cold, and — where python3 has matplotlib — a plain matplotlib
 * script drawing the same levels and connectors to PDF, with the ratio.
 * Prints medians of several runs after warm-up; CPU time beside wall time, since other
 * work on the machine inflates wall time.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
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

/** Median wall and CPU (user + system) time of `runs` runs after `warm` warm-up runs, ms (enough warm-up for V8 to finish optimising, so the numbers are steady-state). */
async function median(runs: number, task: () => unknown, warm = 30): Promise<{ wall: number; cpu: number }> {
  for (let w = 0; w < warm; w++) await task();
  const walls: number[] = [];
  const cpus: number[] = [];
  for (let r = 0; r < runs; r++) {
    const c = process.cpuUsage();
    const t = performance.now();
    await task();
    walls.push(performance.now() - t);
    const used = process.cpuUsage(c);
    cpus.push((used.user + used.system) / 1000);
  }
  const mid = (v: number[]) => v.sort((a, b) => a - b)[Math.floor(v.length / 2)]!;
  return { wall: mid(walls), cpu: mid(cpus) };
}
const show = (t: { wall: number; cpu: number }) => `${t.wall.toFixed(1)} ms wall (${t.cpu.toFixed(1)} ms CPU)`;

const svg = await median(31, () => sceneToSvg(layoutFigure(profile, doc, { metrics })));
const scene = layoutFigure(profile, doc, { metrics });
const pdf = await median(7, () => sceneToPdf(scene, { fontBytes, subsetFont: subsetFontNode }), 2);
const pdfBytes = (await sceneToPdf(scene, { fontBytes, subsetFont: subsetFontNode })).length;
console.log(`layout + SVG, 10 pathways × 50 points: ${show(svg)} (target < 30 ms); ${scene.omittedLabels.length} of 500 labels left out for want of room`);
console.log(`PDF with subset font (same scene): ${show(pdf)}, ${(pdfBytes / 1024).toFixed(1)} KB (target < 300 ms)`);

// The issue-11 corpus in every preset and theme: the audit's fault count (target 0) and the time it takes to lay out.
{
  const { FIGURE_CORPUS } = await import('../fixtures/figureCorpus.ts');
  const { resolveProfile } = await import('../../core/profile/resolve.ts');
  const { auditCounts, auditScene } = await import('../../core/figure/audit/auditScene.ts');
  let faults = 0;
  let omitted = 0;
  let figures = 0;
  const c = process.cpuUsage();
  const jobs = FIGURE_CORPUS.flatMap((e) => (['single', 'double', 'slide'] as const).flatMap((preset) => (['colour', 'greyscale', 'dark'] as const).map((theme) => ({ e, preset, theme }))));
  const scenes = jobs.map(({ e, preset, theme }) => layoutFigure(resolveProfile(e.doc), e.doc, { metrics, preset, theme }));
  const used = process.cpuUsage(c);
  for (const s of scenes) {
    faults += Object.values(auditCounts(auditScene(s))).reduce((a, b) => a + b, 0);
    omitted += s.omittedLabels.length;
    figures++;
  }
  console.log(`figure corpus: ${figures} figures laid out in ${((used.user + used.system) / 1000).toFixed(0)} ms CPU; audit faults ${faults} (target 0); ${omitted} labels left out for want of room`);
}

const root = fileURLToPath(new URL('../../', import.meta.url));
const cli = `${root}core/cli/passline.mjs`;
const demo = `${root}assets/demo/demo.passline`;
const probe = spawnSync(process.execPath, [cli, 'help'], { encoding: 'utf8' });
if (!existsSync(cli) || !/\brender\b/.test(`${probe.stdout}${probe.stderr}`)) {
  console.log('passline render, cold process: skipped (the CLI has no render command yet)');
} else {
  const t = performance.now();
  const run = spawnSync(process.execPath, [cli, 'render', demo, '-o', '/tmp/passline-bench.svg'], { encoding: 'utf8' });
  const ms = performance.now() - t;
  console.log(run.status === 0 ? `passline render demo → SVG, cold process: ${ms.toFixed(0)} ms` : `passline render failed (exit ${run.status}): ${run.stderr.trim()}`);
}

const hasMatplotlib = spawnSync('python3', ['-c', 'import matplotlib'], { encoding: 'utf8' }).status === 0;
if (!hasMatplotlib) {
  console.log('matplotlib comparison: skipped (python3 cannot import matplotlib; Debian python3-matplotlib is not installed)');
} else {
  // The script times its own import + drawing + PDF; the process start is left out on both sides.
  const runs = Array.from({ length: 3 }, () => Number(execFileSync('python3', [`${root}tests/bench/figureMatplotlib.py`, '/tmp/passline-bench-mpl.pdf'], { encoding: 'utf8' }).trim()));
  const mpl = runs.sort((a, b) => a - b)[1]!;
  const ours = svg.wall + pdf.wall;
  console.log(`matplotlib, same levels and connectors to PDF: ${mpl.toFixed(1)} ms; Passline layout + SVG + PDF ${ours.toFixed(1)} ms (ratio ${(mpl / ours).toFixed(2)})`);
}
