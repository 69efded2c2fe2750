/**
 * Browser mode: Lamina's built renderer served on the loopback interface, with the same Content
 * Security Policy as the desktop window and one JSON endpoint per API channel (POST /api/<name>).
 *
 * Only 127.0.0.1 (or ::1) is ever bound, and requests must name that host, so a web page elsewhere
 * cannot reach the API by rebinding a DNS name to this machine. Every other process and user on the
 * machine can reach loopback too, so every API request must also carry this launch's key
 * (launch-key.ts): the address printed at start is `/?k=<key>`, which answers with a redirect to `/`
 * that stores the key in an HttpOnly, SameSite=Strict cookie, so the key leaves the address bar and
 * never reaches the page's scripts. Other clients send it in the X-Lamina-Key header.
 *
 * The page's files (the built renderer, the same for everyone who has the source) are served
 * without the key: they hold no data, and a browser that reached `/` through a link from another
 * site would not send a SameSite=Strict cookie with that first request anyway. Everything the page
 * reads or changes goes through /api/, and there the key is required.
 */
import http from 'node:http';
import { readFile, realpath, stat } from 'node:fs/promises';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import { mimeTypeFor } from './mime-types.js';
import { SECURITY_HEADERS } from './security-policy.js';
import { fromWireJson, toWireJson } from '../../app/api/wire-json.js';
import { API_CHANNELS, MAX_TEXT_REQUEST, createOperations, describeFailure, httpPathFor, type OperationHandlers } from './operations.js';
import { PROJECT_ROOT, readAppIdentity } from './app-identity.js';
import { LibraryHost } from './library-host.js';
import { LAUNCH_KEY_HEADER, LAUNCH_KEY_PARAMETER, LaunchKey, cookieValues, launchCookie, launchCookieName } from './launch-key.js';

export const DEFAULT_PORT = 5178;
const LOOPBACK_HOSTS = new Set(['127.0.0.1', '::1']);
/** Room for the largest CSV or project file an operation accepts, plus JSON escaping. */
const MAX_BODY_BYTES = 2 * MAX_TEXT_REQUEST;

const NO_KEY =
  'This request carries no valid key for this launch of Lamina: open the address Lamina printed when it started (it ends in ?k=…), or send that key in the X-Lamina-Key header.';
const WRONG_ADDRESS = 'This address is from an earlier launch of Lamina or is wrong: open the address Lamina printed when it last started.';

export interface BrowserServerOptions {
  /** TCP port; 0 picks a free one. Default 5178. */
  readonly port?: number;
  /** Loopback address to bind: '127.0.0.1' (default) or '::1'. */
  readonly host?: string;
  /** Folder with the built renderer. Default build/renderer in the project root. */
  readonly root?: string;
  /**
   * The library database file, opened once at start (the caller resolves --db, LAMINA_DB and the
   * default path: main/storage/database-path.ts). A damaged file does not stop the server: the
   * page reports it and offers to restore a backup.
   */
  readonly databasePath: string;
  /** Folder of the built-in materials CSV files (default data/materials). */
  readonly seedFolder?: string;
  /** Run the daily backup while serving (default true). */
  readonly dailyBackups?: boolean;
  /** Add the demo project to a library this start creates (default false; `npm start` asks for it). */
  readonly demoProjectOnCreate?: boolean;
}

export interface BrowserServer {
  /** The address to open, with this launch's key: e.g. http://127.0.0.1:5178/?k=<key>. */
  readonly url: string;
  /** The server's origin without the key, e.g. http://127.0.0.1:5178. */
  readonly origin: string;
  /** This launch's key, for clients that send it in the X-Lamina-Key header. */
  readonly key: string;
  readonly host: string;
  readonly port: number;
  readonly library: LibraryHost;
  /** Stops serving and closes the library database. */
  close(): Promise<void>;
}

