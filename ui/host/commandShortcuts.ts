import type { HostCommand } from './hostCommand.ts';

/** A key chord with the platform's command key (⌘ on macOS, Ctrl elsewhere). */
export interface Shortcut {
  /** `KeyboardEvent.key` in lower case. */
  key: string;
  shift: boolean;
  command: HostCommand;
}

/**
 * The keyboard shortcuts of the document commands, declared once: the desktop menus take
 * their accelerators from here and the browser listens for the same chords.
 */
export const commandShortcuts: readonly Shortcut[] = [
  { key: 'n', shift: false, command: { kind: 'new' } },
  { key: 'o', shift: false, command: { kind: 'open' } },
  { key: 's', shift: false, command: { kind: 'save' } },
  { key: 's', shift: true, command: { kind: 'saveAs' } },
  { key: 'e', shift: false, command: { kind: 'export', format: 'svg' } },
  { key: 'e', shift: true, command: { kind: 'export', format: 'pdf' } },
  { key: 'z', shift: false, command: { kind: 'undo' } },
  { key: 'z', shift: true, command: { kind: 'redo' } },
  { key: 'y', shift: false, command: { kind: 'redo' } },
];

/** Electron accelerator text for a shortcut, e.g. "CmdOrCtrl+Shift+S". */
export function acceleratorOf(shortcut: Shortcut): string {
  return `CmdOrCtrl+${shortcut.shift ? 'Shift+' : ''}${shortcut.key.toUpperCase()}`;
}

/** The first shortcut that sends `command`, if any. */
export function shortcutFor(command: HostCommand): Shortcut | undefined {
  return commandShortcuts.find((s) => JSON.stringify(s.command) === JSON.stringify(command));
}

/** The parts of a key event that decide a shortcut. */
export type KeyChord = Pick<KeyboardEvent, 'key' | 'shiftKey' | 'ctrlKey' | 'metaKey' | 'altKey'>;

/** The command a key chord sends (⌘ on macOS, Ctrl elsewhere; Alt never), or null. */
export function commandForKey(chord: KeyChord, isMac: boolean): HostCommand | null {
  const commandKey = isMac ? chord.metaKey && !chord.ctrlKey : chord.ctrlKey && !chord.metaKey;
  if (!commandKey || chord.altKey) return null;
  const key = chord.key.toLowerCase();
  return commandShortcuts.find((s) => s.key === key && s.shift === chord.shiftKey)?.command ?? null;
}
