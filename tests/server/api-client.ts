/**
 * A small typed HTTP client for the browser-mode API, the way the renderer's bridge calls it. It is
 * given the address the server prints (`http://127.0.0.1:PORT/?k=<key>`) and, not being a browser
 * with the cookie, sends the key in the X-Lamina-Key header.
 */
import type { ApiChannel, ApiError, ApiRequest, ApiResponse } from '../../app/api/contract.js';
import { fromWireJson, toWireJson } from '../../app/api/wire-json.js';
import { httpPathFor } from '../../main/server/operations.js';
import { LAUNCH_KEY_HEADER, LAUNCH_KEY_PARAMETER } from '../../main/server/launch-key.js';

export interface ApiAnswer<C extends ApiChannel> {
  readonly status: number;
  readonly body: ApiResponse<C> | ApiError;
  readonly text: string;
}

/** One call; an address without `?k=` sends no key. `headers` adds to or replaces the usual ones. */
export async function call<C extends ApiChannel>(
  address: string,
  channel: C,
  request: ApiRequest<C> | unknown,
  headers: Record<string, string> = {},
): Promise<ApiAnswer<C>> {
  const key = new URL(address).searchParams.get(LAUNCH_KEY_PARAMETER);
  const response = await fetch(new URL(httpPathFor(channel), address), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', ...(key === null ? {} : { [LAUNCH_KEY_HEADER]: key }), ...headers },
    body: toWireJson(request),
  });
  const text = await response.text();
  return { status: response.status, body: fromWireJson(text) as ApiResponse<C> | ApiError, text };
}

/** The response of a call that must succeed; a refusal fails the test with its sentence. */
export async function ok<C extends ApiChannel>(address: string, channel: C, request: ApiRequest<C>): Promise<ApiResponse<C>> {
  const answer = await call(address, channel, request);
  if (answer.status !== 200) throw new Error(`${channel} answered ${answer.status}: ${answer.text}`);
  return answer.body as ApiResponse<C>;
}
