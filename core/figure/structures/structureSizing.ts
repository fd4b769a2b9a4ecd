import type { Document } from '../../model/schema.ts';
import type { PointDrawing } from '../../structure/pointDepictions.ts';
import type { Depiction } from '../../structure/structureToolkit.ts';

/** Sizes of the molecule drawings of one figure, mm. */
export interface StructureSizing {
  /** Largest side of a drawing's box. */
  sizeMm: number;
  /** Longest bond (a small molecule is not blown up to the full size). */
  maxBondMm: number;
  strokeMm: number;
  labelMm: number;
}

/** Drawing size as a multiple of the font's em, when the document sets none (our choice: ~14 mm at 8 pt). */
const SIZE_EMS = 5;

/**
 * Sizes from the figure's text size and line width: bonds at 0.6 × the connector width
 * (thin beside the level bars, as in printed schemes), atom labels at 0.85 × the figure's
 * text; bonds at most 1.1 em long by default, or half the size the user chose (so a
 * diatomic is not drawn as one huge bond).
 */
export function structureSizing(doc: Document, emMm: number, strokeMm: number, textScale: number): StructureSizing {
  const size = doc.figure.molecules?.sizeMm;
  return {
    sizeMm: size !== undefined ? size * textScale : SIZE_EMS * emMm,
    maxBondMm: size !== undefined ? (size * textScale) / 2 : 1.1 * emMm,
    strokeMm: 0.6 * strokeMm,
    labelMm: 0.85 * emMm,
  };
}

/** Bond length for one depiction: it fits a `sizeMm` square, and no bond is longer than the cap. */
export function bondLength(d: Depiction, sizing: StructureSizing): number {
  const xs = d.atoms.map((a) => a.x), ys = d.atoms.map((a) => a.y);
  const span = Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys), 1e-9);
  // Labels stick out about one label size beyond the outermost atoms.
  return Math.min(sizing.maxBondMm, Math.max(0.1, (sizing.sizeMm - sizing.labelMm) / span));
}

/** Height a drawing is expected to take (for reserving room before placement). */
export function expectedHeight(drawing: PointDrawing, sizing: StructureSizing): number {
  const ys = drawing.depiction.atoms.map((a) => a.y);
  return (Math.max(...ys) - Math.min(...ys)) * bondLength(drawing.depiction, sizing) + 1.3 * sizing.labelMm;
}
