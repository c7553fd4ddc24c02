// The `bulkhead view` server on its own: what it serves, what it refuses (other paths, `..` and
// percent-encoded traversal, other hosts, other methods), and the server-sent event on each save.
import { request } from 'node:http';
import { mkdirSync, mkdtempSync, renameSync, rmdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { get, nextChange, until } from '../helpers/view-http.ts';
import {
  MAX_EVENT_CLIENTS,
  requestPath,
  startViewServer,
  type FileState,
  type ViewServer,
} from '../../packages/cli/src/view/server.ts';

describe('requestPath', () => {
  it.each([
    ['/', '/'],
    ['/model?t=1', '/model'],
    ['/assets/index-abc.js', '/assets/index-abc.js'],
  ])('should keep %s as %s', (raw, path) => expect(requestPath(raw)).toBe(path));

  it.each([
    '/../x',
    '/assets/../index.html',
    '/./model',
    '/%2e%2e/x',
    '/assets%2fx',
    '/a\\..\\b',
    '//etc/passwd',
    'model',
    '*',
  ])('should refuse %s', (raw) => expect(requestPath(raw)).toBeUndefined());
});

describe('startViewServer', () => {
  const dir = mkdtempSync(join(tmpdir(), 'bulkhead-view-'));
  const dist = join(dir, 'dist');
  const model = join(dir, 'plant.bulk');
  let server: ViewServer;

  beforeAll(async () => {
    mkdirSync(join(dist, 'assets'), { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>test page</title>');
    writeFileSync(join(dist, 'assets', 'app-1.js'), 'console.log(1)');
    writeFileSync(join(dist, 'assets', '.hidden'), 'secret');
    writeFileSync(join(dir, 'outside.txt'), 'outside the dist');
    writeFileSync(model, 'site "Test site"\n');
    server = await startViewServer({ file: model, distDir: dist, port: 0 });
  });

  afterAll(async () => {
    await server?.close();
  });

  it('should listen on 127.0.0.1 only', () => {
    expect(server.url).toBe(`http://127.0.0.1:${server.port}/`);
  });

  it('should serve the page, its assets and the model with its file name', async () => {
    expect((await get(server.port, '/')).body).toContain('test page');
    const js = await get(server.port, '/assets/app-1.js');
    expect(js.status).toBe(200);
    expect(js.headers['content-type']).toBe('text/javascript; charset=utf-8');
    const m = await get(server.port, '/model');
    expect(m.body).toBe('site "Test site"\n');
    expect(m.headers['x-bulkhead-file']).toBe('plant.bulk');
    expect(m.headers['content-security-policy']).toMatch(/default-src 'none'/);
  });

  it('should answer 404 to paths it does not serve and to traversal, encoded or not', async () => {
    for (const path of [
      '/plant.bulk',
      '/outside.txt',
      '/assets/.hidden',
      '/assets/../outside.txt',
      '/../outside.txt',
      '/%2e%2e/outside.txt',
      '/assets/%2e%2e%2foutside.txt',
      '/%2e%2e%5coutside.txt',
      '/index.html/..',
      '/model/',
    ]) {
      const r = await get(server.port, path);
      expect(r.status, path).toBe(404);
      expect(r.body).not.toContain('outside the dist');
    }
  });

  it('should refuse another Host header (DNS rebinding) and other methods', async () => {
    expect((await get(server.port, '/model', { host: 'evil.example' })).status).toBe(403);
    expect((await get(server.port, '/model', { method: 'POST' })).status).toBe(405);
    expect((await get(server.port, '/model', { method: 'HEAD' })).status).toBe(200);
    expect((await get(server.port, '/model', { host: `localhost:${server.port}` })).status).toBe(200);
  });

  it('should push a change event when the file is saved, and not for a save that changes nothing', async () => {
    const events = nextChange(server.port);
    await events.ready;
    const before = server.revision();
    writeFileSync(model, 'site "Test site"\n');
    await new Promise((r) => setTimeout(r, 700));
    expect(server.revision()).toBe(before);
    writeFileSync(model, 'site "Renamed site"\n');
    expect(JSON.parse(await events.change)).toEqual({ revision: before + 1, changed: ['model'] });
    expect((await get(server.port, '/model')).body).toBe('site "Renamed site"\n');
    events.close();
  });
});

/** Opens /events and resolves with the status and, for a 200, once the hello event arrived. */
function openEvents(port: number): Promise<{ status: number; close: () => void }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port, path: '/events' }, (res) => {
      if (res.statusCode !== 200) {
        res.resume();
        resolve({ status: res.statusCode ?? 0, close: () => req.destroy() });
        return;
      }
      res.on('data', (b: Buffer) => {
        if (b.toString().includes('event: hello')) resolve({ status: 200, close: () => req.destroy() });
      });
    });
    req.on('error', reject);
    req.end();
  });
}

