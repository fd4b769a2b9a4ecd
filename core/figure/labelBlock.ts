import type { Figure } from '../model/schema.ts';
import type { EnergyUnit } from '../units/energy.ts';
import type { FontMetrics } from './font/fontMetrics.ts';
import { formatEnergy } from './formatEnergy.ts';
import type { Box, TextItem } from './scene.ts';
import { autoSubscript } from './text/autoSubscript.ts';
import { layoutRichText, type RichLine } from './text/layoutRichText.ts';
import { parseMarkup, type Span } from './text/parseMarkup.ts';
import { textItem } from './text/textItem.ts';

/** Settings shared by all point labels of a figure. */
export interface LabelStyle {
  metrics: FontMetrics;
  sizeMm: number;
  decimals: number;
  energyFormat: Figure['energyFormat'];
  unit: EnergyUnit;
  daggerOnTs: boolean;
  autoSubscript: boolean;
}

/** A point label: its name line (may be empty) over its energy line, measured. */
export interface LabelBlock {
  name: RichLine | null;
  energy: RichLine;
  energyText: string;
  w: number;
  h: number;
  /** Further name lines, one per other name of a state that pathways call differently. */
  more?: RichLine[];
}

/** Gap between the name and energy lines, in em (our choice). */
const LINE_GAP_EM = 0.05;

/** Builds and measures the label of a level; ‡ is raised after a TS name when asked. */
export function labelBlock(label: string, kind: 'min' | 'ts', energy: number, style: LabelStyle): LabelBlock {
  const spans = labelSpans(label, kind, style);
  const name = spans.length > 0 ? layoutRichText(spans, style.metrics, style.sizeMm) : null;
  const energyText = formatEnergy(energy, style.decimals, style.energyFormat, style.unit);
  const energyLine = layoutRichText([{ text: energyText, shift: 'base' }], style.metrics, style.sizeMm);
  const gap = name ? LINE_GAP_EM * style.sizeMm : 0;
  const nameH = name ? name.ascent + name.descent : 0;
  return {
    name, energy: energyLine, energyText,
    w: Math.max(name?.width ?? 0, energyLine.width),
    h: nameH + gap + energyLine.ascent + energyLine.descent,
  };
}

/**
 * The label of one state under several names (pathways that call it differently): each
 * name on its own line, above the one energy line.
 */
export function namesBlock(labels: readonly string[], kind: 'min' | 'ts', energy: number, style: LabelStyle): LabelBlock {
  const first = labelBlock(labels[0]!, kind, energy, style);
  const more = labels.slice(1).map((l) => layoutRichText(labelSpans(l, kind, style), style.metrics, style.sizeMm));
  const extra = more.reduce((h, l) => h + l.ascent + l.descent + LINE_GAP_EM * style.sizeMm, 0);
  return { ...first, more, w: Math.max(first.w, ...more.map((l) => l.width)), h: first.h + extra };
}

/** The spans of a level's name as printed: markup read, digits lowered when asked, ‡ after a TS name. */
export function labelSpans(label: string, kind: 'min' | 'ts', style: LabelStyle): Span[] {
  let spans: Span[] = parseMarkup(label);
  if (style.autoSubscript) spans = autoSubscript(spans);
  if (kind === 'ts' && style.daggerOnTs && spans.length > 0 && !label.includes('‡')) spans = [...spans, { text: '‡', shift: 'sup' }];
  return spans;
}

/** The text items of a block placed in `box`, each line centred. */
export function blockItems(block: LabelBlock, box: Box, nameColour: string, energyColour: string, ids: Pick<TextItem, 'pathway' | 'point' | 'levels'>): TextItem[] {
  const items: TextItem[] = [];
  let top = box.y;
  for (const name of block.name ? [block.name, ...(block.more ?? [])] : []) {
    items.push(textItem(name, box.x + (box.w - name.width) / 2, top + name.ascent, nameColour, 'label', ids));
    top += name.ascent + name.descent + LINE_GAP_EM * (block.energy.runs[0]?.sizeMm ?? 0);
  }
  items.push(textItem(block.energy, box.x + (box.w - block.energy.width) / 2, top + block.energy.ascent, energyColour, 'label', ids));
  return items;
}
