import { openChemLibToolkit } from './openChemLibToolkit.ts';
import type { StructureToolkit } from './structureToolkit.ts';

let loading: Promise<StructureToolkit> | null = null;

/**
 * Loads the cheminformatics toolkit on first use (a dynamic import, so start-up and the
 * bundles that never meet a structure do not carry it) and returns the same instance
 * afterwards. A failed load is not cached, so a later call tries again.
 */
export function loadStructureToolkit(): Promise<StructureToolkit> {
  loading ??= import('openchemlib').then((OCL) => openChemLibToolkit(OCL)).catch((error: unknown) => {
    loading = null;
    throw error;
  });
  return loading;
}
