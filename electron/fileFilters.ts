import type { FileFilter } from 'electron';
import { DOCUMENT_EXTENSION, EXPORT_TYPES, type ExportMimeType } from '../ui/host/hostApi.ts';

/** Dialog filter for Passline documents. */
export const documentFilter: FileFilter = { name: 'Passline document', extensions: [DOCUMENT_EXTENSION.slice(1)] };

const EXPORT_NAMES: Record<ExportMimeType, string> = {
  'image/svg+xml': 'SVG image',
  'application/pdf': 'PDF document',
  'image/png': 'PNG image',
  'text/csv': 'CSV table',
  'text/markdown': 'Markdown table',
  'application/json': 'JSON data',
};

/** Dialog filter for one export type. */
export function exportFilter(mimeType: ExportMimeType): FileFilter {
  return { name: EXPORT_NAMES[mimeType], extensions: [EXPORT_TYPES[mimeType].slice(1)] };
}

/** `path` with `extension` appended unless it already ends with it (dialogs may drop it). */
export function withExtension(path: string, extension: string): string {
  return path.toLowerCase().endsWith(extension) ? path : `${path}${extension}`;
}
