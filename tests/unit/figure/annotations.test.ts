import { describe, expect, it } from 'vitest';
import { layoutFigure } from '../../../core/figure/layoutFigure.ts';
import { annotationFindings, annotationProblems } from '../../../core/figure/annotationPlans.ts';
import type { Figure } from '../../../core/model/schema.ts';
import type { PathItem, Scene } from '../../../core/figure/scene.ts';
import { fontMetrics } from './fontFixture.ts';
import { fixture, twoPathways, type PointSpec } from './profileFixture.ts';
import { barBoxes, intersects, labelBoxes, paths, textOf, texts } from './sceneQueries.ts';

const metrics = fontMetrics();

/** A catalytic cycle as a document + profile (typed values in kcal/mol). */
function cycle(points: PointSpec[], annotations: Figure['annotations']) {
  const { doc, profile } = fixture([{ id: 'c', name: 'cycle', points }], { annotations });
  doc.pathways[0]!.cycle = true;
  profile.pathways[0]!.cycle = true;
  return { doc, profile };
}

// REFERENCE.md §6, Kozuch & Shaik, Acc. Chem. Res. 44, 101 (2011): cycle A (TDTS T3 after TDI I2, δE 22.5 kcal/mol)
// and cycle B (TDTS T1 before TDI I4, δE = T1 − I4 + ΔG_r = 22.0 kcal/mol).
const CYCLE_A: PointSpec[] = [['I1', 'min', 0], ['T1', 'ts', 12], ['I2', 'min', -6], ['T2', 'ts', 15], ['I3', 'min', -4.5], ['T3', 'ts', 16.5], ['I4', 'min', -3], ['T4', 'ts', 8], ["I1'", 'min', -2]];
const CYCLE_B: PointSpec[] = [['I1', 'min', 0], ['T1', 'ts', 20], ['I2', 'min', 4], ['T2', 'ts', 19], ['I3', 'min', -10], ['T3', 'ts', -3], ['I4', 'min', -18], ['T4', 'ts', -4], ["I1'", 'min', -16]];

const barY = (scene: Scene, point: string) => (paths(scene, 'level').find((p) => p.point === point)!.segments[0] as { y: number }).y;
const barX = (scene: Scene, point: string) => {
  const [a, b] = paths(scene, 'level').find((p) => p.point === point)!.segments as { x: number }[];
  return (a!.x + b!.x) / 2;
};
/** mm per kcal/mol from two bars a known energy apart. */
const mmPer = (scene: Scene, a: string, b: string, delta: number) => (barY(scene, a) - barY(scene, b)) / delta;
/** Vertical extent of the annotation strokes that sit at x. */
function verticalAt(scene: Scene, x: number): [number, number] {
  const ys = paths(scene, 'annotation').filter((p) => p.stroke && !p.stroke.dashMm).flatMap((p: PathItem) => p.segments)
    .filter((s): s is { op: 'M' | 'L'; x: number; y: number } => (s.op === 'M' || s.op === 'L') && Math.abs(s.x - x) < 1e-9).map((s) => s.y);
  return [Math.min(...ys), Math.max(...ys)];
}
const annotationText = (scene: Scene) => texts(scene, 'annotation').map(textOf);

describe('energetic span annotation', () => {
  it('brackets the TDI up to the TDTS and prints δE (cycle A)', () => {
    const { doc, profile } = cycle(CYCLE_A, [{ type: 'span', pathway: 'c' }]);
    const scene = layoutFigure(profile, doc, { metrics });
    expect(annotationText(scene)).toEqual(['δE = 22.5']);
    const x = barX(scene, 'c-5');
    const [top, bottom] = verticalAt(scene, x);
    const half = paths(scene, 'level')[0]!.stroke!.widthMm / 2;
    expect(bottom).toBeCloseTo(barY(scene, 'c-2'), 9);
    expect(top).toBeCloseTo(barY(scene, 'c-5') + half, 9);
    // The bracket is δE tall on the energy scale.
    expect((bottom - top + half) / mmPer(scene, 'c-0', 'c-1', 12)).toBeCloseTo(22.5, 6);
  });

  it('in the wrap-around case reaches the next turnover’s TDTS, T + ΔG_r, and says so (cycle B)', () => {
    const { doc, profile } = cycle(CYCLE_B, [{ type: 'span', pathway: 'c' }]);
    const scene = layoutFigure(profile, doc, { metrics });
    expect(annotationText(scene)).toEqual(['δE = 22.0', 'to T1 of the next turnover']);
    // Drawn above the TDI I4; its top is T1 + ΔG_r = 20 − 16 = +4.0, the height of I2.
    const [top] = verticalAt(scene, barX(scene, 'c-6'));
    expect(top).toBeCloseTo(barY(scene, 'c-2'), 9);
  });

  it('is left out with a finding when the pathway is not a cycle or does not exist', () => {
    const { doc, profile } = twoPathways({ annotations: [{ type: 'span', pathway: 'cat' }, { type: 'span', pathway: 'nope' }] });
    expect(paths(layoutFigure(profile, doc, { metrics }), 'annotation')).toHaveLength(0);
    expect(annotationFindings(profile, doc).map((f) => f.code)).toEqual(['annotation-not-cycle', 'annotation-unknown-pathway']);
    expect([...annotationProblems(profile, doc)]).toEqual([[0, 'pathway "with catalyst" is not marked as a catalytic cycle'], [1, 'there is no pathway "nope"']]);
  });

  it('is left out, by its index and the pathway\'s name, when its cycle is hidden', () => {
    const { doc, profile } = cycle(CYCLE_A, [{ type: 'text', text: 'note', x: 1, y: 0 }, { type: 'span', pathway: 'c' }]);
    doc.pathways[0]!.style = { ...doc.pathways[0]!.style, visible: false };
    expect(annotationText(layoutFigure(profile, doc, { metrics }))).toEqual(['note']);
    expect([...annotationProblems(profile, doc)]).toEqual([[1, 'pathway "cycle" is hidden']]);
    expect(annotationFindings(profile, doc)[0]).toMatchObject({ code: 'annotation-pathway-hidden', pathway: 'c', message: 'figure annotation 2 (span): pathway "cycle" is hidden; it is not drawn' });
  });
});

