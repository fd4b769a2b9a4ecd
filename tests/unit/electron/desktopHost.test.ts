import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { FileFilter } from 'electron';
import { createDesktopHost, type DesktopDialogs, type OverwriteChoice } from '../../../electron/desktopHost.ts';
import { PathGrants } from '../../../electron/pathGrants.ts';
import { RecentStore } from '../../../electron/recentStore.ts';
import { RecoveryStore } from '../../../electron/recoveryStore.ts';
import { DropRegistry } from '../../../electron/dropRegistry.ts';

let folder: string;
beforeEach(() => { folder = mkdtempSync(join(tmpdir(), 'passline-host-')); });
afterEach(() => rmSync(folder, { recursive: true, force: true }));

/** Dialogs that answer with the given paths and choices in turn (null = cancelled). */
function dialogs(opens: (string | null)[], saves: (string | null)[] = [], overwrites: OverwriteChoice[] = []) {
  return {
    pickOpenPath: vi.fn(async () => opens.shift() ?? null),
    pickSavePath: vi.fn(async (_name: string, _filter: FileFilter) => saves.shift() ?? null),
    confirmOverwrite: vi.fn(async (_name: string, _changedAt: Date) => overwrites.shift() ?? 'cancel'),
  } satisfies DesktopDialogs;
}

/** A desktop host on the real file system, its app data in a folder of its own. */
function makeHost(d: DesktopDialogs = dialogs([])) {
  const data = join(folder, 'app-data');
  mkdirSync(data);
  const recent = new RecentStore(data);
  const recovery = new RecoveryStore(join(data, 'recovery'));
  const closeReplies: unknown[] = [];
  const onRecentChanged = vi.fn();
  const drops = new DropRegistry();
  const host = createDesktopHost({ dialogs: d, grants: new PathGrants(), drops, recent, recovery, onCloseReply: async (reply) => void closeReplies.push(reply), onRecentChanged, log: () => undefined });
  return { host, recent, recovery, closeReplies, onRecentChanged, drops };
}

function doc(name: string, text: string): string {
  const path = join(folder, name);
  writeFileSync(path, text);
  return path;
}

describe('desktop host: open and save', () => {
  it('opens the picked file and may then save back to it without asking', async () => {
    const path = doc('route.passline', '{"old":true}');
    const d = dialogs([path]);
    const { host } = makeHost(d);
    expect(await host.openDocument()).toEqual({ name: 'route.passline', path, text: '{"old":true}' });
    expect(await host.saveDocument({ suggestedName: 'route.passline', text: '{"new":true}', path })).toEqual({ name: 'route.passline', path });
    expect(readFileSync(path, 'utf8')).toBe('{"new":true}');
    expect(d.pickSavePath).not.toHaveBeenCalled();
    expect(d.confirmOverwrite).not.toHaveBeenCalled();
  });

  it('keeps the version a save replaced as name.passline.bak, one backup deep', async () => {
    const path = doc('route.passline', 'first');
    const { host } = makeHost(dialogs([path]));
    await host.openDocument();
    await host.saveDocument({ suggestedName: 'route.passline', text: 'second', path });
    expect(readFileSync(`${path}.bak`, 'utf8')).toBe('first');
    await host.saveDocument({ suggestedName: 'route.passline', text: 'third', path });
    expect(readFileSync(path, 'utf8')).toBe('third');
    expect(readFileSync(`${path}.bak`, 'utf8')).toBe('second');
  });

  it('asks where to save when the renderer names a path the user never picked', async () => {
    const elsewhere = join(folder, 'chosen');
    const d = dialogs([], [elsewhere]);
    const { host } = makeHost(d);
    const saved = await host.saveDocument({ suggestedName: 'a.passline', text: 'x', path: join(folder, 'not-granted.passline') });
    expect(d.pickSavePath).toHaveBeenCalledWith('a.passline', { name: 'Passline document', extensions: ['passline'] });
    // The dialog answer had no extension; the document extension is added.
    expect(saved).toEqual({ name: 'chosen.passline', path: `${elsewhere}.passline` });
    expect(readFileSync(`${elsewhere}.passline`, 'utf8')).toBe('x');
    expect(existsSync(`${elsewhere}.passline.bak`)).toBe(false);
  });

  it('resolves to null when a dialog is cancelled', async () => {
    const { host } = makeHost(dialogs([null], [null, null]));
    expect(await host.openDocument()).toBeNull();
    expect(await host.saveDocument({ suggestedName: 'a.passline', text: 'x' })).toBeNull();
    expect(await host.exportFile({ suggestedName: 'f.svg', data: '<svg/>', mimeType: 'image/svg+xml' })).toBeNull();
  });

  it('exports bytes atomically to the picked file with the type\'s extension', async () => {
    const d = dialogs([], [join(folder, 'figure')]);
    const { host } = makeHost(d);
    const saved = await host.exportFile({ suggestedName: 'figure.png', data: new Uint8Array([137, 80, 78, 71]), mimeType: 'image/png' });
    expect(saved?.name).toBe('figure.png');
    expect([...readFileSync(join(folder, 'figure.png'))]).toEqual([137, 80, 78, 71]);
    expect(d.pickSavePath.mock.calls[0]?.[1]).toEqual({ name: 'PNG image', extensions: ['png'] });
  });

  it('sweeps an old temporary file an interrupted export of the same file left', async () => {
    const stale = doc('.figure.svg.0123456789ab.tmp', '<sv');
    utimesSync(stale, new Date(Date.now() - 3_600_000), new Date(Date.now() - 3_600_000));
    const { host } = makeHost(dialogs([], [join(folder, 'figure.svg')]));
    await host.exportFile({ suggestedName: 'figure.svg', data: '<svg/>', mimeType: 'image/svg+xml' });
    expect(existsSync(stale)).toBe(false);
    expect(readFileSync(join(folder, 'figure.svg'), 'utf8')).toBe('<svg/>');
  });

  it('names the file and the reason when reading fails', async () => {
    const { host } = makeHost(dialogs([join(folder, 'gone.passline')]));
    await expect(host.openDocument()).rejects.toThrow('could not read gone.passline (ENOENT)');
  });

  it.skipIf(process.platform === 'win32' || process.getuid?.() === 0)('names the file and the reason when writing fails', async () => {
    const locked = join(folder, 'locked');
    mkdirSync(locked);
    chmodSync(locked, 0o500);
    const { host } = makeHost(dialogs([], [join(locked, 'doc.passline')]));
    await expect(host.saveDocument({ suggestedName: 'doc.passline', text: 'x' })).rejects.toThrow('could not write doc.passline (EACCES)');
    chmodSync(locked, 0o700);
  });

  it('says it can save in place', async () => {
    expect(await makeHost().host.hostInfo()).toEqual({ kind: 'desktop', canSaveInPlace: true });
  });
});

