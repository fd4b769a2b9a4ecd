import { describe, expect, it } from 'vitest';
import { auditCounts, auditScene } from '../../../../core/figure/audit/auditScene.ts';
import type { PathItem, Scene, SceneItem, TextItem } from '../../../../core/figure/scene.ts';

// Hand-built scenes in mm: each places one fault (or none) where the geometry is plain to see.
const scene = (items: SceneItem[]): Scene => ({ widthMm: 100, heightMm: 60, background: null, fontFamily: 'x', items, omittedLabels: [] });

function text(x: number, y: number, w: number, h: number, extra: Partial<TextItem> = {}): TextItem {
  return { kind: 'text', role: 'label', x, y: y + h, runs: [{ text: 'T', dx: 0, dy: 0, sizeMm: h }], colour: '#000', box: { x, y, w, h }, ...extra };
}

function line(x0: number, y0: number, x1: number, y1: number, extra: Partial<PathItem> = {}): PathItem {
  return { kind: 'path', role: 'connector', stroke: { colour: '#000', widthMm: 0.2 }, segments: [{ op: 'M', x: x0, y: y0 }, { op: 'L', x: x1, y: y1 }], ...extra };
}

const bar = (x: number, y: number, pathway: string, point: string) => line(x - 5, y, x + 5, y, { role: 'level', pathway, point });
const ids = (pathway: string, point: string) => ({ pathway, point });

