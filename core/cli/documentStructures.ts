import type { Document } from '../model/schema.ts';
import { loadStructureToolkit } from '../structure/loadStructureToolkit.ts';
import { hasStructures, readStructures, type StructureTable } from '../structure/readStructures.ts';
import { CliError, EXIT_USAGE } from './io.ts';

/**
 * The document's structures read by the toolkit, or null when it has none (the toolkit
 * is then never loaded, so commands on plain documents start as fast as before).
 */
export async function documentStructures(doc: Document): Promise<StructureTable | null> {
  if (!hasStructures(doc)) return null;
  try {
    return readStructures(doc, await loadStructureToolkit());
  } catch (error) {
    throw new CliError(`the document has structures, but the structure toolkit (openchemlib) could not be loaded: ${error instanceof Error ? error.message : String(error)}`, EXIT_USAGE);
  }
}
