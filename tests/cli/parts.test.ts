// A model split over part files, through the built command: check points into the part, SARIF names
// the part's file for a result there, convert says it merges the parts, and fmt formats each file on its
// own, keeping the `part` lines.
import { createHash } from 'node:crypto';
import { cpSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.ts';
import { sarifValidator } from '../report/sarif-schema.ts';

interface SarifLog {
  runs: { artifacts: unknown[]; results: unknown[] }[];
}

/** The demo split: supports and plant in `units/plant.bulk`, the rest in `main.bulk`. */
function splitDemo(): string {
  const dir = mkdtempSync(join(tmpdir(), 'bh-parts-'));
  const lines = readFileSync('fixtures/demo/marrow-fen.bulk', 'utf8').split('\n');
  const from = lines.findIndex((l) => l.startsWith('# ---- Supports'));
  const to = lines.findIndex((l) => l.startsWith('# ---- Functions'));
  writeFileSync(
    join(dir, 'main.bulk'),
    [...lines.slice(0, from), 'part "units/plant.bulk"', '', ...lines.slice(to)].join('\n'),
  );
  cpSync('fixtures/demo/marrow-fen.bulk', join(dir, 'whole.bulk'));
  mkdirSync(join(dir, 'units'));
  writeFileSync(join(dir, 'units', 'plant.bulk'), lines.slice(from, to).join('\n') + '\n');
  return dir;
}

describe('a model split over part files, on the command line', () => {
  it('check gives the same verdicts as the model in one file, and names the part where an element is defined', async () => {
    const dir = splitDemo();
    const split = await runCli(['check', 'main.bulk'], { cwd: dir });
    const whole = await runCli(['check', 'whole.bulk'], { cwd: dir });
    expect(split.code).toBe(whole.code);
    const verdicts = (out: string) => out.slice(out.indexOf('== verdict =='));
    expect(verdicts(split.stdout).replace(/main\.bulk/g, 'X')).toBe(
      verdicts(whole.stdout).replace(/whole\.bulk/g, 'X'),
    );
    expect(split.stdout).toContain('element  BR-101, defined at units/plant.bulk line');
  });

  it('SARIF names the part file for the locations that lie in it, and lists it among the artifacts by its index', async () => {
    const dir = splitDemo();
    // Findings point at layer claims in main.bulk; the shared elements they name are defined in the part.
    const sarif = await runCli(['report', 'main.bulk', '--format', 'sarif'], { cwd: dir });
    const log = JSON.parse(sarif.stdout) as SarifLog;
    // SARIF 2.1.0 (OASIS), 3.4.5: an artifactLocation's index is its place in run.artifacts; the
    // published schema (fixtures/sarif) checks the shape.
    expect(sarifValidator()(log)).toEqual([]);
    const sha256 = (path: string) =>
      createHash('sha256')
        .update(readFileSync(join(dir, path)))
        .digest('hex');
    expect(log.runs[0]!.artifacts).toEqual([
      { location: { uri: 'main.bulk' }, hashes: { 'sha-256': sha256('main.bulk') } },
      { location: { uri: 'units/plant.bulk' }, hashes: { 'sha-256': sha256('units/plant.bulk') } },
    ]);
    const locations: { uri: string; index?: number }[] = [];
    JSON.stringify(log.runs[0]!.results, (key, value: unknown) => {
      if (key === 'artifactLocation') locations.push(value as { uri: string; index?: number });
      return value;
    });
    const indexOf = new Map(locations.map((l) => [l.uri, l.index]));
    expect([...indexOf]).toEqual(
      expect.arrayContaining([
        ['main.bulk', 0],
        ['units/plant.bulk', 1],
      ]),
    );
    expect(indexOf.size).toBe(2);
    expect(locations.every((l) => l.index === (l.uri === 'main.bulk' ? 0 : 1))).toBe(true);
  });

  it('convert says on stderr that it merges the parts into one file, naming them, and the whole model is in the output', async () => {
    const dir = splitDemo();
    const split = await runCli(['convert', 'main.bulk', '--to', 'json'], { cwd: dir });
    const whole = await runCli(['convert', 'whole.bulk', '--to', 'json'], { cwd: dir });
    expect(split.code).toBe(0);
    expect(split.stderr).toBe(
      'bulkhead convert: note: main.bulk names 1 part file (units/plant.bulk); the json model written holds them all in one file, with no `part` statement; the part files are not changed\n',
    );
    expect(whole.stderr).toBe('');
    const tags = (json: string) =>
      (JSON.parse(json) as { elements: { tag: string }[] }).elements.map((e) => e.tag).sort();
    expect(tags(split.stdout)).toEqual(tags(whole.stdout));
    expect(tags(split.stdout)).toContain('UPS-1');
  });

  it('fmt formats each file and keeps the part statement', async () => {
    const dir = splitDemo();
    writeFileSync(
      join(dir, 'units', 'plant.bulk'),
      readFileSync(join(dir, 'units', 'plant.bulk'), 'utf8').replace('ups UPS-1 ', 'ups   UPS-1   '),
    );
    const fmt = await runCli(['fmt', 'main.bulk'], { cwd: dir });
    expect(fmt.code).toBe(0);
    expect(fmt.stdout).toContain('units/plant.bulk: formatted');
    expect(readFileSync(join(dir, 'units', 'plant.bulk'), 'utf8')).toContain('ups UPS-1 title=');
    expect(readFileSync(join(dir, 'main.bulk'), 'utf8')).toContain('part "units/plant.bulk"');
    expect((await runCli(['fmt', '--check', 'main.bulk'], { cwd: dir })).code).toBe(0);
  });
});
