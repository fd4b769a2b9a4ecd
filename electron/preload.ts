import { contextBridge, ipcRenderer, webUtils } from 'electron';
import { COMMANDS_GLOBAL, HOST_COMMAND_CHANNEL, HOST_GLOBAL, hostChannels, type AutosaveSnapshot, type CloseReply, type ExportRequest, type HostApi, type SaveRequest } from '../ui/host/hostApi.ts';
import { createCommandBuffer } from './commandBuffer.ts';
import { DROP_CHANNEL } from './dropRegistry.ts';
import { droppedPaths } from './droppedPaths.ts';

// Each method forwards plain values to its channel; the renderer sees nothing else of Electron.
const host = {
  openDocument: () => ipcRenderer.invoke(hostChannels.openDocument),
  openKnownFile: (path: string) => ipcRenderer.invoke(hostChannels.openKnownFile, path),
  // Only the file's path crosses to the main process; a File made up by script has none ('').
  openDroppedFile: async (file: File) => ipcRenderer.invoke(hostChannels.openDroppedFile, webUtils.getPathForFile(file)),
  saveDocument: (request: SaveRequest) => ipcRenderer.invoke(hostChannels.saveDocument, request),
  exportFile: (request: ExportRequest) => ipcRenderer.invoke(hostChannels.exportFile, request),
  recentFiles: () => ipcRenderer.invoke(hostChannels.recentFiles),
  autosave: (snapshot: AutosaveSnapshot | null) => ipcRenderer.invoke(hostChannels.autosave, snapshot),
  recoveryOffer: () => ipcRenderer.invoke(hostChannels.recoveryOffer),
  dismissRecovery: () => ipcRenderer.invoke(hostChannels.dismissRecovery),
  replyClose: (reply: CloseReply) => ipcRenderer.invoke(hostChannels.replyClose, reply),
  hostInfo: () => ipcRenderer.invoke(hostChannels.hostInfo),
} satisfies HostApi;

const commands = createCommandBuffer((message) => console.warn(`[passline] ${message}`));
ipcRenderer.on(HOST_COMMAND_CHANNEL, (_event, value: unknown) => commands.receive(value));

// Capture phase: the paths of a real drop reach the main process before the page's own
// handler asks to open one; main opens only paths announced this way.
globalThis.addEventListener?.('drop', (event) => {
  const paths = droppedPaths(event as DragEvent, (file) => webUtils.getPathForFile(file));
  if (paths.length > 0) ipcRenderer.send(DROP_CHANNEL, paths);
}, true);

contextBridge.exposeInMainWorld(HOST_GLOBAL, host);
contextBridge.exposeInMainWorld(COMMANDS_GLOBAL, commands.source);
