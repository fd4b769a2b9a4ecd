import { BrowserWindow, dialog, type FileFilter, type MessageBoxOptions } from 'electron';
import type { CloseChoice } from './closeGuard.ts';
import type { DesktopDialogs, OverwriteChoice } from './desktopHost.ts';
import { documentFilter } from './fileFilters.ts';

/** Everything the main process asks the user through native dialogs. */
export interface AppDialogs extends DesktopDialogs {
  /** "Save changes before closing?"; `name` null when the window could not tell whether there are any. */
  askClose(name: string | null): Promise<CloseChoice>;
}

/** Answers of the message boxes, in button order. */
const OVERWRITE_BUTTONS: [string, OverwriteChoice][] = [['Replace It', 'overwrite'], ['Save As…', 'saveAs'], ['Cancel', 'cancel']];
const CLOSE_BUTTONS: [string, CloseChoice][] = [['Save', 'save'], ['Close Without Saving', 'discard'], ['Keep Editing', 'cancel']];
const UNKNOWN_CLOSE_BUTTONS: [string, CloseChoice][] = [['Close Anyway', 'discard'], ['Keep Window Open', 'cancel']];

/** The text of the "changed on disk" question (its own function so that tests can read it). */
export function overwriteMessage(name: string, changedAt: Date): MessageBoxOptions {
  return {
    type: 'warning',
    title: 'File changed on disk',
    message: `${name} was changed by another program since Passline read it (at ${changedAt.toLocaleString()}).`,
    detail: 'Replacing it loses those changes; a copy of the file as it is now is kept next to it with “.bak” added. Save As… keeps both.',
    buttons: OVERWRITE_BUTTONS.map(([label]) => label),
    defaultId: 1,
    cancelId: 2,
    noLink: true,
  };
}

/** The text of the closing question. */
export function closeMessage(name: string | null): MessageBoxOptions {
  if (name === null) {
    return {
      type: 'warning',
      title: 'Close window',
      message: 'Passline could not find out whether the document has unsaved changes.',
      detail: 'The window did not answer. A working copy of unsaved changes is kept every few seconds and is offered at the next start.',
      buttons: UNKNOWN_CLOSE_BUTTONS.map(([label]) => label),
      defaultId: 1,
      cancelId: 1,
      noLink: true,
    };
  }
  return {
    type: 'question',
    title: 'Unsaved changes',
    message: `Save the changes to ${name} before closing?`,
    detail: 'Closing without saving loses them.',
    buttons: CLOSE_BUTTONS.map(([label]) => label),
    defaultId: 0,
    cancelId: 2,
    noLink: true,
  };
}

/** Native open, save and question dialogs, attached to the app's window when it has one. */
export function nativeDialogs(window: () => BrowserWindow | null): AppDialogs {
  const ask = async (options: MessageBoxOptions) => {
    const win = window();
    return (win ? await dialog.showMessageBox(win, options) : await dialog.showMessageBox(options)).response;
  };
  return {
    async pickOpenPath() {
      const options: Electron.OpenDialogOptions = { title: 'Open document', properties: ['openFile'], filters: [documentFilter] };
      const win = window();
      const result = win ? await dialog.showOpenDialog(win, options) : await dialog.showOpenDialog(options);
      return result.canceled ? null : (result.filePaths[0] ?? null);
    },
    async pickSavePath(suggestedName: string, filter: FileFilter) {
      const options: Electron.SaveDialogOptions = { title: 'Save', defaultPath: suggestedName, filters: [filter], properties: ['showOverwriteConfirmation', 'createDirectory'] };
      const win = window();
      const result = win ? await dialog.showSaveDialog(win, options) : await dialog.showSaveDialog(options);
      return result.canceled || !result.filePath ? null : result.filePath;
    },
    async confirmOverwrite(name: string, changedAt: Date) {
      return OVERWRITE_BUTTONS[await ask(overwriteMessage(name, changedAt))]?.[1] ?? 'cancel';
    },
    async askClose(name: string | null) {
      const buttons = name === null ? UNKNOWN_CLOSE_BUTTONS : CLOSE_BUTTONS;
      return buttons[await ask(closeMessage(name))]?.[1] ?? 'cancel';
    },
  };
}
