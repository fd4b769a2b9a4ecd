import { flushSync } from 'svelte';
import type { Document } from '../../core/model/schema.ts';
import type { Scene } from '../../core/figure/scene.ts';
import type { DocumentStore } from '../state/documentStore.svelte.ts';
import { AXIS_LOCK_PX, dragEdit, type DragTarget } from './dragGesture.ts';
import { levelLock } from './canvasInput.ts';
import { labelBoxes } from './labelBoxes.ts';
import { setLabelOffset } from '../../core/edit/layoutEdits.ts';
import { markFrame, markWork } from './frameTiming.ts';
import { levelKey, type SceneGeometry } from './sceneGeometry.ts';
import type { LevelShift } from './shiftLevel.ts';

// A full update (analysis, layout, panels) slower than this moves the level on screen
// first and brings the document along when the pointer rests (our choice: half a frame).
const LIVE_BUDGET_MS = 8;
const REST_MS = 120;

/** What the drag needs to know about the figure as drawn now. */
export interface DragView { scene: Scene; geometry: SceneGeometry; slots: ReadonlyMap<string, number>; overlay: SVGSVGElement | undefined; viewport: HTMLElement | undefined }

interface Gesture {
  target: DragTarget; start: Document; x0: number; y0: number; pxPerMm: number; axis: 'x' | 'y' | null;
  id: number; blocked: string | null; committedDy: number; pending: Document | null; timer?: ReturnType<typeof setTimeout>;
}

/**
 * Pointer drags on the canvas: a level up or down (its energy), sideways (its x), or a
 * label (its offset). Each drag is one undo step. When a full update of the document is
 * slower than the budget, the level moves on screen first (`shift`) and the document
 * follows when the pointer rests and at release.
 */
export class CanvasDrag {
  shift: LevelShift | null = $state.raw(null);
  /** The point whose level is shown ahead of the document. */
  ahead: { pathway: string; point: string } | null = $state.raw(null);
  dragging = $state(false);
  note = $state('');
  readonly #store: DocumentStore;
  readonly #view: () => DragView;
  #gesture: Gesture | null = null;
  /** Dragging empty paper pans a zoomed figure. */
  #pan: { x: number; y: number; left: number; top: number; viewport: HTMLElement } | null = null;
  #count = 0;
  #commitCost = 0;

  constructor(store: DocumentStore, view: () => DragView) {
    this.#store = store;
    this.#view = view;
  }

  down(event: PointerEvent): void {
    const { scene, slots, overlay, viewport } = this.#view();
    const el = (event.target as Element).closest('[data-point]');
    const pathway = el?.getAttribute('data-pathway'), point = el?.getAttribute('data-point');
    if (event.button !== 0 || !overlay) return;
    // A connector is picked by its click; capturing the pointer here would take the click away.
    if (!el && (event.target as Element).closest('[data-kind="step"]')) return;
    if (!el || !pathway || !point) {
      if (viewport) this.#pan = { x: event.clientX, y: event.clientY, left: viewport.scrollLeft, top: viewport.scrollTop, viewport };
      overlay.setPointerCapture(event.pointerId);
      return;
    }
    const target: DragTarget = { pathway, point, role: el.getAttribute('data-kind') === 'label' ? 'label' : 'level', slot: slots.get(levelKey(pathway, point)) ?? 0 };
    const store = this.#store;
    store.selection = { pathway, point };
    this.#gesture = {
      target, start: store.doc, x0: event.clientX, y0: event.clientY, pxPerMm: overlay.getBoundingClientRect().width / scene.widthMm,
      axis: target.role === 'label' ? 'y' : null, id: ++this.#count, blocked: levelLock(store.doc, pathway, point), committedDy: 0, pending: null,
    };
    this.dragging = true;
    overlay.setPointerCapture(event.pointerId);
    event.preventDefault();
  }

  move(event: PointerEvent): void {
    const pan = this.#pan;
    if (pan) {
      pan.viewport.scrollLeft = pan.left - (event.clientX - pan.x);
      pan.viewport.scrollTop = pan.top - (event.clientY - pan.y);
      return;
    }
    const g = this.#gesture;
    if (!g) return;
    const t0 = performance.now();
    markFrame(event.timeStamp);
    const dx = event.clientX - g.x0, dy = event.clientY - g.y0;
    if (g.axis === null) {
      if (Math.hypot(dx, dy) < AXIS_LOCK_PX) return;
      g.axis = Math.abs(dy) >= Math.abs(dx) ? 'y' : 'x';
    }
    if (g.target.role === 'label' && !g.target.labelFrom) g.target = { ...g.target, labelFrom: this.#labelFrom(g) };
    const level = g.target.role === 'level' && g.axis === 'y';
    if (level && g.blocked) { this.note = `Dragging is off: ${g.blocked}.`; return; }
    const dyMm = dy / g.pxPerMm;
    const next = dragEdit(g.start, g.target, g.axis, dx / g.pxPerMm, dyMm, this.#view().geometry);
    if (!level || this.#commitCost <= LIVE_BUDGET_MS) return this.#commit(g, next, dyMm);
    g.pending = next;
    if (!this.ahead) this.ahead = { pathway: g.target.pathway, point: g.target.point };
    this.shift = { pathway: g.target.pathway, point: g.target.point, dyMm: dyMm - g.committedDy };
    flushSync();
    markWork(t0);
    clearTimeout(g.timer);
    g.timer = setTimeout(() => { if (g.pending) this.#commit(g, g.pending, dyMm); }, REST_MS);
  }

  up(): void {
    this.#pan = null;
    const g = this.#gesture;
    if (g) {
      if (g.pending) this.#commit(g, g.pending, g.committedDy);
      clearTimeout(g.timer);
      this.#store.endGroup();
    }
    this.shift = null;
    this.ahead = null;
    this.#gesture = null;
    this.dragging = false;
  }

  /**
   * Where the label is drawn now, as an offset from its default spot. A label the layout
   * moved away to clear others has no offset yet; starting from zero would make it jump
   * back, so the default spot is found by pinning it there once (inside the drag's undo step).
   */
  #labelFrom(g: Gesture): { dx: number; dy: number } {
    const { pathway, point } = g.target;
    const own = g.start.pathways.find((p) => p.id === pathway)?.points.find((p) => p.id === point)?.labelOffsetMm;
    if (own) return own;
    const key = levelKey(pathway, point);
    const drawn = labelBoxes(this.#view().scene).find((b) => b.key === key);
    if (!drawn) return { dx: 0, dy: 0 };
    this.#store.apply(setLabelOffset(g.start, { pathway, point, offset: { dx: 0, dy: 0 } }), { group: `drag:${g.id}`, windowMs: Number.POSITIVE_INFINITY });
    flushSync();
    const home = labelBoxes(this.#view().scene).find((b) => b.key === key);
    return home ? { dx: drawn.x - home.x, dy: drawn.y - home.y } : { dx: 0, dy: 0 };
  }

  #commit(g: Gesture, next: Document, dyMm: number): void {
    clearTimeout(g.timer);
    const t0 = performance.now();
    this.#store.apply(next, { group: `drag:${g.id}`, windowMs: Number.POSITIVE_INFINITY });
    this.shift = null;
    this.ahead = null;
    flushSync();
    this.#commitCost = performance.now() - t0;
    g.committedDy = dyMm;
    g.pending = null;
  }
}
