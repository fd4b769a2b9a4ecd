import type { Role, SceneItem } from './scene.ts';

/** The layers of a figure, bottom to top, and the roles drawn in each (the SVG's groups). */
export const SCENE_LAYERS: readonly { id: string; roles: readonly Role[] }[] = [
  { id: 'axis', roles: ['axis', 'tick', 'title', 'arrow'] },
  { id: 'connectors', roles: ['connector'] },
  { id: 'levels', roles: ['level'] },
  { id: 'error-bars', roles: ['errorBar'] },
  { id: 'annotations', roles: ['annotation'] },
  { id: 'labels', roles: ['label', 'leader'] },
  { id: 'structures', roles: ['structure'] },
  { id: 'legend', roles: ['legend'] },
];

/** One layer's items, split by pathway (items of no pathway under `pathway: null`), in drawing order. */
export interface SceneLayer {
  id: string;
  groups: { pathway: string | null; items: SceneItem[] }[];
}

/**
 * Sorts scene items into the layers (an item whose role no layer names, such as a
 * primitive added later, gets a layer named after its role, above the rest), each layer
 * into one group per pathway in order of first appearance. Items keep their order within
 * a group.
 */
export function sceneLayers(items: readonly SceneItem[]): SceneLayer[] {
  const layerOf = new Map<string, string>(SCENE_LAYERS.flatMap((l) => l.roles.map((r) => [r, l.id] as const)));
  const layers = new Map<string, SceneLayer>(SCENE_LAYERS.map((l) => [l.id, { id: l.id, groups: [] }]));
  for (const item of items) {
    const role = String((item as { role?: unknown }).role ?? 'other');
    if (role === 'background') continue;
    const id = layerOf.get(role) ?? role;
    let layer = layers.get(id);
    if (!layer) layers.set(id, (layer = { id, groups: [] }));
    const pathway = (item as { pathway?: string }).pathway ?? null;
    let group = layer.groups.find((g) => g.pathway === pathway);
    if (!group) layer.groups.push((group = { pathway, items: [] }));
    group.items.push(item);
  }
  return [...layers.values()].filter((l) => l.groups.length > 0);
}

/** The items in layer order (stable within a layer), so every output stacks them alike. */
export function inLayerOrder(items: readonly SceneItem[]): SceneItem[] {
  const rank = new Map<string, number>(SCENE_LAYERS.flatMap((l, i) => l.roles.map((r) => [r, i] as const)));
  const of = (item: SceneItem) => {
    const role = String((item as { role?: unknown }).role ?? '');
    return role === 'background' ? -1 : rank.get(role) ?? SCENE_LAYERS.length;
  };
  return items.map((item, i) => ({ item, i, r: of(item) })).sort((a, b) => a.r - b.r || a.i - b.i).map((e) => e.item);
}
