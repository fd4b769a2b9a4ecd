import type { MenuItemConstructorOptions } from 'electron';
import { dirname } from 'node:path';
import type { RecentFile } from '../ui/host/hostApi.ts';
import { acceleratorOf, shortcutFor } from '../ui/host/commandShortcuts.ts';
import type { ExportFormat, HostCommand } from '../ui/host/hostCommand.ts';

/** What menu items do when chosen. */
export interface MenuActions {
  /** Sends a command to the renderer. */
  command(command: HostCommand): void;
  /** Opens a document from the recent list. */
  openRecent(path: string): void;
  clearRecent(): void;
  about(): void;
}

/** What the menu shows. */
export interface MenuInput {
  platform: NodeJS.Platform;
  appName: string;
  recent: readonly RecentFile[];
  actions: MenuActions;
}

/** A menu item that sends `command`, with the accelerator declared for it in commandShortcuts. */
function commandItem(id: string, label: string, command: HostCommand, actions: MenuActions, accelerator?: string): MenuItemConstructorOptions {
  const shortcut = shortcutFor(command);
  const chord = accelerator ?? (shortcut ? acceleratorOf(shortcut) : undefined);
  return { id, label, ...(chord ? { accelerator: chord } : {}), click: () => actions.command(command) };
}

const EXPORT_ITEMS: [ExportFormat, string][] = [
  ['svg', 'Figure as SVG…'],
  ['pdf', 'Figure as PDF…'],
  ['png', 'Figure as PNG…'],
  ['csv', 'Energies as CSV Table…'],
  ['markdown', 'Energies as Markdown Table…'],
];

/** The recent submenu: one item per document (the folder added where names repeat), then "Clear". */
function recentItems(recent: readonly RecentFile[], actions: MenuActions): MenuItemConstructorOptions[] {
  if (recent.length === 0) return [{ id: 'recent-none', label: 'No Recent Documents', enabled: false }];
  const repeated = (name: string) => recent.filter((entry) => entry.name === name).length > 1;
  return [
    ...recent.map((entry, index): MenuItemConstructorOptions => ({
      id: `recent-${index}`,
      label: repeated(entry.name) ? `${entry.name} — ${dirname(entry.path)}` : entry.name,
      click: () => actions.openRecent(entry.path),
    })),
    { type: 'separator' },
    { id: 'clear-recent', label: 'Clear Recent Documents', click: () => actions.clearRecent() },
  ];
}

/**
 * The application menu as a plain template (Electron's `Menu.buildFromTemplate` turns it
 * into a menu). Document commands go to the renderer; zoom acts on the window itself;
 * the text-editing roles keep cut, copy and paste working in fields on every system.
 */
export function buildMenuTemplate({ platform, appName, recent, actions }: MenuInput): MenuItemConstructorOptions[] {
  const mac = platform === 'darwin';
  const about: MenuItemConstructorOptions = { id: 'about', label: `About ${appName}`, click: () => actions.about() };
  const file: MenuItemConstructorOptions = {
    label: '&File',
    submenu: [
      commandItem('new', 'New Document', { kind: 'new' }, actions),
      commandItem('open', 'Open…', { kind: 'open' }, actions),
      { id: 'open-recent', label: 'Open Recent', submenu: recentItems(recent, actions) },
      { type: 'separator' },
      commandItem('save', 'Save', { kind: 'save' }, actions),
      commandItem('save-as', 'Save As…', { kind: 'saveAs' }, actions),
      { id: 'export', label: 'Export', submenu: EXPORT_ITEMS.map(([format, label]) => commandItem(`export-${format}`, label, { kind: 'export', format }, actions)) },
      { type: 'separator' },
      mac ? { role: 'close', label: 'Close Window' } : { role: 'quit', label: 'Quit' },
    ],
  };
  const edit: MenuItemConstructorOptions = {
    label: '&Edit',
    submenu: [
      commandItem('undo', 'Undo', { kind: 'undo' }, actions),
      commandItem('redo', 'Redo', { kind: 'redo' }, actions, mac ? 'CmdOrCtrl+Shift+Z' : 'CmdOrCtrl+Y'),
      { type: 'separator' },
      { role: 'cut' },
      { role: 'copy' },
      { role: 'paste' },
      { role: 'selectAll' },
    ],
  };
  const view: MenuItemConstructorOptions = {
    label: '&View',
    submenu: [
      { id: 'zoom-in', role: 'zoomIn', label: 'Zoom In', accelerator: 'CmdOrCtrl+=' },
      { id: 'zoom-out', role: 'zoomOut', label: 'Zoom Out', accelerator: 'CmdOrCtrl+-' },
      { id: 'zoom-reset', role: 'resetZoom', label: 'Actual Size', accelerator: 'CmdOrCtrl+0' },
      { type: 'separator' },
      { role: 'togglefullscreen' },
    ],
  };
  if (!mac) return [file, edit, view, { label: '&Help', submenu: [about] }];
  const appMenu: MenuItemConstructorOptions = {
    label: appName,
    submenu: [about, { type: 'separator' }, { role: 'services' }, { type: 'separator' }, { role: 'hide' }, { role: 'hideOthers' }, { role: 'unhide' }, { type: 'separator' }, { role: 'quit' }],
  };
  return [appMenu, file, edit, view, { role: 'windowMenu' }];
}
