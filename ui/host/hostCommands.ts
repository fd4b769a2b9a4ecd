import { COMMANDS_GLOBAL, type CommandSource } from './hostApi.ts';
import { commandForKey } from './commandShortcuts.ts';
import { parseHostCommand, type HostCommand } from './hostCommand.ts';

function isTextEntry(target: EventTarget | null): target is HTMLElement {
  if (!target || typeof (target as Element).tagName !== 'string') return false;
  const element = target as HTMLElement;
  return element.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(element.tagName);
}

// Undo and redo always act on the document: the field being edited commits first (its blur
// ends the typing burst), so the browser's own text history never turns into an edit.
function commitFocusedField(win: Window): void {
  const active = win.document.activeElement;
  if (isTextEntry(active)) active.blur();
}

const HISTORY_INPUT: Record<string, HostCommand> = { historyUndo: { kind: 'undo' }, historyRedo: { kind: 'redo' } };

/**
 * Calls `listener` with each command the host sends: the menus of the desktop app, or in
 * a browser the same keyboard shortcuts (⌘/Ctrl+S and so on). Undo and redo reach the
 * document even from a focused text field, and a text field's own undo (context menu,
 * an Edit menu's role) is turned into the document's. Returns the function that stops listening.
 */
export function onHostCommand(listener: (command: HostCommand) => void, win: Window = window): () => void {
  const send = (command: HostCommand) => {
    if (command.kind === 'undo' || command.kind === 'redo') commitFocusedField(win);
    listener(command);
  };
  const source = (win as unknown as Record<string, unknown>)[COMMANDS_GLOBAL] as CommandSource | undefined;
  const onHistoryInput = (event: InputEvent) => {
    const command = HISTORY_INPUT[event.inputType];
    if (!command) return;
    event.preventDefault();
    // On the desktop the menu item sends the command itself; sending here too would undo twice.
    if (!source) send(command);
  };
  win.addEventListener('beforeinput', onHistoryInput, true);
  let stopSource: () => void;
  if (source) {
    // Preload checks commands too; checking here keeps a bad one from reaching the app either way.
    stopSource = source.subscribe((value) => {
      const command = parseHostCommand(value);
      if (command) send(command);
    });
  } else {
    const isMac = /mac/i.test(win.navigator.platform);
    const onKey = (event: KeyboardEvent) => {
      const command = commandForKey(event, isMac);
      if (!command) return;
      event.preventDefault();
      send(command);
    };
    // Capture: the chord is the document's before any field sees it.
    win.addEventListener('keydown', onKey, true);
    stopSource = () => win.removeEventListener('keydown', onKey, true);
  }
  return () => { stopSource(); win.removeEventListener('beforeinput', onHistoryInput, true); };
}
