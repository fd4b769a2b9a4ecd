/** Name of the Performance API measure from a drag's pointer move (its handler) to the next painted frame. */
export const DRAG_FRAME_MEASURE = 'passline:drag-frame';
/** The same, from the event's own timestamp: includes the browser's wait to deliver the move. */
export const DRAG_INPUT_MEASURE = 'passline:drag-input-latency';

let pending = false;

/**
 * Marks a pointer move and measures until the frame after it is painted: a message posted
 * from a requestAnimationFrame callback runs after that frame's paint. `eventTime` is the
 * event's timestamp (same clock). Read by the editor benchmark through
 * `performance.getEntriesByName`.
 */
export function markFrame(eventTime?: number): void {
  if (pending || typeof performance === 'undefined' || typeof requestAnimationFrame === 'undefined') return;
  pending = true;
  const start = performance.now();
  requestAnimationFrame(() => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      pending = false;
      const end = performance.now();
      performance.measure(DRAG_FRAME_MEASURE, { start, end });
      if (eventTime !== undefined && eventTime <= start) performance.measure(DRAG_INPUT_MEASURE, { start: eventTime, end });
      if (performance.getEntriesByName(DRAG_FRAME_MEASURE).length > 2000) { performance.clearMeasures(DRAG_FRAME_MEASURE); performance.clearMeasures(DRAG_INPUT_MEASURE); }
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
