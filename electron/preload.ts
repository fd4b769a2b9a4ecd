import { contextBridge, ipcRenderer } from 'electron';
import { HOST_GLOBAL, hostChannels, type ExportRequest, type HostApi, type SaveRequest } from '../ui/host/hostApi.ts';

// Each method forwards plain values to its channel; the renderer sees nothing else of Electron.
const host = {
  openDocument: () => ipcRenderer.invoke(hostChannels.openDocument),
  saveDocument: (request: SaveRequest) => ipcRenderer.invoke(hostChannels.saveDocument, request),
  exportFile: (request: ExportRequest) => ipcRenderer.invoke(hostChannels.exportFile, request),
  hostInfo: () => ipcRenderer.invoke(hostChannels.hostInfo),
} satisfies HostApi;

contextBridge.exposeInMainWorld(HOST_GLOBAL, host);
