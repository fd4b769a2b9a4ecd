import type { CalcRecord } from './calcRecord.ts';
import { readGaussianLog } from './readGaussianLog.ts';
import { readOrcaOutput } from './readOrcaOutput.ts';
import { readXyz } from './readXyz.ts';

/** Result of {@link readCalculation}: a record, or why the text is none of the formats read. */
export type CalcReading = { ok: true; record: CalcRecord } | { ok: false; message: string };

/** Which reader a text is for, from its content (not its file name). */
export function detectProgram(text: string): 'gaussian' | 'orca' | 'xyz' | null {
  const head = text.slice(0, 200_000);
  if (/Entering Gaussian System|Gaussian \d+:\s|Normal termination of Gaussian|SCF Done:\s+E\(/.test(head)) return 'gaussian';
  if (/\* O\s+R\s+C\s+A \*|Program Version \d+\.\d+\.\d+|FINAL SINGLE POINT ENERGY|ORCA TERMINATED/.test(head)) return 'orca';
  if (/^\s*\d+\s*\r?\n/.test(text)) return 'xyz';
  return null;
}

/**
 * Reads a Gaussian log, an ORCA output or an XYZ file into a {@link CalcRecord}, choosing the
 * reader from the content. A text that is none of them is an error value naming the file.
 */
export function readCalculation(text: string, fileName: string): CalcReading {
  const program = detectProgram(text);
  if (program === 'gaussian') return { ok: true, record: readGaussianLog(text) };
  if (program === 'orca') return { ok: true, record: readOrcaOutput(text) };
  if (program === 'xyz') {
    const xyz = readXyz(text);
    return xyz.ok ? xyz : { ok: false, message: `${fileName}: ${xyz.message}` };
  }
  return { ok: false, message: `${fileName}: not a Gaussian log, an ORCA output or an XYZ file` };
}
