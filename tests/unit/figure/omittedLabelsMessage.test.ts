import { describe, expect, it } from 'vitest';
import { omittedLabelsMessage } from '../../../core/figure/omittedLabelsMessage.ts';
import type { OmittedLabel } from '../../../core/figure/scene.ts';

const level = (label: string, pathwayName = 'route A'): OmittedLabel => ({ kind: 'level', pathway: 'a', point: `a-${label}`, pathwayName, label });

describe('omittedLabelsMessage', () => {
  it('says nothing when every label was drawn', () => {
    expect(omittedLabelsMessage([])).toBeNull();
  });

  it('names one label, its pathway, and what to do', () => {
    expect(omittedLabelsMessage([level('TS2')])).toBe(
      '1 label found no clear spot inside the figure and is left out: "TS2" (route A); '
      + 'to show it, use a larger figure size or preset, show fewer pathways, place the label by hand, or shorten the labels.',
    );
  });

  it('names a few labels joined with "and", annotation labels by their place in the annotation list', () => {
    const annotation: OmittedLabel = { kind: 'annotation', annotation: 2, pathway: 'b', pathwayName: 'route B', text: 'ΔG‡ = 14.2' };
    expect(omittedLabelsMessage([level('TS2'), level('I3', 'route B'), annotation])).toBe(
      '3 labels found no clear spot inside the figure and are left out: "TS2" (route A), "I3" (route B) and "ΔG‡ = 14.2" (figure annotation 3); '
      + 'to show them, use a larger figure size or preset, show fewer pathways, place those labels by hand, or shorten the labels.',
    );
  });

  it('names the first eight, then counts the rest', () => {
    const many = Array.from({ length: 11 }, (_, i) => level(`I${i}`));
    const message = omittedLabelsMessage(many)!;
    expect(message).toContain('"I6" (route A), "I7" (route A) and 3 more;');
    expect(message).not.toContain('"I8"');
    expect(message.startsWith('11 labels ')).toBe(true);
  });

  it('names a point without a label by its id', () => {
    expect(omittedLabelsMessage([{ kind: 'level', pathway: 'a', point: 'a-7', pathwayName: 'route A', label: '' }])).toContain('the unnamed point "a-7" (route A)');
  });
});
