/** A rectangle in screen pixels. */
export interface Bounds {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** The window's place as remembered between sessions. */
export interface WindowState {
  bounds: Bounds;
  maximized: boolean;
}

/** Smallest window size the app allows (also in windowOptions). */
export const MIN_WINDOW = { width: 640, height: 420 } as const;

/** Default size when nothing usable is remembered. */
export const DEFAULT_WINDOW = { width: 1200, height: 800 } as const;

// Of the window's title bar, at least this much must lie on a screen to be grabbed and moved.
const GRAB_MARGIN = 48;

const isCount = (value: unknown): value is number => typeof value === 'number' && Number.isFinite(value);

/** The stored state in `value` when it is well-formed, else null. */
export function parseWindowState(value: unknown): WindowState | null {
  if (typeof value !== 'object' || value === null) return null;
  const { bounds, maximized } = value as { bounds?: Partial<Bounds>; maximized?: unknown };
  if (typeof bounds !== 'object' || bounds === null || typeof maximized !== 'boolean') return null;
  const { x, y, width, height } = bounds;
  if (![x, y, width, height].every(isCount) || width! <= 0 || height! <= 0) return null;
  return { bounds: { x: x!, y: y!, width: width!, height: height! }, maximized };
}

function overlap(a: Bounds, b: Bounds): { width: number; height: number } {
  return {
    width: Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x),
    height: Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y),
  };
}

/**
 * Where to open the window: the remembered place when its top edge can still be grabbed on
 * one of today's screens (a monitor may have been unplugged since), shrunk to fit that
 * screen; otherwise the default size centred by the system (no x and y).
 */
export function placeWindow(saved: WindowState | null, workAreas: readonly Bounds[]): { bounds: Partial<Bounds> & { width: number; height: number }; maximized: boolean } {
  const fallback = { bounds: { ...DEFAULT_WINDOW }, maximized: saved?.maximized ?? false };
  if (!saved) return fallback;
  const titleBar = { ...saved.bounds, height: Math.min(saved.bounds.height, GRAB_MARGIN) };
  const screen = workAreas.find((area) => {
    const seen = overlap(titleBar, area);
    return seen.width >= GRAB_MARGIN && seen.height > 0;
  });
  if (!screen) return fallback;
  const width = Math.max(MIN_WINDOW.width, Math.min(saved.bounds.width, screen.width));
  const height = Math.max(MIN_WINDOW.height, Math.min(saved.bounds.height, screen.height));
  const x = Math.min(Math.max(saved.bounds.x, screen.x), screen.x + screen.width - width);
  const y = Math.min(Math.max(saved.bounds.y, screen.y), screen.y + screen.height - height);
  return { bounds: { x, y, width, height }, maximized: saved.maximized };
}
