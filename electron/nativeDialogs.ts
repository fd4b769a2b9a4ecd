import { BrowserWindow, dialog, type FileFilter } from 'electron';
import type { DesktopDialogs } from './desktopHost.ts';
import { documentFilter } from './fileFilters.ts';

/** Native open and save dialogs, attached to the app's window when it has one. */
export function nativeDialogs(window: () => BrowserWindow | null): DesktopDialogs {
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
  };
}
