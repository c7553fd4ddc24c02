// The README quotes `bulkhead check` output (the first screen and a finding on the demo, and an input
// error); every quoted line must be what the CLI prints today, so the documented look cannot drift.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.ts';

const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
const section = readme.slice(readme.indexOf('## What `check` tells you'), readme.indexOf('## The .bulk language'));
const blocks = [...section.matchAll(/```text\n([\s\S]*?)```/g)].map((m) =>
  m[1]!.split('\n').filter((l) => l.trim() !== ''),
);

describe('README check excerpts', () => {
  it('quotes the first screen of the demo verbatim, within its first 25 lines', async () => {
    const r = await runCli(['check', 'fixtures/demo/marrow-fen.bulk']);
    const screen = new Set(r.stdout.split('\n').slice(0, 25));
    expect(blocks[0]!.length).toBeGreaterThan(8);
    for (const line of blocks[0]!) expect(screen.has(line), line).toBe(true);
  });

  it('quotes a finding of the demo verbatim', async () => {
    const r = await runCli(['check', 'fixtures/demo/marrow-fen.bulk']);
    const printed = new Set(r.stdout.split('\n'));
    expect(blocks[1]!.length).toBeGreaterThan(5);
    for (const line of blocks[1]!) expect(printed.has(line), line).toBe(true);
  });

  it('quotes an input error verbatim', async () => {
    const r = await runCli(['check', 'fixtures/bad/unknown-attribute.bulk']);
    expect(r.code).toBe(2);
    expect(blocks[2]!.join('\n')).toBe(
      r.stderr
        .split('\n')
        .filter((l) => l.trim() !== '')
        .join('\n'),
    );
  });
});