describe('auditScene', () => {
  it('finds nothing in a label sitting just above its own level', () => {
    const a = auditScene(scene([bar(50, 30, 'a', 'p'), text(46, 25, 8, 4, ids('a', 'p'))]));
    expect(auditCounts(a)).toEqual({ crossings: 0, overlaps: 0, misread: 0, offPage: 0, legendOverContent: 0 });
  });

  it('counts a stroke through text, a straight line or a curve', () => {
    expect(auditCounts(auditScene(scene([text(40, 20, 10, 4), line(30, 22, 60, 22)]))).crossings).toBe(1);
    const curve: PathItem = { kind: 'path', role: 'connector', stroke: { colour: '#000', widthMm: 0.2 }, segments: [{ op: 'M', x: 30, y: 30 }, { op: 'C', x1: 40, y1: 30, x2: 40, y2: 10, x: 60, y: 10 }] };
    expect(auditCounts(auditScene(scene([text(42, 18, 4, 3), curve]))).crossings).toBeGreaterThan(0);
    // 0.5 mm below the text, a 0.2 mm line passes clear.
    expect(auditCounts(auditScene(scene([text(40, 20, 10, 4), line(30, 24.5, 60, 24.5)]))).crossings).toBe(0);
  });

  it('counts any primitive with a box, whatever its kind, as something text must not cover', () => {
    const drawing = { kind: 'structure', role: 'structure', box: { x: 40, y: 20, w: 10, h: 10 } } as unknown as SceneItem;
    expect(auditCounts(auditScene(scene([drawing, text(45, 25, 8, 4)]))).crossings).toBe(1);
  });

  it('judges a molecule drawing (one group) against the rest, not its bonds against its own atom labels', () => {
    const atom = text(40, 20, 4, 4, { role: 'structure', group: 'structure-a-p' });
    const ownBond = line(30, 22, 41, 22, { role: 'structure', group: 'structure-a-p' });
    expect(auditCounts(auditScene(scene([atom, ownBond]))).crossings).toBe(0);
    expect(auditCounts(auditScene(scene([atom, line(30, 22, 60, 22)]))).crossings).toBe(1);
    expect(auditCounts(auditScene(scene([atom, line(30, 22, 41, 22, { role: 'structure', group: 'structure-a-q' })]))).crossings).toBe(1);
  });

  it('counts overlapping text, but not the lines of one label block', () => {
    expect(auditCounts(auditScene(scene([text(40, 20, 10, 4, { role: 'tick' }), text(45, 22, 10, 4, { role: 'tick' })]))).overlaps).toBe(1);
    expect(auditCounts(auditScene(scene([text(40, 20, 10, 4, ids('a', 'p')), text(40, 24, 10, 4, ids('a', 'p'))]))).overlaps).toBe(0);
  });

  it('counts a label nearer another level than its own, unless a leader joins it to its own', () => {
    // Label a/p sits 1 mm above b/q's bar and 6 mm above its own.
    const items = [bar(50, 30, 'a', 'p'), bar(50, 25, 'b', 'q'), text(46, 20, 8, 4, ids('a', 'p'))];
    expect(auditCounts(auditScene(scene(items))).misread).toBe(1);
    const leader = line(50, 30, 50, 24, { role: 'leader', ...ids('a', 'p') });
    expect(auditCounts(auditScene(scene([...items, leader]))).misread).toBe(0);
  });

  it('counts a label block more than one of its line heights from its own level, unless a leader joins them', () => {
    // Two 4 mm lines; nothing else in the plot, so its own level is the nearest one.
    const block = (y: number) => [text(20, y, 30, 4, { ...ids('a', 'p'), block: 's' }), text(20, y + 4, 30, 4, { ...ids('a', 'p'), block: 's' })];
    expect(auditCounts(auditScene(scene([bar(50, 30, 'a', 'p'), ...block(31.5)]))).misread).toBe(0);
    const far = auditScene(scene([bar(50, 30, 'a', 'p'), ...block(35)]));
    expect(auditCounts(far).misread).toBe(1);
    expect(far.misread[0]!.detail).toMatch(/4\.9 mm from its level/);
    const leader = line(50, 30, 50, 35, { role: 'leader', ...ids('a', 'p') });
    expect(auditCounts(auditScene(scene([bar(50, 30, 'a', 'p'), ...block(35), leader]))).misread).toBe(0);
  });

  it('counts a connector lying between a label and its own level', () => {
    const a = auditScene(scene([bar(50, 30, 'a', 'p'), text(46, 22, 8, 4, ids('a', 'p')), line(30, 28, 70, 28, { pathway: 'b' })]));
    expect(auditCounts(a).misread).toBe(1);
    expect(a.misread[0]!.detail).toMatch(/between/);
  });

  describe('an error bar is part of its level', () => {
    // Level a/p at y 30 (x 45–55) with a bar from y 22 to 38 through x 50; a/q's level lies 12 mm lower.
    const whisker = (x: number, top: number, bottom: number, pathway: string, point: string): PathItem => ({
      kind: 'path', role: 'errorBar', pathway, point, stroke: { colour: '#000', widthMm: 0.1 },
      segments: [{ op: 'M', x, y: top }, { op: 'L', x, y: bottom }, { op: 'M', x: x - 1, y: top }, { op: 'L', x: x + 1, y: top }, { op: 'M', x: x - 1, y: bottom }, { op: 'L', x: x + 1, y: bottom }],
    });
    const own = [bar(50, 30, 'a', 'p'), whisker(50, 22, 38, 'a', 'p')];

    it('crossing its own level\'s label is a fault', () => {
      const a = auditScene(scene([...own, text(46, 25, 8, 4, ids('a', 'p'))]));
      expect(a.crossings.map((f) => f.detail)).toEqual(['errorBar through label "T"']);
    });

    it('never lies between a label and its own level, and a label beside it is next to its level', () => {
      // Right of the bar's upper half, 1 mm from the whisker and 0.5 mm above the bar's end.
      const beside = text(51.2, 25.4, 8, 4, ids('a', 'p'));
      expect(auditCounts(auditScene(scene([...own, beside])))).toEqual({ crossings: 0, overlaps: 0, misread: 0, offPage: 0, legendOverContent: 0 });
      // A label just above the top cap is 8 mm from the bar but 0.5 mm from its own error bar.
      const aboveCap = text(46, 17.5, 8, 4, ids('a', 'p'));
      expect(auditCounts(auditScene(scene([...own, aboveCap]))).misread).toBe(0);
    });

    it('of another level counts as that level: a label nearer it than to its own is misread', () => {
      // b/q's level is far off (y 50) but its bar reaches up to y 27.5, next to a label 6 mm above a/p's level.
      const label = text(56, 20, 8, 4, ids('a', 'p'));
      const items = [bar(50, 30, 'a', 'p'), bar(60, 50, 'b', 'q'), whisker(60, 24.5, 55, 'b', 'q'), label];
      const a = auditScene(scene(items));
      expect(a.misread.map((f) => f.detail)).toEqual(['label "T": nearest level is b/q, not its own']);
    });
  });

  it('accepts a shared label whose nearest level is any of the levels it names', () => {
    const shared = text(46, 31.5, 8, 4, { ...ids('a', 'p'), levels: [ids('a', 'p'), ids('b', 'q')] });
    expect(auditCounts(auditScene(scene([bar(50, 20, 'a', 'p'), bar(50, 30, 'b', 'q'), shared]))).misread).toBe(0);
  });

  it('counts text within 1 mm of the page edge', () => {
    expect(auditCounts(auditScene(scene([text(0.5, 20, 8, 4, { role: 'title' })]))).offPage).toBe(1);
    expect(auditCounts(auditScene(scene([text(1, 1, 8, 4, { role: 'title' })]))).offPage).toBe(0);
    expect(auditCounts(auditScene(scene([text(91.5, 20, 8, 4, { role: 'title' })]))).offPage).toBe(1);
  });

  it('counts plot content reaching into the legend', () => {
    const key = [line(10, 3, 20, 3, { role: 'legend' }), text(22, 1.5, 15, 3, { role: 'legend' })];
    expect(auditCounts(auditScene(scene(key))).legendOverContent).toBe(0);
    expect(auditCounts(auditScene(scene([...key, line(15, 10, 30, 2)]))).legendOverContent).toBe(1);
  });
});
