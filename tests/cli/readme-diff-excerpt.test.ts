// The README quotes `bulkhead diff` of the two demo revisions; the quote must be what the CLI prints today.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/cli.ts';

const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
const section = readme.slice(readme.indexOf('## Revisions and the site as a whole'), readme.indexOf('## Viewer'));
const quoted = /```text\n([\s\S]*?)```/.exec(section)?.[1];

describe('README diff excerpt', () => {
  it('quotes the diff of the demo revisions verbatim', async () => {
    const r = await runCli(['diff', 'fixtures/demo/marrow-fen.bulk', 'fixtures/demo/marrow-fen-rev-b.bulk']);
    expect(quoted?.split('\n').length).toBeGreaterThan(20);
    expect(quoted).toBe(r.stdout.replace(/\n+$/, '\n'));
  });
});
