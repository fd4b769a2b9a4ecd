import { describe, expect, it, vi } from 'vitest';
import type { MenuItemConstructorOptions } from 'electron';
import { buildMenuTemplate, type MenuActions } from '../../../electron/menuTemplate.ts';

function actions() {
  return { command: vi.fn(), openRecent: vi.fn(), clearRecent: vi.fn(), about: vi.fn() } satisfies MenuActions;
}

/** Every item of a template, submenus included. */
function flatten(items: MenuItemConstructorOptions[]): MenuItemConstructorOptions[] {
  return items.flatMap((item) => [item, ...(Array.isArray(item.submenu) ? flatten(item.submenu) : [])]);
}

function byId(items: MenuItemConstructorOptions[], id: string): MenuItemConstructorOptions {
  const found = flatten(items).find((item) => item.id === id);
  if (!found) throw new Error(`no menu item ${id}`);
  return found;
}

const click = (item: MenuItemConstructorOptions) => (item.click as () => void)();

describe('buildMenuTemplate', () => {
  it('gives every document command its accelerator', () => {
    const t = buildMenuTemplate({ platform: 'linux', appName: 'Passline', recent: [], actions: actions() });
    const accelerators = Object.fromEntries(['new', 'open', 'save', 'save-as', 'export-svg', 'export-pdf', 'undo', 'redo', 'zoom-in', 'zoom-out', 'zoom-reset'].map((id) => [id, byId(t, id).accelerator]));
    expect(accelerators).toEqual({
      new: 'CmdOrCtrl+N', open: 'CmdOrCtrl+O', save: 'CmdOrCtrl+S', 'save-as': 'CmdOrCtrl+Shift+S',
      'export-svg': 'CmdOrCtrl+E', 'export-pdf': 'CmdOrCtrl+Shift+E', undo: 'CmdOrCtrl+Z', redo: 'CmdOrCtrl+Y',
      'zoom-in': 'CmdOrCtrl+=', 'zoom-out': 'CmdOrCtrl+-', 'zoom-reset': 'CmdOrCtrl+0',
    });
    // Platform convention: redo is Shift+Cmd+Z on macOS (Apple HIG "Undo and redo", from memory).
    expect(byId(buildMenuTemplate({ platform: 'darwin', appName: 'Passline', recent: [], actions: actions() }), 'redo').accelerator).toBe('CmdOrCtrl+Shift+Z');
  });

  it('sends document commands to the renderer and lets zoom act on the window', () => {
    const a = actions();
    const t = buildMenuTemplate({ platform: 'win32', appName: 'Passline', recent: [], actions: a });
    click(byId(t, 'save-as'));
    click(byId(t, 'export-markdown'));
    click(byId(t, 'undo'));
    expect(a.command.mock.calls.map((call) => call[0])).toEqual([{ kind: 'saveAs' }, { kind: 'export', format: 'markdown' }, { kind: 'undo' }]);
    expect(byId(t, 'zoom-in').role).toBe('zoomIn');
    expect(byId(t, 'zoom-in').click).toBeUndefined();
  });

  it('lists recent documents, telling same-named ones apart by folder, with a clear item', () => {
    const a = actions();
    const recent = [{ name: 'a.passline', path: '/x/a.passline' }, { name: 'a.passline', path: '/y/a.passline' }, { name: 'b.passline', path: '/x/b.passline' }];
    const t = buildMenuTemplate({ platform: 'linux', appName: 'Passline', recent, actions: a });
    const submenu = byId(t, 'open-recent').submenu as MenuItemConstructorOptions[];
    expect(submenu.map((item) => item.label ?? item.type)).toEqual(['a.passline — /x', 'a.passline — /y', 'b.passline', 'separator', 'Clear Recent Documents']);
    click(submenu[1]!);
    click(byId(t, 'clear-recent'));
    expect(a.openRecent).toHaveBeenCalledWith('/y/a.passline');
    expect(a.clearRecent).toHaveBeenCalled();
  });

  it('shows a disabled placeholder when there are no recent documents', () => {
    const t = buildMenuTemplate({ platform: 'linux', appName: 'Passline', recent: [], actions: actions() });
    expect(byId(t, 'open-recent').submenu).toEqual([{ id: 'recent-none', label: 'No Recent Documents', enabled: false }]);
  });

  it('puts About in the app menu on macOS and in Help elsewhere', () => {
    const a = actions();
    const mac = buildMenuTemplate({ platform: 'darwin', appName: 'Passline', recent: [], actions: a });
    const linux = buildMenuTemplate({ platform: 'linux', appName: 'Passline', recent: [], actions: a });
    expect((mac[0]!.submenu as MenuItemConstructorOptions[])[0]?.id).toBe('about');
    expect(mac[0]!.label).toBe('Passline');
    expect(linux.at(-1)!.label).toBe('&Help');
    click(byId(linux, 'about'));
    expect(a.about).toHaveBeenCalled();
  });

  it('keeps the text-editing roles so fields can cut, copy and paste', () => {
    const roles = flatten(buildMenuTemplate({ platform: 'darwin', appName: 'Passline', recent: [], actions: actions() })).map((item) => item.role);
    expect(roles).toEqual(expect.arrayContaining(['cut', 'copy', 'paste', 'selectAll', 'quit']));
  });
});
