import type { FontMetrics } from '../figure/font/fontMetrics.ts';
import type { Document } from '../model/schema.ts';
import { safeText } from '../format/safeText.ts';

/** Every text of a document that a figure or report prints. */
function documentTexts(doc: Document): string[] {
  return [
    doc.title,
    ...doc.species.map((s) => s.label),
    ...doc.pathways.flatMap((p) => [p.name, ...p.points.map((q) => q.label)]),
    ...doc.figure.annotations.flatMap((a) => (a.type === 'text' ? [a.text] : [])),
  ];
}

/**
 * Characters of the document's labels, names and title that the font has no glyph for
 * (emoji, mathematical script letters in DejaVu Sans), in order of first appearance;
 * white space is not counted. A PDF or PNG would leave them out silently.
 */
export function missingGlyphs(doc: Document, metrics: FontMetrics): string[] {
  const missing = new Set<string>();
  for (const text of documentTexts(doc)) {
    for (const ch of safeText(text)) {
      if (!/\s/.test(ch) && !metrics.has(ch.codePointAt(0)!)) missing.add(ch);
    }
  }
  return [...missing];
}

/** Warning naming the missing characters with their code points, or null when none are. */
export function missingGlyphsMessage(missing: readonly string[], family: string, output: string): string | null {
  if (missing.length === 0) return null;
  const shown = missing.slice(0, 10).map((ch) => `"${ch}" (U+${ch.codePointAt(0)!.toString(16).toUpperCase().padStart(4, '0')})`);
  const more = missing.length > 10 ? ` and ${missing.length - 10} more` : '';
  return `the embedded font ${family} has no glyph for ${shown.join(', ')}${more}; they are missing from the ${output}`;
}
