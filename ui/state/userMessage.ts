/**
 * The part of a thrown error worth showing a person. Electron wraps errors from the main
 * process as "Error invoking remote method 'channel': Error: reason"; only the reason is kept.
 */
export function userMessage(error: unknown): string {
  const text = error instanceof Error ? error.message : String(error);
  return text.replace(/^Error invoking remote method '[^']*':\s*(Error:\s*)?/, '');
}