describe('barrier annotation', () => {
  it('draws a double arrow at the TS from the start level, labelled with the difference', () => {
    const { doc, profile } = twoPathways({ annotations: [{ type: 'barrier', pathway: 'cat', from: 'cat-0', to: 'cat-1' }] });
    const scene = layoutFigure(profile, doc, { metrics });
    // Fixture values (ours): A + B 0.0, TS1 +14.2 kcal/mol.
    expect(annotationText(scene)).toEqual(['ΔG‡ = 14.2']);
    const heads = paths(scene, 'annotation').filter((p) => p.fill);
    expect(heads).toHaveLength(1);
    const tips = heads[0]!.segments.filter((s): s is { op: 'M'; x: number; y: number } => s.op === 'M');
    expect(tips.map((t) => t.x)).toEqual([barX(scene, 'cat-1'), barX(scene, 'cat-1')]);
    expect(tips[0]!.y).toBeCloseTo(barY(scene, 'cat-0'), 9);
    expect(tips[1]!.y).toBeGreaterThan(barY(scene, 'cat-1'));
    // A dotted guide joins the start level to the arrow.
    expect(paths(scene, 'annotation').some((p) => p.stroke?.dashMm)).toBe(true);
  });

  it('names an unknown point and draws nothing for it', () => {
    const { doc, profile } = twoPathways({ annotations: [{ type: 'barrier', pathway: 'cat', from: 'cat-0', to: 'zz' }] });
    expect(paths(layoutFigure(profile, doc, { metrics }), 'annotation')).toHaveLength(0);
    const [finding] = annotationFindings(profile, doc);
    expect(finding).toMatchObject({ code: 'annotation-point', point: 'zz' });
    expect(finding!.message).toMatch(/no point "zz"/);
  });
});

describe('free text and clearance', () => {
  it('centres free text on its slot and energy', () => {
    const { doc, profile } = twoPathways({ annotations: [{ type: 'text', text: 'H_2 evolves', x: 2, y: 14.2 }] });
    const scene = layoutFigure(profile, doc, { metrics });
    const item = texts(scene, 'annotation')[0]!;
    expect(textOf(item)).toBe('H2 evolves');
    // Slot 2 of the catalysed route is Int1; energy +14.2 is the height of TS1.
    expect(item.box.x + item.box.w / 2).toBeCloseTo(barX(scene, 'cat-2'), 9);
    expect(item.box.y + item.box.h / 2).toBeCloseTo(barY(scene, 'cat-1'), 9);
  });

  it('keeps annotation labels off point labels, bars and each other', () => {
    const { doc, profile } = twoPathways({ annotations: [
      { type: 'barrier', pathway: 'cat', from: 'cat-0', to: 'cat-1' }, { type: 'barrier', pathway: 'cat', from: 'cat-2', to: 'cat-3' },
      { type: 'barrier', pathway: 'un', from: 'un-0', to: 'un-1' }, { type: 'text', text: 'note', x: 1, y: 20 },
    ] });
    for (const preset of ['single', 'double', 'slide'] as const) {
      const scene = layoutFigure(profile, doc, { metrics, preset });
      const notes = texts(scene, 'annotation').map((t) => t.box);
      expect(notes).toHaveLength(4);
      const others = [...labelBoxes(scene), ...barBoxes(scene)];
      notes.forEach((a, i) => {
        for (const b of others) expect(intersects(a, b)).toBe(false);
        for (const b of notes.slice(i + 1)) expect(intersects(a, b)).toBe(false);
      });
    }
  });
});
