import { Figure, Settings, type Document } from '../model/schema.ts';

function changed<T extends object>(before: T, patch: Partial<T>): boolean {
  return (Object.keys(patch) as (keyof T)[]).some((k) => JSON.stringify(before[k]) !== JSON.stringify(patch[k]));
}

/** Why a settings change is not acceptable (e.g. a temperature of 0 K), or null. */
export function settingsProblem(settings: Document['settings'], patch: Partial<Settings>): string | null {
  const parsed = Settings.safeParse({ ...settings, ...patch });
  if (parsed.success) return null;
  const issue = parsed.error.issues[0]!;
  return `${issue.path.join('.')}: ${issue.message}`;
}

/**
 * Changes document settings (quantity, unit, temperature, standard state, decimals, κ,
 * reference). Typed energies keep the unit they were typed in; only the display changes.
 * A change the schema refuses leaves the document as it is (see {@link settingsProblem}).
 */
export function setSettings(doc: Document, patch: Partial<Settings>): Document {
  if (!changed(doc.settings, patch) || settingsProblem(doc.settings, patch)) return doc;
  return { ...doc, settings: { ...doc.settings, ...patch } };
}

/** Changes figure settings (preset, size, theme, fonts, connectors, what is shown). */
export function setFigure(doc: Document, patch: Partial<Figure>): Document {
  if (!changed(doc.figure, patch) || !Figure.safeParse({ ...doc.figure, ...patch }).success) return doc;
  return { ...doc, figure: { ...doc.figure, ...patch } };
}

/** Sets the document title. */
export function setTitle(doc: Document, args: { title: string }): Document {
  return doc.title === args.title ? doc : { ...doc, title: args.title };
}
