import { describe, expect, it } from 'vitest';
import { parseHostCommand } from '../../../../ui/host/hostCommand.ts';
import { acceleratorOf, commandForKey, commandShortcuts, shortcutFor } from '../../../../ui/host/commandShortcuts.ts';

describe('parseHostCommand', () => {
  it('accepts exactly the known commands', () => {
    expect(parseHostCommand({ kind: 'save' })).toEqual({ kind: 'save' });
    expect(parseHostCommand({ kind: 'export', format: 'pdf' })).toEqual({ kind: 'export', format: 'pdf' });
    expect(parseHostCommand({ kind: 'openKnown', path: '/d/a.passline' })).toEqual({ kind: 'openKnown', path: '/d/a.passline' });
  });

  it('refuses unknown kinds, extra or missing fields, wrong types and non-objects', () => {
    for (const bad of [null, 'save', [], { kind: 'eval' }, { kind: 'save', then: 'x' }, { kind: 'export' }, { kind: 'export', format: 'exe' },
      { kind: 'openKnown', path: '' }, { kind: 'openKnown', path: 3 }, { kind: 'openKnown', path: 'x'.repeat(5000) }, { kind: 'toString' }]) {
      expect(parseHostCommand(bad)).toBeNull();
    }
  });
});

describe('command shortcuts', () => {
  it('are declared once with the platform command key', () => {
    expect(acceleratorOf(shortcutFor({ kind: 'saveAs' })!)).toBe('CmdOrCtrl+Shift+S');
    const chords = commandShortcuts.map((s) => `${s.shift ? 'shift+' : ''}${s.key}`);
    expect(new Set(chords).size).toBe(chords.length);
  });

  it('map Ctrl chords on Windows and Linux and ⌘ chords on macOS, never with Alt', () => {
    const key = (k: string, mods: Partial<{ shiftKey: boolean; ctrlKey: boolean; metaKey: boolean; altKey: boolean }>) => ({ key: k, shiftKey: false, ctrlKey: false, metaKey: false, altKey: false, ...mods });
    expect(commandForKey(key('s', { ctrlKey: true }), false)).toEqual({ kind: 'save' });
    expect(commandForKey(key('S', { ctrlKey: true, shiftKey: true }), false)).toEqual({ kind: 'saveAs' });
    expect(commandForKey(key('s', { metaKey: true }), false)).toBeNull();
    expect(commandForKey(key('z', { metaKey: true }), true)).toEqual({ kind: 'undo' });
    expect(commandForKey(key('z', { ctrlKey: true }), true)).toBeNull();
    expect(commandForKey(key('s', { ctrlKey: true, altKey: true }), false)).toBeNull();
    expect(commandForKey(key('q', { ctrlKey: true }), false)).toBeNull();
  });
});
