/** Escapes text for XML content and double- or single-quoted attributes. */
export function escapeXml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ESCAPES[c]!);
}

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&apos;' };

/** A number for SVG output: at most 3 decimals, no trailing zeros, no "-0". */
export function num(value: number): string {
  const s = value.toFixed(3).replace(/\.?0+$/, '');
  return s === '-0' ? '0' : s;
}
