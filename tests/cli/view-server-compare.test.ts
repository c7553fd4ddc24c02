// The `bulkhead view --compare OLD` server: the earlier revision at /earlier with its file name and its
// parts at /earlier-parts, "nothing" (204) there without --compare, and a change event that says which
// model a save changed.
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { get, nextChange } from '../helpers/view-http.ts';
import { startViewServer, type ViewServer } from '../../packages/cli/src/view/server.ts';

describe('the view server with an earlier revision to compare with', () => {
  const dir = mkdtempSync(join(tmpdir(), 'bulkhead-view-compare-'));
  const dist = join(dir, 'dist');
  const model = join(dir, 'rev-b.bulk');
  const earlier = join(dir, 'old', 'rev-a.bulk');
  let server: ViewServer;
  let plain: ViewServer;
  const changes: string[][] = [];

  beforeAll(async () => {
    mkdirSync(dist, { recursive: true });
    mkdirSync(join(dir, 'old', 'units'), { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>test page</title>');
    writeFileSync(model, 'site "Test site" revision="B"\n');
    writeFileSync(earlier, 'site "Test site" revision="A"\npart "units/plant.bulk"\n');
    writeFileSync(join(dir, 'old', 'units', 'plant.bulk'), 'vessel V-1\n');
    server = await startViewServer({
      file: model,
      compare: earlier,
      distDir: dist,
      port: 0,
      onChange: (_state, files, kind) => changes.push([kind, ...files]),
    });
    plain = await startViewServer({ file: model, distDir: dist, port: 0 });
  });

  afterAll(async () => {
    await server?.close();
    await plain?.close();
  });

  it('should serve the earlier revision with its file name, and its part files by the path the model names', async () => {
    const old = await get(server.port, '/earlier');
    expect(old.status).toBe(200);
    expect(old.body).toBe('site "Test site" revision="A"\npart "units/plant.bulk"\n');
    expect(old.headers['x-bulkhead-file']).toBe('rev-a.bulk');
    expect(JSON.parse((await get(server.port, '/earlier-parts')).body)).toEqual({
      parts: [{ path: 'units/plant.bulk', text: 'vessel V-1\n' }],
    });
    // The model itself is still the one shown.
    expect((await get(server.port, '/model')).body).toBe('site "Test site" revision="B"\n');
  });

  it('should answer 204 with no file name for /earlier without --compare', async () => {
    for (const path of ['/earlier', '/earlier-parts']) {
      const r = await get(plain.port, path);
      expect(r.status, path).toBe(204);
      expect(r.headers['x-bulkhead-file']).toBeUndefined();
    }
  });

  it('should push a change naming the earlier revision when one of its files is saved, part files too', async () => {
    const events = nextChange(server.port);
    await events.ready;
    const before = server.revision();
    writeFileSync(join(dir, 'old', 'units', 'plant.bulk'), 'vessel V-2\n');
    expect(JSON.parse(await events.change)).toEqual({ revision: before + 1, changed: ['earlier'] });
    events.close();
    expect(changes.at(-1)).toEqual(['earlier', join(dir, 'old', 'units/plant.bulk')]);
  });

  it('should say the earlier revision is missing (404 with the reason) when it is deleted', async () => {
    const events = nextChange(server.port);
    await events.ready;
    rmSync(earlier);
    expect(JSON.parse(await events.change)).toMatchObject({ changed: ['earlier'] });
    events.close();
    const gone = await get(server.port, '/earlier');
    expect(gone.status).toBe(404);
    expect(gone.headers['x-bulkhead-file']).toBe('rev-a.bulk');
    expect(decodeURIComponent(String(gone.headers['x-bulkhead-missing']))).toMatch(/missing/);
    expect(changes.at(-1)?.[0]).toBe('earlier');
  });
});
