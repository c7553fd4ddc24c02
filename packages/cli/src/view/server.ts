// The `bulkhead view` server (node:http, no framework): serves the built viewer, the model file at
// /model, the part files it names at /parts, an earlier revision to compare with (`--compare OLD`) at
// /earlier and its parts at /earlier-parts, and server-sent events at /events on every save of any of
// them. Binds 127.0.0.1; anything else is 404.
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { unwatchFile, watch, watchFile, type FSWatcher } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import type { AddressInfo } from 'node:net';
import { readAssets, type Asset } from './assets.ts';
import {
  partOnDisk,
  partsBody,
  readSiteFiles,
  readState,
  sameSite,
  sameState,
  type FileState,
  type SiteFiles,
} from './site-files.ts';

export { readState, type FileState } from './site-files.ts';

export const HOST = '127.0.0.1';
export const MODEL_FILE_HEADER = 'X-Bulkhead-File';
/** Set on the 404 for /model when the file cannot be served: why, in words for the page. */
export const MISSING_HEADER = 'X-Bulkhead-Missing';
/** A local page needs one live connection per tab; more than this is a leak or a misbehaving client. */
export const MAX_EVENT_CLIENTS = 16;

/** Which of the served models a save changed: the one shown, or the earlier revision it is compared with. */
export type ServedKind = 'model' | 'earlier';

export interface ViewServerOptions {
  file: string;
  /** An earlier revision of the model to compare with, served and watched like the model itself. */
  compare?: string;
  distDir: string;
  /** 0 asks the system for a free port. */
  port: number;
  /**
   * Called after each save is seen, with the model file's new text or why there is none, and the files
   * that changed (the model file as given, part files joined to its folder), for a console line.
   */
  onChange?: (file: FileState, changed: string[], kind: ServedKind) => void;
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
const MISSING_GRACE_MS = 300;
const POLL_MS = 250;
const KEEPALIVE_MS = 20_000;

function send(
  res: ServerResponse,
  status: number,
  type: string,
  body: Buffer | string,
  extra: Record<string, string> = {},
  head = false,
): void {
  res.writeHead(status, {
    ...SECURITY_HEADERS,
    'Content-Type': type,
    'Content-Length': String(Buffer.byteLength(body)),
    ...extra,
  });
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
  let revision = 0;
  /** Each served model, with its files as last pushed to pages. */
  const served = new Map<ServedKind, { file: string; last: SiteFiles }>([
    ['model', { file: options.file, last: readSiteFiles(options.file) }],
  ]);
  if (options.compare !== undefined)
    served.set('earlier', { file: options.compare, last: readSiteFiles(options.compare) });
  let port = 0;

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
    // Without --compare there is no earlier revision: "nothing" (204), which the page asks for and a
    // browser does not log as a failed load the way it does a 404.
    if ((path === '/earlier' || path === '/earlier-parts') && !served.has('earlier'))
      return send(res, 204, 'text/plain; charset=utf-8', '', { 'Cache-Control': 'no-store' }, head);
    const model = path === '/model' ? served.get('model') : path === '/earlier' ? served.get('earlier') : undefined;
    if (model) {
      const named = { 'Cache-Control': 'no-store', [MODEL_FILE_HEADER]: encodeURIComponent(basename(model.file)) };
      const state = readState(model.file);
      // The bytes go as they are (latin1 keeps every byte), so the page's loader judges them, not us.
      if ('text' in state)
        return send(res, 200, 'application/octet-stream', Buffer.from(state.text, 'latin1'), named, head);
      return send(
        res,
        404,
        'text/plain; charset=utf-8',
        `${state.missing}\n`,
        { ...named, [MISSING_HEADER]: encodeURIComponent(state.missing) },
        head,
      );
    }
    const partsOf =
      path === '/parts' ? served.get('model') : path === '/earlier-parts' ? served.get('earlier') : undefined;
    if (partsOf) {
      // Read afresh like /model; the page loads the model with exactly these files.
      return send(
        res,
        200,
        'application/json; charset=utf-8',
        partsBody(readSiteFiles(partsOf.file).parts),
        { 'Cache-Control': 'no-store' },
        head,
      );
    }
    if (path === '/events') {
      if (clients.size >= MAX_EVENT_CLIENTS) {
        return send(
          res,
          503,
          'text/plain; charset=utf-8',
          `too many live pages (${MAX_EVENT_CLIENTS}); close other viewer tabs\n`,
          { 'Cache-Control': 'no-store', 'Retry-After': '5' },
        );
      }
      res.writeHead(200, {
        ...SECURITY_HEADERS,
        'Content-Type': 'text/event-stream; charset=utf-8',
        'Cache-Control': 'no-store',
        Connection: 'keep-alive',
      });
      res.write(`retry: 1000\nevent: hello\ndata: ${JSON.stringify({ revision })}\n\n`);
      clients.add(res);
      req.on('close', () => clients.delete(res));
      return;
    }
    const asset = assets.get(path);
    if (!asset) return notFound(res);
    return send(
      res,
      200,
      asset.type,
      asset.body,
      { 'Cache-Control': asset.immutable ? 'public, max-age=31536000, immutable' : 'no-store' },
      head,
    );
  }

