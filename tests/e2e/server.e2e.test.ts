// `bulkhead view` serves only its own assets and the one model: other paths, `..` traversal and
// percent-encoded traversal get 404, with plain HTTP requests (fetch, and raw paths fetch would tidy).
import { request } from 'node:http';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO, startView, type ViewProcess } from './harness.ts';

/** A GET with the path sent exactly as written (fetch would resolve `..` before sending). */
function rawGet(
  port: number,
  path: string,
  headers: Record<string, string> = {},
): Promise<{ status: number; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port, path, method: 'GET', headers }, (res) => {
      let body = '';
      res.on('data', (b: Buffer) => (body += b.toString()));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
    req.end();
  });
}

describe('what bulkhead view serves', () => {
  let view: ViewProcess;

  beforeAll(async () => {
    view = await startView(DEMO);
  });

  afterAll(() => view?.stop());

  it('prints a 127.0.0.1 URL', () => {
    expect(view.output()).toMatch(/open http:\/\/127\.0\.0\.1:\d+\//);
  });

  it('serves the page, its assets and the model', async () => {
    const page = await fetch(view.url);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain('<title>Bulkhead viewer</title>');
    const script = /src="\.?(\/assets\/[^"]+\.js)"/.exec(html)?.[1];
    expect(script).toBeDefined();
    expect((await fetch(new URL(script!, view.url))).status).toBe(200);
    const model = await fetch(new URL('/model', view.url));
    expect(model.status).toBe(200);
    expect(model.headers.get('x-bulkhead-file')).toBe('marrow-fen.bulk');
    expect(await model.text()).toBe(readFileSync(DEMO, 'utf8'));
    expect(page.headers.get('content-security-policy')).toContain("script-src 'self'");
  });

  it('keeps ELK out of the main script: it is loaded by the layout worker only', async () => {
    const html = await (await fetch(view.url)).text();
    const main = await (await fetch(new URL(/src="\.?(\/assets\/[^"]+\.js)"/.exec(html)![1]!, view.url))).text();
    expect(main).not.toContain('org.eclipse.elk');
    expect(main.length).toBeLessThan(600_000);
    const worker = /layout\.worker-[A-Za-z0-9_-]+\.js/.exec(main)?.[0];
    expect(worker).toBeDefined();
    expect(await (await fetch(new URL(`/assets/${worker}`, view.url))).text()).toContain('org.eclipse.elk');
  });

  it('answers 404 to any other path', async () => {
    for (const path of [
      '/package.json',
      '/fixtures/demo/marrow-fen.bulk',
      '/assets/',
      '/assets/nothing.js',
      '/model/x',
      '/etc/passwd',
      '/.git/config',
    ]) {
      expect((await fetch(new URL(path, view.url))).status, path).toBe(404);
    }
  });

  it('answers 404 to .. traversal sent as written', async () => {
    for (const path of [
      '/../package.json',
      '/assets/../../package.json',
      '/assets/../index.html',
      '/./model',
      '/assets/..\\..\\package.json',
      '//etc/passwd',
    ]) {
      const r = await rawGet(view.port, path);
      expect(r.status, path).toBe(404);
      expect(r.body).not.toContain('"workspaces"');
    }
  });

  it('answers 404 to percent-encoded traversal', async () => {
    for (const path of [
      '/%2e%2e/package.json',
      '/assets/%2e%2e/%2e%2e/package.json',
      '/assets%2f..%2f..%2fpackage.json',
      '/%2E%2E%2Fpackage.json',
      '/assets/%252e%252e/package.json',
      '/%6dodel',
    ]) {
      expect((await fetch(new URL(path, view.url))).status, path).toBe(404);
      expect((await rawGet(view.port, path)).status, path).toBe(404);
    }
  });

  it('refuses a request that names another host (DNS rebinding)', async () => {
    const r = await rawGet(view.port, '/model', { Host: 'attacker.example:80' });
    expect(r.status).toBe(403);
    expect(r.body).not.toContain('site ');
  });

  it('is not reachable on another address than 127.0.0.1', async () => {
    const r = await fetch(`http://[::1]:${view.port}/`).then(
      (x) => x.status,
      () => 'refused',
    );
    expect(r).toBe('refused');
  });
});
