/** Name of the Performance API measure from a drag's pointer move to the next painted frame. */
export const DRAG_FRAME_MEASURE = 'passline:drag-frame';

let pending = false;

/**
 * Marks a pointer move and measures until the frame after it is painted: a message posted
 * from a requestAnimationFrame callback runs after that frame's paint. Read by the editor
 * benchmark through `performance.getEntriesByName`.
 */
export function markFrame(start = performance.now()): void {
  if (pending || typeof performance === 'undefined' || typeof requestAnimationFrame === 'undefined') return;
  pending = true;
  requestAnimationFrame(() => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      pending = false;
      performance.measure(DRAG_FRAME_MEASURE, { start, end: performance.now() });
      if (performance.getEntriesByName(DRAG_FRAME_MEASURE).length > 2000) performance.clearMeasures(DRAG_FRAME_MEASURE);
    };
    channel.port2.postMessage(0);
  });
}

/** Name of the measure of the main-thread work one pointer move causes (handler and DOM update). */
export const DRAG_WORK_MEASURE = 'passline:drag-work';

/** Records the work of one pointer move, from `start` until now. */
export function markWork(start: number): void {
  if (typeof performance === 'undefined') return;
  performance.measure(DRAG_WORK_MEASURE, { start, end: performance.now() });
  if (performance.getEntriesByName(DRAG_WORK_MEASURE).length > 2000) performance.clearMeasures(DRAG_WORK_MEASURE);
}
