import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** A fixture cut from a real output file; tests/fixtures/qc/SOURCES.md names each source. */
export function qcFixture(name: string): string {
  return readFileSync(fileURLToPath(new URL(`../../../fixtures/qc/${name}`, import.meta.url)), 'utf8');
}
