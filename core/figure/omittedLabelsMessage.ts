import type { OmittedLabel } from './scene.ts';

/** How many labels the sentence names before "and N more" (our choice: it stays one readable line). */
export const NAMED_OMITTED = 8;

/**
 * One user-facing sentence saying which labels were left out of the figure for want of
 * room and what to do about it, or null when none were. Level labels are named as typed
 * with their pathway (`"TS3" (pathway 1)`), annotation labels by their text and place in
 * the figure's annotation list (`"ΔG‡ = 14.2" (figure annotation 2)`); the first `named`
 * are listed, then "and N more".
 */
export function omittedLabelsMessage(omitted: readonly OmittedLabel[], named = NAMED_OMITTED): string | null {
  if (omitted.length === 0) return null;
  const shown = omitted.slice(0, Math.max(1, named)).map(describe);
  const rest = omitted.length - shown.length;
  const list = rest > 0 ? `${shown.join(', ')} and ${rest} more` : joinWithAnd(shown);
  const one = omitted.length === 1;
  return `${one ? '1 label' : `${omitted.length} labels`} found no clear spot inside the figure and ${one ? 'is' : 'are'} left out: ${list}; `
    + `to show ${one ? 'it' : 'them'}, use a larger figure size or preset, show fewer pathways, place ${one ? 'the label' : 'those labels'} by hand, or shorten the labels.`;
}

function describe(label: OmittedLabel): string {
  if (label.kind === 'annotation') return `"${label.text}" (figure annotation ${label.annotation + 1})`;
  const name = `${label.label ? `"${label.label}"` : `the unnamed point "${label.point}"`} (${label.pathwayName})`;
  return label.kind === 'structure' ? `the structure of ${name}` : name;
}

function joinWithAnd(parts: readonly string[]): string {
  return parts.length < 2 ? parts.join('') : `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
}