export async function startBrowserServer(options: BrowserServerOptions): Promise<BrowserServer> {
  const host = options.host ?? '127.0.0.1';
  if (!LOOPBACK_HOSTS.has(host)) {
    throw new Error(`The host must be a loopback address (127.0.0.1 or ::1), not "${host}"; Lamina never listens on a network.`);
  }
  const port = options.port ?? DEFAULT_PORT;
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`The port must be a whole number from 0 to 65535 (0 picks a free port), not "${port}".`);
  }
  const root = await realpath(path.resolve(options.root ?? path.join(PROJECT_ROOT, 'build', 'renderer')));
  const library = await LibraryHost.open(options.databasePath, {
    ...(options.seedFolder ? { seedFolder: options.seedFolder } : {}),
    ...(options.dailyBackups === undefined ? {} : { dailyBackups: options.dailyBackups }),
    ...(options.demoProjectOnCreate ? { demoProjectOnCreate: true } : {}),
  });
  const operations = createOperations({ ...readAppIdentity(), library });
  const routes = new Map(API_CHANNELS.map((channel) => [httpPathFor(channel), channel] as const));
  const launchKey = new LaunchKey();

  const server = http.createServer((request, response) => {
    handle(request, response).catch((error: unknown) => {
      console.error('Lamina browser server:', error);
      if (!response.headersSent) sendText(response, 500, 'The server failed while answering this request.');
      else response.destroy();
    });
  });

  async function handle(request: http.IncomingMessage, response: http.ServerResponse): Promise<void> {
    const boundPort = (server.address() as AddressInfo).port;
    if (!isOwnHost(request.headers.host, boundPort)) {
      sendText(response, 403, 'This server answers only to 127.0.0.1, localhost or [::1] on its own port.');
      return;
    }
    const { pathname, searchParams } = new URL(request.url ?? '/', 'http://127.0.0.1');
    if (pathname.startsWith('/api/')) {
      if (!presentsKey(request, launchKey, boundPort)) {
        sendJson(response, 401, { error: NO_KEY });
        return;
      }
      const channel = routes.get(pathname);
      if (channel) return handleApi(channel, request, response, boundPort, operations);
      sendJson(response, 404, { error: `There is no operation at ${pathname}.` });
      return;
    }
    if (pathname === '/' && searchParams.has(LAUNCH_KEY_PARAMETER)) {
      return tradeKeyForCookie(searchParams.get(LAUNCH_KEY_PARAMETER) ?? '', launchKey, boundPort, request, response);
    }
    return serveFile(root, request, response);
  }

  try {
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, host, () => {
        server.off('error', reject);
        resolve();
      });
    });
  } catch (error) {
    await library.close();
    throw error;
  }

  const address = server.address() as AddressInfo;
  const urlHost = address.family === 'IPv6' ? `[${address.address}]` : address.address;
  const origin = `http://${urlHost}:${address.port}`;
  return {
    url: `${origin}/?${LAUNCH_KEY_PARAMETER}=${launchKey.value}`,
    origin,
    key: launchKey.value,
    host: address.address,
    port: address.port,
    library,
    close: async () => {
      await new Promise<void>((resolve, reject) => {
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      });
      await library.close();
    },
  };
}

/** Whether a request carries this launch's key, in the X-Lamina-Key header or in the page's cookie. */
function presentsKey(request: http.IncomingMessage, key: LaunchKey, port: number): boolean {
  const header = request.headers[LAUNCH_KEY_HEADER];
  if (typeof header === 'string' && key.matches(header)) return true;
  return cookieValues(request.headers.cookie, launchCookieName(port)).some((value) => key.matches(value));
}

/**
 * The printed address, `/?k=<key>`: a right key becomes the page's cookie and the browser is sent
 * on to `/`, so the key stays out of the address bar and out of reach of the page's scripts.
 */
function tradeKeyForCookie(presented: string, key: LaunchKey, port: number, request: http.IncomingMessage, response: http.ServerResponse): void {
  if (request.method !== 'GET' && request.method !== 'HEAD') {
    response.setHeader('Allow', 'GET, HEAD');
    sendText(response, 405, 'Only GET and HEAD are served here.');
    return;
  }
  if (!key.matches(presented)) {
    sendText(response, 401, WRONG_ADDRESS);
    return;
  }
  response.writeHead(303, { ...SECURITY_HEADERS, Location: '/', 'Set-Cookie': launchCookie(port, key), 'Content-Length': 0 });
  response.end();
}

function isOwnHost(hostHeader: string | undefined, port: number): boolean {
  if (!hostHeader) return false;
  return [`127.0.0.1:${port}`, `localhost:${port}`, `[::1]:${port}`].includes(hostHeader.toLowerCase());
}

