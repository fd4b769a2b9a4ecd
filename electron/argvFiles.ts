import { isAbsolute, resolve } from 'node:path';
import { DOCUMENT_EXTENSION } from '../ui/host/hostApi.ts';
import { IPC_PATH_CHARS } from '../ui/host/limits.ts';

/**
 * The document paths in a command line, made absolute against `cwd` (the folder the
 * command was started in, which for a second launch is that launch's folder).
 * `leading` is how many arguments belong to the launcher: 1 for a packaged app
 * (`passline file`), 2 in development (`electron . file`). Options (`-x`, `--flag`, and
 * the `-psn_…` that older macOS adds) and anything not ending in `.passline` are skipped;
 * so is everything after a NUL or beyond the path length limit.
 */
export function documentPathsFromArgv(argv: readonly string[], leading: number, cwd: string): string[] {
  return argv
    .slice(leading)
    .filter((arg) => !arg.startsWith('-') && arg.length <= IPC_PATH_CHARS && !arg.includes('\u0000'))
    .filter((arg) => arg.toLowerCase().endsWith(DOCUMENT_EXTENSION))
    .map((arg) => (isAbsolute(arg) ? resolve(arg) : resolve(cwd, arg)));
}
