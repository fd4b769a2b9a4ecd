import type { Role, TextItem } from '../scene.ts';
import type { RichLine } from './layoutRichText.ts';

/** A text item for a laid-out line with its left baseline end at (x, y). */
export function textItem(line: RichLine, x: number, y: number, colour: string, role: Role, ids: Pick<TextItem, 'pathway' | 'point' | 'levels' | 'block'> = {}): TextItem {
  return {
    kind: 'text', role, x, y, colour, runs: line.runs,
    box: { x, y: y - line.ascent, w: line.width, h: line.ascent + line.descent },
    ...ids,
  };
}
