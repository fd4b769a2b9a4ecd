/** The parts of the File System Access API that saving uses (not in every browser's typings). */
export interface SavePickerOptions {
  suggestedName: string;
  types: { description: string; accept: Record<string, string[]> }[];
}

/** A window that may offer `showSaveFilePicker`. */
export interface SavePickerWindow {
  showSaveFilePicker?: (options: SavePickerOptions) => Promise<FileSystemFileHandle>;
}

/** True when the user dismissed the picker (not a failure worth reporting). */
function isAbort(error: unknown): boolean {
  return error instanceof DOMException && error.name === 'AbortError';
}

/**
 * Writes `blob` to `handle`, or to a file the user picks when no handle is given.
 * Resolves to the handle written, or `null` when the user cancelled.
 */
export async function saveWithPicker(
  win: SavePickerWindow,
  blob: Blob,
  options: SavePickerOptions,
  handle?: FileSystemFileHandle,
): Promise<FileSystemFileHandle | null> {
  let target = handle;
  if (!target) {
    if (!win.showSaveFilePicker) throw new Error('this browser cannot pick a place to save');
    try {
      target = await win.showSaveFilePicker(options);
    } catch (error) {
      if (isAbort(error)) return null;
      throw error;
    }
  }
  const writable = await target.createWritable();
  await writable.write(blob);
  await writable.close();
  return target;
}
