// The bundle split: @bulkhead/layout's main entry must not import elkjs at run time, or the viewer's
// main chunk would carry 1.6 MB of ELK (the page would wait for it before its first paint).
import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const SRC = new URL('../../packages/layout/src/', import.meta.url);

describe('@bulkhead/layout entry points', () => {
  it('should import elkjs (other than its types) only in elk.ts', () => {
    const offenders = readdirSync(SRC)
      .filter((f) => f.endsWith('.ts') && f !== 'elk.ts')
      .filter((f) => /^import (?!type )[^;]*from 'elkjs/m.test(readFileSync(new URL(f, SRC), 'utf8')));
    expect(offenders).toEqual([]);
  });

  it('should not re-export elk.ts from index.ts', () => {
    expect(readFileSync(new URL('index.ts', SRC), 'utf8')).not.toMatch(/from '\.\/elk\.ts'/);
  });
});
