/** Where CLI output goes; injectable so commands are tested without a subprocess. */
export interface CliIo {
  out(text: string): void;
  err(text: string): void;
  readFile(path: string): string;
  readBytes(path: string): Uint8Array;
  /** Writes an output file atomically (temporary file, flush, rename). */
  writeFile(path: string, data: string | Uint8Array): void | Promise<void>;
}

/** Exit codes: success, bad input (file or data), bad usage. */
export const EXIT_OK = 0;
export const EXIT_INPUT = 1;
export const EXIT_USAGE = 2;

/** A user-facing failure with its exit code; printed as one line without a stack trace. */
export class CliError extends Error {
  constructor(message: string, readonly exitCode: number = EXIT_INPUT) {
    super(message);
  }
}