  function push(changed: ServedKind[]): void {
    revision++;
    const message = `event: change\ndata: ${JSON.stringify({ revision, changed })}\n\n`;
    for (const c of clients) c.write(message);
  }

  // An editor's save may briefly leave no file: a state is pushed only once it has held for a moment,
  // and a missing file is pushed too (after a longer wait), so the page can say so and recover.
  let timer: NodeJS.Timeout | undefined;
  function changed(): void {
    clearTimeout(timer);
    timer = setTimeout(() => settle(false), WATCH_DEBOUNCE_MS);
  }
  function settle(confirmed: boolean): void {
    const now = [...served].map(([kind, { file, last }]) => ({ kind, file, last, site: readSiteFiles(file) }));
    const moved = now.filter(({ site, last }) => !sameSite(site, last));
    if (moved.length === 0) return;
    if (
      !confirmed &&
      moved.some(({ site }) => [site.main, ...site.parts.values()].some((state) => 'missing' in state))
    ) {
      timer = setTimeout(() => settle(true), MISSING_GRACE_MS);
      return;
    }
    for (const { kind, file, site } of moved) served.set(kind, { file, last: site });
    follow();
    push(moved.map(({ kind }) => kind));
    for (const { kind, file, last, site } of moved) {
      try {
        options.onChange?.(site.main, changedBetween(file, last, site), kind);
      } catch {
        // A console line is not worth the server: the page still gets the change.
      }
    }
  }

  function changedBetween(file: string, before: SiteFiles, after: SiteFiles): string[] {
    const changedFiles = sameState(before.main, after.main) ? [] : [file];
    for (const part of new Set([...before.parts.keys(), ...after.parts.keys()])) {
      const was = before.parts.get(part);
      const now = after.parts.get(part);
      if (!was || !now || !sameState(was, now)) changedFiles.push(join(dirname(file), part));
    }
    return changedFiles;
  }

  // Watch each file's directory (editors often save by renaming a new file over the old) and poll each
  // file as well, because fs.watch misses events on some file systems. The set follows the models' parts.
  const polled = new Set<string>();
  const watchers = new Map<string, FSWatcher>();
  function follow(): void {
    const wanted = new Set(
      [...served.values()].flatMap(({ file, last }) => [
        resolve(file),
        ...[...last.parts.keys()].map((part) => partOnDisk(file, part)),
      ]),
    );
    for (const file of polled) {
      if (wanted.has(file)) continue;
      unwatchFile(file, changed);
      polled.delete(file);
    }
    for (const file of wanted) {
      if (polled.has(file)) continue;
      watchFile(file, { interval: POLL_MS }, changed);
      polled.add(file);
    }
    const folders = new Set([...wanted].map((file) => dirname(file)));
    for (const [folder, watcher] of watchers) {
      if (folders.has(folder)) continue;
      watcher.close();
      watchers.delete(folder);
    }
    for (const folder of folders) {
      if (!watchers.has(folder)) watchFolder(folder);
    }
  }
  function watchFolder(folder: string): void {
    try {
      const watcher = watch(folder, (_event, name) => {
        if (name === null || polled.has(join(folder, name))) changed();
      });
      // A folder removed while watched: polling still sees its files come back.
      watcher.on('error', () => {
        watcher.close();
        watchers.delete(folder);
      });
      watchers.set(folder, watcher);
    } catch {
      // A folder that cannot be watched (missing, no permission) is left to polling.
    }
  }
  follow();
  const keepalive = setInterval(() => {
    for (const c of clients) c.write(': keep-alive\n\n');
  }, KEEPALIVE_MS);

  // Nothing a request or a file does may stop the server: an unexpected error answers 500 and is shown once.
  const server = createServer((req, res) => {
    try {
      handle(req, res);
    } catch (e) {
      if (!res.headersSent) send(res, 500, 'text/plain; charset=utf-8', 'internal error\n');
      else res.end();
      process.stderr.write(`bulkhead view: internal error answering ${req.url ?? ''}: ${(e as Error).message}\n`);
    }
  });
  server.on('clientError', (_e, socket) => socket.destroy());
  return new Promise((resolve, reject) => {
    const stop = () => {
      for (const watcher of watchers.values()) watcher.close();
      for (const file of polled) unwatchFile(file, changed);
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
