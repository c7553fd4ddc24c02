// The `bulkhead view` server on a model split over part files: /parts sends exactly the files the
// model's own load asks for (nested parts too, keyed as the load names them), a file the model does not
// name is never sent, and a save of a part pushes a change just as a save of the model file does.
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadModelText, partFilesOf, type PartBytes } from '@bulkhead/core';
import { startViewServer, type ViewServer } from '../../packages/cli/src/view/server.ts';
import { get, nextChange, until } from '../helpers/view-http.ts';

interface SentParts {
  parts: ({ path: string; text: string } | { path: string; missing: string })[];
}

const MAIN = 'site "Split site"\npart "units/plant.bulk"\npart "units/missing.bulk"\n';
const PLANT = 'part "../../shared/supports.bulk"\nups UPS-1 title="UPS"\n';
const SUPPORTS = 'air-header IA-1 title="Instrument air"\n';

describe('partFilesOf', () => {
  it('names the same files, by the same paths, that a load of the model asks its reader for', () => {
    const files: Record<string, string> = { 'units/plant.bulk': PLANT, '../shared/supports.bulk': SUPPORTS };
    const reader = (path: string): PartBytes =>
      path in files ? new TextEncoder().encode(files[path]) : { problem: 'no such file' };
    const asked: string[] = [];
    loadModelText('main.bulk', MAIN, {
      readPart: (path) => {
        asked.push(path);
        return reader(path);
      },
    });
    const found = partFilesOf('main.bulk', new TextEncoder().encode(MAIN), reader);
    expect([...found.keys()]).toEqual(asked);
    expect(asked).toEqual(['units/plant.bulk', '../shared/supports.bulk', 'units/missing.bulk']);
    expect(found.get('units/missing.bulk')).toEqual({ problem: 'no such file' });
  });

  it('reads nothing for a model in one file, nor for text that is not UTF-8', () => {
    const never = (): PartBytes => {
      throw new Error('read');
    };
    expect(partFilesOf('one.bulk', new TextEncoder().encode('site "One"\nups UPS-1\n'), never).size).toBe(0);
    expect(partFilesOf('bad.bulk', Uint8Array.from([0x70, 0x61, 0x72, 0x74, 0x20, 0xff, 0x0a]), never).size).toBe(0);
  });
});

describe('the view server on a model split over part files', () => {
  const dir = mkdtempSync(join(tmpdir(), 'bulkhead-view-parts-'));
  const dist = join(dir, 'dist');
  const model = join(dir, 'site', 'main.bulk');
  const plant = join(dir, 'site', 'units', 'plant.bulk');
  const supports = join(dir, 'shared', 'supports.bulk');
  const changes: string[][] = [];
  let server: ViewServer;

  beforeAll(async () => {
    mkdirSync(dist, { recursive: true });
    mkdirSync(join(dir, 'site', 'units'), { recursive: true });
    mkdirSync(join(dir, 'shared'), { recursive: true });
    writeFileSync(join(dist, 'index.html'), '<!doctype html><title>test page</title>');
    writeFileSync(model, MAIN);
    writeFileSync(plant, PLANT);
    writeFileSync(join(dir, 'site', 'units', 'unnamed.bulk'), 'ups UPS-9\n');
    // Outside the model's folder, named through `..` from the part: the model names it, so it is sent.
    writeFileSync(supports, SUPPORTS);
    server = await startViewServer({
      file: model,
      distDir: dist,
      port: 0,
      onChange: (_state, changed) => changes.push(changed),
    });
  });

  afterAll(async () => {
    await server?.close();
  });

  it('sends every part the model names, nested ones too, keyed as the load names them, and why a part is missing', async () => {
    const answer = await get(server.port, '/parts');
    expect(answer.status).toBe(200);
    expect(answer.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(answer.headers['cache-control']).toBe('no-store');
    expect((JSON.parse(answer.body) as SentParts).parts).toEqual([
      { path: 'units/plant.bulk', text: PLANT },
      { path: '../shared/supports.bulk', text: SUPPORTS },
      { path: 'units/missing.bulk', missing: 'the file is missing (deleted or renamed)' },
    ]);
    expect(answer.body).not.toContain('UPS-9');
  });

  it('pushes a change when a part is saved, nested or not, and names the part that changed', async () => {
    for (const [file, text] of [
      [plant, PLANT.replace('title="UPS"', 'title="UPS renamed"')],
      [supports, SUPPORTS.replace('Instrument air', 'Plant air')],
    ] as const) {
      const events = nextChange(server.port);
      await events.ready;
      const before = server.revision();
      writeFileSync(file, text);
      expect(JSON.parse(await events.change)).toEqual({ revision: before + 1, changed: ['model'] });
      events.close();
      const sent = (JSON.parse((await get(server.port, '/parts')).body) as SentParts).parts;
      expect(sent.some((part) => 'text' in part && part.text === text)).toBe(true);
      await until(
        () =>
          changes.length > 0 &&
          changes[changes.length - 1]!.includes(
            join(dir, 'site', file === plant ? 'units/plant.bulk' : '../shared/supports.bulk'),
          ),
      );
    }
  });

  it('pushes a change when a missing part appears, and follows a part the model names only after a save', async () => {
    const before = server.revision();
    writeFileSync(join(dir, 'site', 'units', 'missing.bulk'), 'ups UPS-2\n');
    await until(() => server.revision() === before + 1);
    writeFileSync(model, `${MAIN}part "units/unnamed.bulk"\n`);
    await until(() => server.revision() === before + 2);
    const sent = (JSON.parse((await get(server.port, '/parts')).body) as SentParts).parts;
    expect(sent.map((part) => part.path)).toEqual([
      'units/plant.bulk',
      '../shared/supports.bulk',
      'units/missing.bulk',
      'units/unnamed.bulk',
    ]);
    writeFileSync(join(dir, 'site', 'units', 'unnamed.bulk'), 'ups UPS-10\n');
    await until(() => server.revision() === before + 3);
  });

  it('does not push for a save of a file the model does not name', async () => {
    writeFileSync(model, MAIN);
    await until(() => changes.length > 0 && changes[changes.length - 1]!.includes(model));
    const before = server.revision();
    writeFileSync(join(dir, 'site', 'units', 'unnamed.bulk'), 'ups UPS-11\n');
    writeFileSync(join(dir, 'site', 'other.bulk'), 'ups UPS-12\n');
    await new Promise((r) => setTimeout(r, 700));
    expect(server.revision()).toBe(before);
  });
});
