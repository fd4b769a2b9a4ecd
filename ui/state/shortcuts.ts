/** Editor commands reachable from the keyboard. */
export type Command = 'undo' | 'redo' | 'save' | 'saveAs' | 'open' | 'new' | 'export' | 'delete';

const editable = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/**
 * The command a key press asks for: Ctrl (⌘ on macOS) + Z / Shift+Z / Y / S / Shift+S / O /
 * E, and Delete outside text fields. Undo and redo also apply inside fields, because the
 * document history (not the field's own) is what the editor shows.
 */
export function commandFor(event: KeyboardEvent): Command | null {
  const mod = event.ctrlKey || event.metaKey;
  const key = event.key.toLowerCase();
  if (mod && !event.altKey) {
    if (key === 'z') return event.shiftKey ? 'redo' : 'undo';
    if (key === 'y') return 'redo';
    if (key === 's') return event.shiftKey ? 'saveAs' : 'save';
    if (key === 'o') return 'open';
    if (key === 'e') return 'export';
    return null;
  }
  if ((event.key === 'Delete' || event.key === 'Backspace') && !editable(event.target)) return 'delete';
  return null;
}
