import { readFileSync } from 'node:fs';
import { safeText } from '../format/safeText.ts';

/**
 * A writer for stdout or stderr that passes text through {@link safeText} (no escape
 * sequences from labels reach the terminal) and goes quiet when the reader has gone
 * (`passline analyze … | head`): EPIPE is not an error of ours, so no stack trace; the
 * command still finishes, and files it writes are still written whole.
 */
export function terminalWriter(stream: NodeJS.WritableStream): (text: string) => void {
  let closed = false;
  stream.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE' || error.code === 'ERR_STREAM_DESTROYED') { closed = true; return; }
    throw error;
  });
  return (text) => {
    if (!closed) stream.write(safeText(text));
  };
}

const utf8 = new TextDecoder('utf-8', { fatal: true });

/** Reads a file as UTF-8, refusing bytes that are not UTF-8 instead of turning them into U+FFFD. */
export function readUtf8(path: string): string {
  const bytes = readFileSync(path);
  try {
    return utf8.decode(bytes);
  } catch {
    const lossy = new TextDecoder('utf-8').decode(bytes);
    const line = lossy.slice(0, lossy.indexOf('\uFFFD')).split('\n').length;
    throw new Error(`not UTF-8 text (first bad byte on line ${line}); save the file as UTF-8`);
  }
}
