import { sweepStaleTemps } from '../io/sweepStaleTemps.node.ts';
import { CliError, type CliIo } from './io.ts';

/**
 * Writes an output file, turning an unwritable path into a one-line error; then sweeps, best
 * effort, temporary files that earlier interrupted writes of the same path left behind.
 */
export async function writeOutput(path: string, data: string | Uint8Array, io: CliIo): Promise<void> {
  try {
    await io.writeFile(path, data);
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    throw new CliError(`cannot write ${path}: ${code ?? (error as Error).message}`);
  }
  await sweepStaleTemps(path).catch(() => []);
}
