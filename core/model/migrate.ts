import { FORMAT_VERSION } from './schema.ts';

type Json = Record<string, unknown>;

const isObject = (value: unknown): value is Json => typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * Upgrades older document shapes one version at a time. Version 1 was the early draft
 * format: points without ids and with a bare number as energy, read in `settings.unit`
 * (kcal/mol when absent). Version 2 had no document-wide zero: its implicit reference
 * (each pathway's first point) is made explicit.
 */
const MIGRATIONS: Record<number, (doc: Json) => Json> = {
  1: (doc) => {
    const settings = isObject(doc.settings) ? doc.settings : {};
    const unit = typeof settings.unit === 'string' ? settings.unit : 'kcal/mol';
    return {
      ...doc,
      version: 2,
      // Entries that are not objects (null, a number) are left for validation to name.
      pathways: !Array.isArray(doc.pathways) ? doc.pathways : doc.pathways.map((pathway: unknown, i: number) => (!isObject(pathway) ? pathway : {
        ...pathway,
        id: pathway.id ?? `pathway-${i + 1}`,
        points: !Array.isArray(pathway.points) ? pathway.points : pathway.points.map((point: unknown, j: number) => (!isObject(point) ? point : {
          ...point,
          id: point.id ?? `p${j + 1}`,
          energy: typeof point.energy === 'number' ? { mode: 'value', value: point.energy, unit } : point.energy,
        })),
      })),
    };
  },
  // Format 2 measured every pathway from its own first point unless a shared point was set;
  // format 3 defaults to one document-wide zero. The old default is written out, so an old
  // document keeps its numbers (choose the document zero to show typed values as typed).
  2: (doc) => {
    const settings = (typeof doc.settings === 'object' && doc.settings !== null ? doc.settings : {}) as Json;
    return { ...doc, version: 3, settings: { ...settings, reference: settings.reference ?? { kind: 'first' } } };
  },
};

/** Result of reading the version header. */
export type MigrationResult =
  | { ok: true; doc: Json; migratedFrom?: number }
  | { ok: false; message: string };

/** Brings a parsed JSON object to the current format version, or explains why not. */
export function migrate(raw: unknown): MigrationResult {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    return { ok: false, message: 'expected a JSON object at the top of the file' };
  }
  let doc = raw as Json;
  if (doc.format !== 'passline') {
    return { ok: false, message: 'format: expected "passline" (this is not a Passline document)' };
  }
  const version = doc.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) {
    return { ok: false, message: `version: expected a whole format version number, got ${JSON.stringify(version)}` };
  }
  if (version > FORMAT_VERSION) {
    return {
      ok: false,
      message: `version: this document uses format version ${version}, written by a newer Passline; this one reads versions up to ${FORMAT_VERSION}. The file was not changed.`,
    };
  }
  for (let v = version; v < FORMAT_VERSION; v++) {
    const step = MIGRATIONS[v];
    if (!step) return { ok: false, message: `version: no migration from format version ${v}` };
    doc = step(doc);
  }
  return version < FORMAT_VERSION ? { ok: true, doc, migratedFrom: version } : { ok: true, doc };
}