describe('desktop host: changes made on disk by someone else', () => {
  it('asks before saving over a file changed since it was opened, and cancelling leaves it alone', async () => {
    const path = doc('shared.passline', 'as opened');
    const d = dialogs([path], [], ['cancel']);
    const { host } = makeHost(d);
    await host.openDocument();
    writeFileSync(path, 'edited elsewhere');
    expect(await host.saveDocument({ suggestedName: 'shared.passline', text: 'mine', path })).toBeNull();
    expect(d.confirmOverwrite).toHaveBeenCalledWith('shared.passline', expect.any(Date));
    expect(readFileSync(path, 'utf8')).toBe('edited elsewhere');
  });

  it('replaces the file when the user says so, keeping the other program\'s version as the backup', async () => {
    const path = doc('shared.passline', 'as opened');
    const { host } = makeHost(dialogs([path], [], ['overwrite']));
    await host.openDocument();
    writeFileSync(path, 'edited elsewhere');
    await host.saveDocument({ suggestedName: 'shared.passline', text: 'mine', path });
    expect(readFileSync(path, 'utf8')).toBe('mine');
    expect(readFileSync(`${path}.bak`, 'utf8')).toBe('edited elsewhere');
  });

  it('offers Save As… instead, leaving the changed file as it is', async () => {
    const path = doc('shared.passline', 'as opened');
    const { host } = makeHost(dialogs([path], [join(folder, 'copy.passline')], ['saveAs']));
    await host.openDocument();
    writeFileSync(path, 'edited elsewhere');
    expect(await host.saveDocument({ suggestedName: 'shared.passline', text: 'mine', path })).toEqual({ name: 'copy.passline', path: join(folder, 'copy.passline') });
    expect(readFileSync(path, 'utf8')).toBe('edited elsewhere');
  });

  it('does not ask when the file was only touched (same contents, new time), nor after its own saves', async () => {
    const path = doc('shared.passline', 'as opened');
    const d = dialogs([path]);
    const { host } = makeHost(d);
    await host.openDocument();
    utimesSync(path, new Date(2001, 0, 1), new Date(2001, 0, 1));
    await host.saveDocument({ suggestedName: 'shared.passline', text: 'one', path });
    await host.saveDocument({ suggestedName: 'shared.passline', text: 'two', path });
    expect(d.confirmOverwrite).not.toHaveBeenCalled();
    expect(readFileSync(path, 'utf8')).toBe('two');
  });

  it('notices a change that keeps the size (contents decide, not size and time alone)', async () => {
    const path = doc('shared.passline', 'AAAA');
    const d = dialogs([path], [], ['cancel']);
    const { host } = makeHost(d);
    await host.openDocument();
    const { mtime } = { mtime: new Date() };
    writeFileSync(path, 'BBBB');
    utimesSync(path, mtime, mtime);
    await host.saveDocument({ suggestedName: 'shared.passline', text: 'mine', path });
    expect(d.confirmOverwrite).toHaveBeenCalledTimes(1);
  });
});

