import { IPC_PATH_CHARS } from './limits.ts';

/** Figure and table formats the File ▸ Export menu offers. */
export const EXPORT_FORMATS = ['svg', 'pdf', 'png', 'csv', 'markdown'] as const;
export type ExportFormat = (typeof EXPORT_FORMATS)[number];

/** Commands without arguments, as the menus and shortcuts send them. */
export const SIMPLE_COMMANDS = ['new', 'open', 'save', 'saveAs', 'undo', 'redo', 'closeRequested', 'saveThenClose'] as const;
export type SimpleCommand = (typeof SIMPLE_COMMANDS)[number];

/**
 * What the host asks the renderer to do. `closeRequested` wants a `replyClose`;
 * `saveThenClose` wants a save and, when it succeeded, `replyClose({ dirty: false })`
 * (when the user cancels the save, no reply: the window stays open). `openKnown` names a
 * file the user chose outside the window (recent list, command line, system, second launch);
 * open it with `host.openKnownFile(path)` once unsaved changes are dealt with.
 */
export type HostCommand =
  | { kind: SimpleCommand }
  | { kind: 'export'; format: ExportFormat }
  | { kind: 'openKnown'; path: string };

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && Object.getPrototypeOf(value) === Object.prototype;
}

/** `value` as a command when it is exactly one of the known shapes, else null. */
export function parseHostCommand(value: unknown): HostCommand | null {
  if (!isPlainObject(value) || typeof value.kind !== 'string') return null;
  const keys = Object.keys(value).sort().join(',');
  const { kind } = value;
  if ((SIMPLE_COMMANDS as readonly string[]).includes(kind)) return keys === 'kind' ? { kind: kind as SimpleCommand } : null;
  if (kind === 'export') {
    const ok = keys === 'format,kind' && (EXPORT_FORMATS as readonly unknown[]).includes(value.format);
    return ok ? { kind, format: value.format as ExportFormat } : null;
  }
  if (kind === 'openKnown') {
    const { path } = value;
    const ok = keys === 'kind,path' && typeof path === 'string' && path.length > 0 && path.length <= IPC_PATH_CHARS;
    return ok ? { kind, path: path as string } : null;
  }
  return null;
}