describe('the view server through the life of the watched file (issue 10)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'bulkhead-life-'));
  const dist = join(dir, 'dist');
  const model = join(dir, 'plant.bulk');
  const seen: FileState[] = [];
  let server: ViewServer;

  beforeAll(async () => {
    mkdirSync(dist, { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>test page</title>');
    writeFileSync(model, 'site "Test site"\n');
    // The console line runs the loader on every save; make it throw to prove the server does not care.
    server = await startViewServer({
      file: model,
      distDir: dist,
      port: 0,
      onChange: (state) => {
        seen.push(state);
        throw new Error('a console line that fails');
      },
    });
  });

  afterAll(async () => {
    await server?.close();
    rmSync(dir, { recursive: true, force: true });
  });

  const modelNow = () => get(server.port, '/model');

  it('serves binary, empty and hostile text as its bytes, for the page to judge', async () => {
    for (const body of ['\u0000\u0001garbage\uffff', '', 'constructor X\n', '['.repeat(10_000)]) {
      const before = server.revision();
      writeFileSync(model, body);
      if (body !== '') await until(() => server.revision() > before);
      const r = await modelNow();
      expect(r.status).toBe(200);
      expect(r.body).toBe(body);
    }
  });

  it('says the file is missing (404 with the reason) when it is deleted or renamed, and serves it again when restored', async () => {
    rmSync(model);
    await until(async () => (await modelNow()).status === 404);
    const gone = await modelNow();
    expect(decodeURIComponent(String(gone.headers['x-bulkhead-missing']))).toContain('missing');
    expect(gone.headers['x-bulkhead-file']).toBe('plant.bulk');
    await until(() => seen.some((s) => 'missing' in s));
    writeFileSync(model, 'site "Back"\n');
    await until(async () => (await modelNow()).body === 'site "Back"\n');
    renameSync(model, `${model}.old`);
    await until(async () => (await modelNow()).status === 404);
    renameSync(`${model}.old`, model);
    await until(async () => (await modelNow()).status === 200);
  });

  it('says the path is a directory when the file is replaced by one, and recovers', async () => {
    rmSync(model);
    mkdirSync(model);
    await until(async () => (await modelNow()).status === 404);
    expect(decodeURIComponent(String((await modelNow()).headers['x-bulkhead-missing']))).toContain('directory');
    rmdirSync(model);
    writeFileSync(model, 'site "Restored"\n');
    await until(async () => (await modelNow()).body === 'site "Restored"\n');
  });

  it(`accepts ${MAX_EVENT_CLIENTS} live pages and refuses the next with 503, until one closes`, async () => {
    const open = [];
    for (let i = 0; i < MAX_EVENT_CLIENTS; i++) open.push(await openEvents(server.port));
    expect(open.every((c) => c.status === 200)).toBe(true);
    const refused = await openEvents(server.port);
    expect(refused.status).toBe(503);
    open.pop()!.close();
    await until(async () => {
      const again = await openEvents(server.port);
      again.close();
      return again.status === 200;
    });
    for (const c of open) c.close();
  });

  it('is still serving after all of it', async () => {
    expect((await get(server.port, '/')).body).toContain('test page');
  });
});
