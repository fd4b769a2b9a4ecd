import type { Stroke, TextItem } from './scene.ts';

/**
 * The one drawing interface every output implements (SVG string, jsPDF, the canvas).
 * Geometry arrives as moveTo/lineTo/curveTo calls, then one `paint` ends the path.
 */
export interface DrawingSink {
  moveTo(x: number, y: number): void;
  lineTo(x: number, y: number): void;
  curveTo(x1: number, y1: number, x2: number, y2: number, x: number, y: number): void;
  closePath(): void;
  /** Paints the current path (stroke and/or fill) and starts a new one. */
  paint(stroke: Stroke | undefined, fill: string | undefined): void;
  text(item: TextItem): void;
  /** Starts a named group (a molecule drawing), or ends the open one with null; optional. */
  group?(name: string | null, ids: { pathway?: string; point?: string }): void;
}
