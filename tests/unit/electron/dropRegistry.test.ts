import { describe, expect, it } from 'vitest';
import { DropRegistry } from '../../../electron/dropRegistry.ts';
import { droppedPaths } from '../../../electron/droppedPaths.ts';

describe('DropRegistry', () => {
  it('lets a dropped path be opened once, within seconds of the drop', () => {
    let now = 1_000;
    const drops = new DropRegistry(() => now);
    drops.record(['/home/u/a.passline', 42, '', '/x\u0000y']);
    expect(drops.take('/home/u/a.passline')).toBe(true);
    expect(drops.take('/home/u/a.passline')).toBe(false);
    drops.record(['/home/u/b.passline']);
    now += 60_000;
    expect(drops.take('/home/u/b.passline')).toBe(false);
    expect(drops.take('')).toBe(false);
    drops.record('not a list');
  });
});

describe('droppedPaths (preload)', () => {
  const real = new File(['{}'], 'real.passline');
  const pathOf = (file: File) => (file === real ? '/home/u/real.passline' : '');
  it('reads paths only from a trusted drop, and only of files backed by disk', () => {
    expect(droppedPaths({ isTrusted: true, dataTransfer: { files: [real, new File(['x'], 'made.passline')] } }, pathOf)).toEqual(['/home/u/real.passline']);
    expect(droppedPaths({ isTrusted: false, dataTransfer: { files: [real] } }, pathOf)).toEqual([]); // dispatched by script
    expect(droppedPaths({ isTrusted: true, dataTransfer: null }, pathOf)).toEqual([]);
  });
});
