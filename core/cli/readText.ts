import { CliError, type CliIo } from './io.ts';

/** Reads an input file, turning a missing or unreadable file into a one-line error. */
export function readText(path: string, io: CliIo): string {
  try {
    return io.readFile(path);
  } catch (error) {
    throw new CliError(`cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
}
