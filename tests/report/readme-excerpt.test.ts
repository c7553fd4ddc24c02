// The README's Reports section quotes the demo's Markdown report; every quoted line must still be in the
// golden file, so the documentation cannot drift from what `bulkhead report` prints.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { GOLDEN_DIR } from './demo.ts';

describe('README Reports excerpt', () => {
  it('quotes lines of the golden Markdown report verbatim', () => {
    const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
    const section = readme.slice(readme.indexOf('## Reports'));
    const excerpt = /```markdown\n([\s\S]*?)```/.exec(section)?.[1];
    expect(excerpt).toBeDefined();
    const golden = new Set(readFileSync(`${GOLDEN_DIR}marrow-fen.md`, 'utf8').split('\n'));
    const quoted = excerpt!.split('\n').filter((l) => l.trim() !== '' && l !== '...');
    expect(quoted.length).toBeGreaterThan(10);
    for (const line of quoted) {
      const text = line.endsWith(', ...') ? line.slice(0, -5) : line;
      expect(
        [...golden].some((g) => g === text || (line.endsWith(', ...') && g.startsWith(text))),
        line,
      ).toBe(true);
    }
  });
});
