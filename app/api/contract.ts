/**
 * The typed API between the UI and the Node side, one entry per operation.
 *
 * Pure types: the renderer imports this with `import type`, the Electron preload and main process
 * use it to type their single channel per operation, and the browser-mode server mirrors each
 * channel as `POST /api/<name>` (the channel name with ':' replaced by '-', e.g. `app:info` ->
 * `/api/app-info`). Every request and response is plain JSON-serialisable data.
 */

/** What the running program is, for the title bar and the report footer. */
export interface AppInfo {
  readonly name: string;
  readonly version: string;
}

/** Channel name -> request and response. Add one entry per operation. */
export interface ApiChannels {
  'app:info': { readonly request: Record<string, never>; readonly response: AppInfo };
}

export type ApiChannel = keyof ApiChannels;
export type ApiRequest<C extends ApiChannel> = ApiChannels[C]['request'];
export type ApiResponse<C extends ApiChannel> = ApiChannels[C]['response'];

/** A failed call, as both transports report it: one sentence naming what was wrong. */
export interface ApiError {
  readonly error: string;
}

/**
 * The functions the preload exposes as `window.lamina` in the desktop app, one per channel. The
 * renderer's transport in browser mode implements the same interface over HTTP.
 */
export interface LaminaApi {
  appInfo(): Promise<AppInfo>;
}

/**
 * What an IPC handler returns: the response, or the one-sentence refusal. Handlers return this
 * envelope instead of throwing, because Electron rewrites thrown errors' messages in transit.
 */
export type IpcReply<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly error: string };
