/** The part of a drop event read here (a DOM DragEvent in preload). */
export interface DropLike {
  isTrusted: boolean;
  dataTransfer: { files: ArrayLike<File> } | null;
}

/**
 * Paths of the files in a drop the user made: script can dispatch a drop event, but not a
 * trusted one, and a File it makes up has no path ('').
 */
export function droppedPaths(event: DropLike, pathOf: (file: File) => string): string[] {
  if (!event.isTrusted || !event.dataTransfer) return [];
  return Array.from(event.dataTransfer.files, pathOf).filter((path) => path !== '');
}
