// The `bulkhead view` server (node:http, no framework): serves the built viewer, the one model file
// at /model, and server-sent events at /events on every save. Binds 127.0.0.1; anything else is 404.
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { readFileSync, unwatchFile, watch, watchFile, type FSWatcher } from 'node:fs';
import { basename, dirname } from 'node:path';
import type { AddressInfo } from 'node:net';
import { readAssets, type Asset } from './assets.ts';

export const HOST = '127.0.0.1';
export const MODEL_FILE_HEADER = 'X-Bulkhead-File';

export interface ViewServerOptions {
  file: string;
  distDir: string;
  /** 0 asks the system for a free port. */
  port: number;
  /** Called after each save is seen, with the new text (for a console line). */
  onChange?: (text: string | undefined) => void;
}

export interface ViewServer {
  url: string;
  port: number;
  /** Number of saves pushed to pages so far. */
  revision(): number;
  close(): Promise<void>;
}

// The page runs only our own scripts; model text is never markup, and this makes sure of it twice.
const SECURITY_HEADERS: Record<string, string> = {
  'Content-Security-Policy':
    "default-src 'none'; script-src 'self'; worker-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; connect-src 'self'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'",
  'X-Content-Type-Options': 'nosniff',
  'Referrer-Policy': 'no-referrer',
  'Cross-Origin-Opener-Policy': 'same-origin',
  'Cross-Origin-Resource-Policy': 'same-origin',
};

const WATCH_DEBOUNCE_MS = 60;
const POLL_MS = 250;
const KEEPALIVE_MS = 20_000;

function send(res: ServerResponse, status: number, type: string, body: Buffer | string, extra: Record<string, string> = {}, head = false): void {
  res.writeHead(status, { ...SECURITY_HEADERS, 'Content-Type': type, 'Content-Length': String(Buffer.byteLength(body)), ...extra });
  res.end(head ? undefined : body);
}

function notFound(res: ServerResponse): void {
  send(res, 404, 'text/plain; charset=utf-8', 'not found\n', { 'Cache-Control': 'no-store' });
}

/**
 * The path of a request, or undefined when it must be refused: no percent-encoding, backslash, dot
 * segment or empty segment is ever matched, whatever it decodes to.
 */
export function requestPath(rawUrl: string | undefined): string | undefined {
  if (rawUrl === undefined || !rawUrl.startsWith('/')) return undefined;
  const path = rawUrl.split('?')[0]!;
  if (path.includes('%') || path.includes('\\') || path.includes('//')) return undefined;
  if (path.split('/').some((part) => part === '.' || part === '..')) return undefined;
  return path;
}

export function startViewServer(options: ViewServerOptions): Promise<ViewServer> {
  const assets: Map<string, Asset> = readAssets(options.distDir);
  const clients = new Set<ServerResponse>();
  const fileName = basename(options.file);
  let revision = 0;
  let lastText: string | undefined = readText(options.file);
  let port = 0;

  function readText(file: string): string | undefined {
    try {
      return readFileSync(file, 'utf8');
    } catch {
      return undefined;
    }
  }

  function allowedHost(req: IncomingMessage): boolean {
    const host = req.headers.host;
    return host === `${HOST}:${port}` || host === `localhost:${port}`;
  }

  function handle(req: IncomingMessage, res: ServerResponse): void {
    const path = requestPath(req.url);
    const head = req.method === 'HEAD';
    if (path === undefined) return notFound(res);
    // DNS rebinding: another site's page must not read the model through a name that points here.
    if (!allowedHost(req)) return send(res, 403, 'text/plain; charset=utf-8', 'wrong host\n');
    if (req.method !== 'GET' && !head) {
      return send(res, 405, 'text/plain; charset=utf-8', 'only GET\n', { Allow: 'GET, HEAD' });
    }
    if (path === '/model') {
      let body: Buffer;
      try {
        body = readFileSync(options.file);
      } catch {
        return send(res, 503, 'text/plain; charset=utf-8', `cannot read ${fileName} just now\n`, { 'Cache-Control': 'no-store' });
      }
      return send(res, 200, 'text/plain; charset=utf-8', body, { 'Cache-Control': 'no-store', [MODEL_FILE_HEADER]: encodeURIComponent(fileName) }, head);
    }
    if (path === '/events') {
      res.writeHead(200, { ...SECURITY_HEADERS, 'Content-Type': 'text/event-stream; charset=utf-8', 'Cache-Control': 'no-store', Connection: 'keep-alive' });
      res.write(`retry: 1000\nevent: hello\ndata: ${JSON.stringify({ revision })}\n\n`);
      clients.add(res);
      req.on('close', () => clients.delete(res));
      return;
    }
    const asset = assets.get(path);
    if (!asset) return notFound(res);
    return send(res, 200, asset.type, asset.body, { 'Cache-Control': asset.immutable ? 'public, max-age=31536000, immutable' : 'no-store' }, head);
  }

  function push(): void {
    revision++;
    const message = `event: change\ndata: ${JSON.stringify({ revision })}\n\n`;
    for (const c of clients) c.write(message);
  }

  let timer: NodeJS.Timeout | undefined;
  function changed(): void {
    clearTimeout(timer);
    timer = setTimeout(() => {
      const text = readText(options.file);
      // An editor's save may briefly leave no file or an empty one; wait for the next event.
      if (text === undefined || text === lastText) return;
      lastText = text;
      push();
      options.onChange?.(text);
    }, WATCH_DEBOUNCE_MS);
  }

  // Watch the directory (editors often save by renaming a new file over the old) and poll as well,
  // because fs.watch misses events on some file systems.
  let watcher: FSWatcher | undefined;
  try {
    watcher = watch(dirname(options.file), (_event, name) => {
      if (name === null || name === fileName) changed();
    });
  } catch {
    watcher = undefined;
  }
  watchFile(options.file, { interval: POLL_MS }, changed);
  const keepalive = setInterval(() => {
    for (const c of clients) c.write(': keep-alive\n\n');
  }, KEEPALIVE_MS);

  const server = createServer(handle);
  return new Promise((resolve, reject) => {
    const stop = () => {
      watcher?.close();
      unwatchFile(options.file, changed);
      clearInterval(keepalive);
      clearTimeout(timer);
    };
    server.once('error', (e) => {
      stop();
      reject(e);
    });
    server.listen(options.port, HOST, () => {
      port = (server.address() as AddressInfo).port;
      resolve({
        url: `http://${HOST}:${port}/`,
        port,
        revision: () => revision,
        close: () =>
          new Promise<void>((done) => {
            stop();
            for (const c of clients) c.end();
            clients.clear();
            server.close(() => done());
            server.closeAllConnections();
          }),
      });
    });
  });
}
