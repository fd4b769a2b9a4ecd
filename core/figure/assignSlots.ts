/** What slot assignment needs to know about a point. */
export interface SlotPoint {
  label: string;
  /** Explicit slot from the document (figure units), taken as given. */
  x?: number;
}

/**
 * Horizontal slots for every point of every pathway. By default point i sits in slot i.
 * The k-th point labelled L in a pathway shares the slot of the k-th L seen in earlier
 * pathways (so shared states line up), as long as slots keep increasing along the
 * pathway; points between two such anchors are spread evenly between them. A pathway
 * that shares no state with earlier ones and has fewer points is spread over their width.
 */
export function assignSlots(pathways: readonly (readonly SlotPoint[])[]): number[][] {
  const seen = new Map<string, number[]>();
  const slots = pathways.map((points) => {
    const own = fillBetween(points.length, findAnchors(points, seen));
    register(points, own, seen);
    return own;
  });
  // A shorter pathway sharing no state with any other spans the same width (e.g. an
  // uncatalysed route drawn with a catalysed one: same start and end).
  const widest = Math.max(0, ...slots.flat());
  return slots.map((own, p) => {
    const points = pathways[p]!;
    const n = points.length;
    const isolated = n >= 2 && points.every((q) => q.x === undefined && !sharedElsewhere(q.label, p, pathways));
    return isolated && widest > n - 1 ? own.map((_, i) => (i * widest) / (n - 1)) : own;
  });
}

function sharedElsewhere(label: string, p: number, pathways: readonly (readonly SlotPoint[])[]): boolean {
  const key = label.trim();
  return key !== '' && pathways.some((other, o) => o !== p && other.some((q) => q.label.trim() === key));
}

function findAnchors(points: readonly SlotPoint[], seen: Map<string, number[]>): Map<number, number> {
  const anchors = new Map<number, number>();
  const count = new Map<string, number>();
  let last = -Infinity;
  points.forEach((p, i) => {
    const key = p.label.trim();
    const k = count.get(key) ?? 0;
    count.set(key, k + 1);
    if (p.x !== undefined) {
      anchors.set(i, p.x);
      last = p.x;
      return;
    }
    const shared = key ? seen.get(key)?.[k] : undefined;
    if (shared !== undefined && shared > last) {
      anchors.set(i, shared);
      last = shared;
    }
  });
  return anchors;
}

function fillBetween(n: number, anchors: Map<number, number>): number[] {
  const slots = new Array<number>(n);
  // A virtual anchor before the first point keeps the default "slot = index".
  let prevIndex = -1;
  let prevSlot = -1;
  const ordered = [...anchors.entries()].sort((a, b) => a[0] - b[0]);
  for (const [index, slot] of ordered) {
    for (let i = prevIndex + 1; i < index; i++) slots[i] = prevSlot + ((i - prevIndex) * (slot - prevSlot)) / (index - prevIndex);
    slots[index] = slot;
    prevIndex = index;
    prevSlot = slot;
  }
  for (let i = prevIndex + 1; i < n; i++) slots[i] = prevSlot + (i - prevIndex);
  return slots;
}

function register(points: readonly SlotPoint[], slots: number[], seen: Map<string, number[]>): void {
  const count = new Map<string, number>();
  points.forEach((p, i) => {
    const key = p.label.trim();
    if (!key) return;
    const k = count.get(key) ?? 0;
    count.set(key, k + 1);
    const list = seen.get(key) ?? [];
    if (list.length === k) list.push(slots[i]!);
    seen.set(key, list);
  });
}
