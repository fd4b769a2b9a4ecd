import type { ExportKind } from '../export/buildExport.ts';

/** Whether the export dialog is open, and with which format (set by the toolbar, a menu or a shortcut). */
export class ExportRequest {
  kind: ExportKind | null = $state(null);
  open = $state(false);

  /** Opens the dialog, with `kind` chosen when given. */
  show(kind?: ExportKind): void {
    this.kind = kind ?? null;
    this.open = true;
  }
}
