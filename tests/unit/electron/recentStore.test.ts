import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { MAX_RECENT, parseRecent, withRecent, withoutRecent } from '../../../electron/recentFiles.ts';
import { RecentStore } from '../../../electron/recentStore.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-recent-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

const p = (name: string) => join('/docs', name);

describe('recent list', () => {
  it('puts the newest first, moves a repeated file to the front, and keeps at most MAX_RECENT', () => {
    let list = withRecent([], p('a.passline'));
    list = withRecent(list, p('b.passline'));
    list = withRecent(list, p('a.passline'));
    expect(list).toEqual([{ name: 'a.passline', path: p('a.passline') }, { name: 'b.passline', path: p('b.passline') }]);
    for (let i = 0; i < 20; i++) list = withRecent(list, p(`${i}.passline`));
    expect(list).toHaveLength(MAX_RECENT);
    expect(list[0]?.name).toBe('19.passline');
    expect(withoutRecent(list, p('19.passline'))[0]?.name).toBe('18.passline');
  });

  it('reads only well-formed entries from a stored list, in order, without duplicates', () => {
    expect(parseRecent('nonsense')).toEqual([]);
    expect(parseRecent([{ path: p('a.passline') }, { path: 3 }, null, { path: p('b.passline') }, { path: p('a.passline') }]))
      .toEqual([{ name: 'a.passline', path: p('a.passline') }, { name: 'b.passline', path: p('b.passline') }]);
  });
});

describe('RecentStore', () => {
  it('tells the system list of every document added and of clearing, and keeps its own list of removals', async () => {
    const added: string[] = [];
    let cleared = 0;
    const store = new RecentStore(folder, { add: (path) => added.push(path), clear: () => { cleared++; } });
    await store.add(p('a.passline'));
    await store.add(p('b.passline'));
    await store.remove(p('a.passline'));
    expect(added).toEqual([p('a.passline'), p('b.passline')]);
    expect(store.list()).toEqual([{ name: 'b.passline', path: p('b.passline') }]);
    await store.clear();
    expect(cleared).toBe(1);
  });

  it('stores the list in the data folder and reads it back in a new session', async () => {
    const store = new RecentStore(folder);
    expect(await store.load()).toEqual([]);
    await store.add(p('a.passline'));
    await store.add(p('b.passline'));
    expect(store.has(p('a.passline'))).toBe(true);
    expect(await new RecentStore(folder).load()).toEqual([{ name: 'b.passline', path: p('b.passline') }, { name: 'a.passline', path: p('a.passline') }]);
    await store.remove(p('b.passline'));
    expect(JSON.parse(readFileSync(join(folder, 'recent-documents.json'), 'utf8'))).toEqual([{ name: 'a.passline', path: p('a.passline') }]);
    await store.clear();
    expect(await new RecentStore(folder).load()).toEqual([]);
  });

  it('starts empty from a damaged file', async () => {
    writeFileSync(join(folder, 'recent-documents.json'), '[{"path":');
    expect(await new RecentStore(folder).load()).toEqual([]);
  });
});
