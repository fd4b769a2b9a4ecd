import type { Document } from '../../core/model/schema.ts';
import { dragEnergy } from '../../core/edit/dragEnergy.ts';
import { setLabelOffset, setPointX } from '../../core/edit/layoutEdits.ts';
import type { SceneGeometry } from './sceneGeometry.ts';

/** What is being dragged: a level (energy or spacing) or a point's label. */
export interface DragTarget {
  pathway: string;
  point: string;
  role: 'level' | 'label';
  /** The point's slot when the drag began (for sideways moves). */
  slot: number;
  /** For a label: the offset (mm) from its default spot at which it is drawn now. */
  labelFrom?: { dx: number; dy: number };
}

/** Pointer travel (px) before a level drag commits to vertical or sideways. */
export const AXIS_LOCK_PX = 4;

/** Slots are placed to a twentieth of the spacing (our choice: fine yet tidy numbers). */
const SLOT_STEP = 0.05;

/**
 * The document a drag leads to, always computed from the document at the start of the
 * drag with the total travel (mm): a level moves in energy (`axis` 'y') or in x ('x'); a
 * label takes a hand-set offset, counted from where it is drawn (`labelFrom`). Label
 * offsets are kept to 0.1 mm.
 */
export function dragEdit(start: Document, target: DragTarget, axis: 'x' | 'y', dxMm: number, dyMm: number, geometry: SceneGeometry): Document {
  const ref = { pathway: target.pathway, point: target.point };
  if (target.role === 'label') {
    const own = target.labelFrom ?? start.pathways.find((p) => p.id === ref.pathway)?.points.find((p) => p.id === ref.point)?.labelOffsetMm ?? { dx: 0, dy: 0 };
    const r = (v: number) => Math.round(v * 10) / 10;
    return setLabelOffset(start, { ...ref, offset: { dx: r(own.dx + dxMm), dy: r(own.dy + dyMm) } });
  }
  if (axis === 'y') return dragEnergy(start, { ...ref, deltaJ: dyMm / geometry.mmPerJ });
  const x = Math.round((target.slot + dxMm / geometry.mmPerSlot) / SLOT_STEP) * SLOT_STEP;
  return setPointX(start, { ...ref, x: Number(x.toFixed(2)) });
}