async function handleApi(
  channel: keyof OperationHandlers,
  request: http.IncomingMessage,
  response: http.ServerResponse,
  port: number,
  operations: OperationHandlers,
): Promise<void> {
  if (request.method !== 'POST') {
    response.setHeader('Allow', 'POST');
    sendJson(response, 405, { error: `${httpPathFor(channel)} accepts POST only.` });
    return;
  }
  // A page on another origin may still send a request; refuse it unless it comes from this origin.
  const origin = request.headers.origin;
  if (origin !== undefined && !isOwnHost(origin.replace(/^http:\/\//, ''), port)) {
    sendJson(response, 403, { error: 'Requests from other origins are refused.' });
    return;
  }
  const body = await readBody(request);
  if (body === undefined) {
    sendJson(response, 413, { error: `The request body must be at most ${MAX_BODY_BYTES} bytes.` });
    return;
  }
  let input: unknown = undefined;
  if (body.length > 0) {
    if (!/^application\/json\b/i.test(request.headers['content-type'] ?? '')) {
      sendJson(response, 415, { error: 'The request body must be sent as application/json.' });
      return;
    }
    try {
      input = fromWireJson(body);
    } catch {
      sendJson(response, 400, { error: 'The request body is not valid JSON.' });
      return;
    }
  }
  try {
    sendJson(response, 200, await operations[channel](input));
  } catch (error) {
    const failure = describeFailure(error);
    if (!failure) throw error;
    sendJson(response, failure.status, failure.body);
  }
}

async function readBody(request: http.IncomingMessage): Promise<string | undefined> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of request as AsyncIterable<Buffer>) {
    size += chunk.length;
    if (size > MAX_BODY_BYTES) return undefined;
    chunks.push(chunk);
  }
  return Buffer.concat(chunks).toString('utf8');
}

async function serveFile(root: string, request: http.IncomingMessage, response: http.ServerResponse): Promise<void> {
  if (request.method !== 'GET' && request.method !== 'HEAD') {
    response.setHeader('Allow', 'GET, HEAD');
    sendText(response, 405, 'Only GET and HEAD are served here.');
    return;
  }
  const file = await resolveInside(root, request.url ?? '/');
  const type = file ? mimeTypeFor(path.extname(file)) : undefined;
  if (!file || !type) {
    sendText(response, 404, 'Not found.');
    return;
  }
  // Read whole (the built files are small), so a rebuild that replaces a file while it is served
  // gives a 404 or the complete file, never a length that does not match the bytes or a stream error.
  let content: Buffer;
  try {
    content = await readFile(file);
  } catch {
    sendText(response, 404, 'Not found.');
    return;
  }
  response.writeHead(200, { ...SECURITY_HEADERS, 'Content-Type': type, 'Content-Length': content.length });
  response.end(request.method === 'HEAD' ? undefined : content);
}

/** The file a URL names inside root, or undefined when it does not exist or would lie outside root. */
async function resolveInside(root: string, rawUrl: string): Promise<string | undefined> {
  let pathname: string;
  try {
    // Decode the raw path ourselves: encoded dots and slashes must not slip past the check below.
    pathname = decodeURIComponent(rawUrl.split(/[?#]/, 1)[0] ?? '/');
  } catch {
    return undefined;
  }
  if (pathname.includes('\0') || !pathname.startsWith('/')) return undefined;
  if (pathname.endsWith('/')) pathname += 'index.html';
  const candidate = path.resolve(root, `.${pathname}`);
  if (!isInside(root, candidate)) return undefined;
  try {
    // Follow links, then check again: a symbolic link must not lead out of the build folder.
    const real = await realpath(candidate);
    if (!isInside(root, real) || !(await stat(real)).isFile()) return undefined;
    return real;
  } catch {
    return undefined;
  }
}

function isInside(root: string, candidate: string): boolean {
  return candidate.startsWith(root + path.sep);
}

function sendJson(response: http.ServerResponse, status: number, value: unknown): void {
  const body = toWireJson(value);
  response.writeHead(status, {
    ...SECURITY_HEADERS,
    'Content-Type': 'application/json; charset=utf-8',
    'Content-Length': Buffer.byteLength(body),
  });
  response.end(body);
}

function sendText(response: http.ServerResponse, status: number, text: string): void {
  response.writeHead(status, {
    ...SECURITY_HEADERS,
    'Content-Type': 'text/plain; charset=utf-8',
    'Content-Length': Buffer.byteLength(text),
  });
  response.end(text);
}