describe('desktop host: known files, drops and the recent list', () => {
  it('lists opened and saved files, newest first, and reopens them by path', async () => {
    const a = doc('a.passline', 'A');
    const { host, onRecentChanged } = makeHost(dialogs([a], [join(folder, 'b.passline')]));
    await host.openDocument();
    await host.saveDocument({ suggestedName: 'b.passline', text: 'B' });
    expect(await host.recentFiles()).toEqual([{ name: 'b.passline', path: join(folder, 'b.passline') }, { name: 'a.passline', path: a }]);
    expect(onRecentChanged).toHaveBeenCalledTimes(2);
    expect((await host.openKnownFile(a))?.text).toBe('A');
  });

  it('refuses to open a path the user never chose', async () => {
    const secret = doc('secret.passline', 'S');
    await expect(makeHost().host.openKnownFile(secret)).rejects.toThrow('secret.passline was not chosen in this app; use Open… to pick it');
  });

  it('takes a file that disappeared off the recent list', async () => {
    const a = doc('a.passline', 'A');
    const { host } = makeHost(dialogs([a]));
    await host.openDocument();
    rmSync(a);
    await expect(host.openKnownFile(a)).rejects.toThrow('could not read a.passline (ENOENT)');
    expect(await host.recentFiles()).toEqual([]);
  });

  it('opens a dropped document but refuses other files, folders and made-up paths', async () => {
    const { host, drops } = makeHost();
    const dropped = doc('dropped.passline', 'D');
    const notes = doc('notes.txt', 'x');
    mkdirSync(join(folder, 'folder.passline'));
    drops.record([dropped, notes, join(folder, 'folder.passline'), 'relative.passline']);
    expect(await host.openDroppedFile(dropped)).toEqual({ name: 'dropped.passline', path: dropped, text: 'D' });
    await expect(host.openDroppedFile(notes)).rejects.toThrow('only .passline documents can be opened');
    await expect(host.openDroppedFile(join(folder, 'folder.passline'))).rejects.toThrow('it is not a file');
    await expect(host.openDroppedFile('relative.passline')).rejects.toThrow('not an absolute path');
  });

  it('reads and grants no path that did not come from a real drop', async () => {
    const { host, drops } = makeHost();
    const secret = doc('secret.passline', 'S');
    await expect(host.openDroppedFile(secret)).rejects.toThrow('secret.passline was not dropped on the window; use Open… to pick it');
    drops.record([secret]);
    await host.openDroppedFile(secret);
    await expect(host.openDroppedFile(secret)).rejects.toThrow('was not dropped'); // a drop opens once
    expect(await host.saveDocument({ suggestedName: 'x.passline', text: 'new', path: doc('other.passline', 'O') })).toBeNull();
  });
});

describe('desktop host: working copy and closing', () => {
  it('stores and clears the working copy, and passes close replies on', async () => {
    const { host, recovery, closeReplies } = makeHost();
    await recovery.begin();
    await host.autosave({ name: 'untitled.passline', text: '{"draft":1}' });
    expect(existsSync(join(folder, 'app-data', 'recovery', 'working-copy.json'))).toBe(true);
    await host.autosave(null);
    expect(existsSync(join(folder, 'app-data', 'recovery', 'working-copy.json'))).toBe(false);
    await host.replyClose({ dirty: true, name: 'untitled.passline' });
    expect(closeReplies).toEqual([{ dirty: true, name: 'untitled.passline' }]);
  });

  it('offers a copy left by a crashed session as untitled text: a path named in the autosave is never granted', async () => {
    const path = doc('route.passline', 'on disk');
    const elsewhere = doc('not-chosen.passline', 'keep me'); // named by the renderer, never picked by the user
    const first = makeHost(dialogs([path]));
    await first.recovery.begin();
    await first.host.autosave({ name: 'route.passline', path: elsewhere, text: 'unsaved edits' });
    // No end(): the session crashed. A new session starts on the same data folder.
    const recovery = new RecoveryStore(join(folder, 'app-data', 'recovery'));
    await recovery.begin();
    const d = dialogs([], [null]);
    const host = createDesktopHost({ dialogs: d, grants: new PathGrants(), drops: new DropRegistry(), recent: new RecentStore(join(folder, 'app-data')), recovery, onCloseReply: async () => undefined, onRecentChanged: () => undefined, log: () => undefined });
    const offer = await host.recoveryOffer();
    expect(offer).toEqual({ name: 'route.passline', text: 'unsaved edits', savedAt: expect.any(String) });
    expect(await host.saveDocument({ suggestedName: 'route.passline', text: offer!.text, path: elsewhere })).toBeNull();
    expect(d.pickSavePath).toHaveBeenCalledTimes(1); // the save asked where; the user cancelled
    expect(readFileSync(elsewhere, 'utf8')).toBe('keep me');
    expect(readFileSync(path, 'utf8')).toBe('on disk');
    await host.dismissRecovery();
    expect(await host.recoveryOffer()).toBeNull();
  });
});
