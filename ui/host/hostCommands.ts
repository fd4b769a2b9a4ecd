import { COMMANDS_GLOBAL, type CommandSource } from './hostApi.ts';
import { commandForKey } from './commandShortcuts.ts';
import { parseHostCommand, type HostCommand } from './hostCommand.ts';

// Undo and redo in a text field belong to the field, not to the document.
function isTextEntry(target: EventTarget | null): boolean {
  if (!target || typeof (target as Element).tagName !== 'string') return false;
  const element = target as HTMLElement;
  return element.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(element.tagName);
}

/**
 * Calls `listener` with each command the host sends: the menus of the desktop app, or in
 * a browser the same keyboard shortcuts (⌘/Ctrl+S and so on). Returns the function that
 * stops listening.
 */
export function onHostCommand(listener: (command: HostCommand) => void, win: Window = window): () => void {
  const source = (win as unknown as Record<string, unknown>)[COMMANDS_GLOBAL] as CommandSource | undefined;
  if (source) {
    // Preload checks commands too; checking here keeps a bad one from reaching the app either way.
    return source.subscribe((value) => {
      const command = parseHostCommand(value);
      if (!command) return;
      // The menu's ⌘/Ctrl+Z reaches us even while a text field has focus: give it to the field.
      if ((command.kind === 'undo' || command.kind === 'redo') && isTextEntry(win.document.activeElement)) {
        win.document.execCommand(command.kind);
        return;
      }
      listener(command);
    });
  }
  const isMac = /mac/i.test(win.navigator.platform);
  const onKey = (event: KeyboardEvent) => {
    const command = commandForKey(event, isMac);
    if (!command || ((command.kind === 'undo' || command.kind === 'redo') && isTextEntry(event.target))) return;
    event.preventDefault();
    listener(command);
  };
  win.addEventListener('keydown', onKey);
  return () => win.removeEventListener('keydown', onKey);
}
