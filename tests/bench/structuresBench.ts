/**
 * Structure timings (npx tsx tests/bench/structuresBench.ts): loading the structure toolkit
 * (OpenChemLib) in a fresh Node process, reading the 20 structures of a 20-state document,
 * and laying that document out with its drawings once the toolkit has loaded (issue 17
 * target < 100 ms), beside the same layout without drawings (the ratio is the drawings' cost).
 * Medians of several runs after warm-up, CPU time beside wall time.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { analyseDocument } from '../../core/analysis/analyseDocument.ts';
import { readFontMetrics } from '../../core/figure/font/fontMetrics.ts';
import { layoutFigure } from '../../core/figure/layoutFigure.ts';
import { loadStructureToolkit } from '../../core/structure/loadStructureToolkit.ts';
import { pointDepictions } from '../../core/structure/pointDepictions.ts';
import { readStructures } from '../../core/structure/readStructures.ts';
import { manyStructuresDocument } from '../fixtures/structuresDocument.ts';

const metrics = readFontMetrics(new Uint8Array(readFileSync(new URL('../../assets/fonts/DejaVuSans.ttf', import.meta.url))));

function median(runs: number, task: () => unknown, warm = 10): { wall: number; cpu: number } {
  for (let w = 0; w < warm; w++) task();
  const walls: number[] = [], cpus: number[] = [];
  for (let r = 0; r < runs; r++) {
    const c = process.cpuUsage(), t = performance.now();
    task();
    walls.push(performance.now() - t);
    const u = process.cpuUsage(c);
    cpus.push((u.user + u.system) / 1000);
  }
  const mid = (a: number[]) => a.sort((x, y) => x - y)[Math.floor(a.length / 2)]!;
  return { wall: mid(walls), cpu: mid(cpus) };
}

// Toolkit load in fresh processes: the import and module start-up a user waits for once.
const loads: number[] = [];
for (let i = 0; i < 5; i++) {
  const child = spawnSync(process.execPath, ['--input-type=module', '-e', "const t = performance.now(); await import('openchemlib'); console.log(performance.now() - t);"], { encoding: 'utf8' });
  loads.push(Number(child.stdout.trim()));
}
loads.sort((a, b) => a - b);
console.log(`toolkit load (import openchemlib, fresh process): median ${loads[2]!.toFixed(0)} ms (min ${loads[0]!.toFixed(0)}, max ${loads[4]!.toFixed(0)}) over 5 processes`);

const t0 = performance.now();
const toolkit = await loadStructureToolkit();
console.log(`toolkit load in this process: ${(performance.now() - t0).toFixed(0)} ms`);

const doc = manyStructuresDocument(20);
const fresh = () => readStructures(structuredClone(doc), toolkit);
const read = median(10, fresh, 2);
console.log(`read 20 structures (parse, formula, 2D coordinates): ${read.wall.toFixed(1)} ms wall, ${read.cpu.toFixed(1)} ms CPU`);

const table = readStructures(doc, toolkit);
const profile = analyseDocument(doc, table).profile;
const structures = pointDepictions(doc, table);
for (const preset of ['single', 'double'] as const) {
  const withDrawings = median(30, () => layoutFigure(profile, doc, { metrics, preset, structures }));
  const without = median(30, () => layoutFigure(profile, doc, { metrics, preset }));
  console.log(`layout, 20 states, ${preset}: with drawings ${withDrawings.wall.toFixed(1)} ms wall (${withDrawings.cpu.toFixed(1)} ms CPU; target < 100 ms), without ${without.wall.toFixed(1)} ms; ratio ${(withDrawings.wall / without.wall).toFixed(2)}`);
}
