/**
 * The renderer's way to the Node side. In the desktop app the preload exposes `window.lamina`
 * (one function per IPC channel); in browser mode the same operations are JSON endpoints on the
 * local server (POST /api/<channel name with '-' for ':'>). The UI sees only `LaminaApi`.
 */
import type { ApiError, AppInfo, LaminaApi } from '../../../app/api/contract.js';

declare global {
  interface Window {
    lamina?: LaminaApi;
  }
}

export type Transport = 'desktop' | 'browser';

export function currentTransport(): Transport {
  return window.lamina ? 'desktop' : 'browser';
}

export function laminaApi(): LaminaApi {
  return window.lamina ?? httpApi;
}

const httpApi: LaminaApi = {
  appInfo: () => post<AppInfo>('api/app-info', {}),
};

async function post<T>(path: string, body: unknown): Promise<T> {
  const response = await fetch(new URL(path, document.baseURI), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(body),
  });
  const payload = (await response.json()) as T | ApiError;
  if (!response.ok) {
    const message = (payload as ApiError).error ?? `The request to ${path} failed with status ${response.status}.`;
    throw new Error(message);
  }
  return payload as T;
}
