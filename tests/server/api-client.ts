/** A small typed HTTP client for the browser-mode API, the way the renderer's bridge calls it. */
import type { ApiChannel, ApiError, ApiRequest, ApiResponse } from '../../app/api/contract.js';
import { fromWireJson, toWireJson } from '../../app/api/wire-json.js';
import { httpPathFor } from '../../main/server/operations.js';

export interface ApiAnswer<C extends ApiChannel> {
  readonly status: number;
  readonly body: ApiResponse<C> | ApiError;
  readonly text: string;
}

export async function call<C extends ApiChannel>(baseUrl: string, channel: C, request: ApiRequest<C> | unknown): Promise<ApiAnswer<C>> {
  const response = await fetch(new URL(httpPathFor(channel).slice(1), baseUrl), {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: toWireJson(request),
  });
  const text = await response.text();
  return { status: response.status, body: fromWireJson(text) as ApiResponse<C> | ApiError, text };
}

/** The response of a call that must succeed; a refusal fails the test with its sentence. */
export async function ok<C extends ApiChannel>(baseUrl: string, channel: C, request: ApiRequest<C>): Promise<ApiResponse<C>> {
  const answer = await call(baseUrl, channel, request);
  if (answer.status !== 200) throw new Error(`${channel} answered ${answer.status}: ${answer.text}`);
  return answer.body as ApiResponse<C>;
}
