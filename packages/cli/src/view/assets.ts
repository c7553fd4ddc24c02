// The viewer's built files, read once at start-up into a table keyed by URL path. Requests are
// answered only from this table, so no request path is ever joined onto a directory on disk.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';

export interface Asset {
  body: Buffer;
  type: string;
  /** Hashed file names under assets/ never change, so they may be cached. */
  immutable: boolean;
}

const TYPES: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.json': 'application/json; charset=utf-8',
  '.map': 'application/json; charset=utf-8',
  '.woff2': 'font/woff2',
  '.txt': 'text/plain; charset=utf-8',
};

/** URL paths are plain: letters, digits and `-_.` in `/`-separated parts, no part starting with a dot. */
const SAFE_PATH = /^(\/[A-Za-z0-9_-][A-Za-z0-9_.-]*)+$/;

function typeOf(name: string): string {
  const dot = name.lastIndexOf('.');
  const extension = dot === -1 ? '' : name.slice(dot).toLowerCase();
  return (Object.hasOwn(TYPES, extension) ? TYPES[extension] : undefined) ?? 'application/octet-stream';
}

function walk(dir: string, out: string[]): void {
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const full = join(dir, entry.name);
    if (entry.isDirectory()) walk(full, out);
    else if (entry.isFile()) out.push(full);
  }
}

export function hasBuiltViewer(distDir: string): boolean {
  try {
    return statSync(join(distDir, 'index.html')).isFile();
  } catch {
    return false;
  }
}

export function readAssets(distDir: string): Map<string, Asset> {
  const files: string[] = [];
  walk(distDir, files);
  const table = new Map<string, Asset>();
  for (const file of files) {
    const path = '/' + relative(distDir, file).split(sep).join('/');
    if (!SAFE_PATH.test(path)) continue;
    table.set(path, { body: readFileSync(file), type: typeOf(file), immutable: path.startsWith('/assets/') });
  }
  const index = table.get('/index.html');
  if (index) table.set('/', { ...index, immutable: false });
  return table;
}
