import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** Path of the bundled open-licence font (DejaVu Sans) that figures are measured and embedded with. */
export const FONT_PATH = fileURLToPath(new URL('../../assets/fonts/DejaVuSans.ttf', import.meta.url));

/** The bundled font's bytes. */
export function readBundledFont(): Uint8Array {
  return new Uint8Array(readFileSync(FONT_PATH));
}
