/**
 * Preload for the sandboxed renderer (CommonJS: sandboxed preloads cannot be ES modules, and may
 * require only 'electron'). Exposes `window.lamina`, one function per IPC channel, and nothing of
 * Node or of ipcRenderer itself.
 */
import { contextBridge, ipcRenderer } from 'electron';
import type { ApiChannel, ApiRequest, ApiResponse, IpcReply, LaminaApi } from '../../app/api/contract.js';

async function invoke<C extends ApiChannel>(channel: C, request: ApiRequest<C>): Promise<ApiResponse<C>> {
  const reply = (await ipcRenderer.invoke(channel, request)) as IpcReply<ApiResponse<C>>;
  if (reply.ok) return reply.value;
  throw new Error(reply.error);
}

const api: LaminaApi = {
  appInfo: () => invoke('app:info', {}),
};

contextBridge.exposeInMainWorld('lamina', api);
