/** Editor commands reachable from the keyboard. */
export type Command = 'undo' | 'redo' | 'save' | 'saveAs' | 'open' | 'new' | 'export' | 'delete';

const editable = (target: EventTarget | null) =>
  target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/**
 * The editor's own key: Delete (or Backspace) outside text fields removes the selected
 * point. The document shortcuts (⌘/Ctrl + Z, S, O, E, …) come through the host's command
 * channel (ui/host/hostCommands.ts), so the desktop menus and the browser agree.
 */
export function commandFor(event: KeyboardEvent): Command | null {
  if (event.ctrlKey || event.metaKey || event.altKey) return null;
  if ((event.key === 'Delete' || event.key === 'Backspace') && !editable(event.target)) return 'delete';
  return null;
}
