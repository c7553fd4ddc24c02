// The hash that names a model in the report and in the viewer's title block (modelContentHash). Checked
// against outside references: the SHA-256 test vector of FIPS 180-2 (Appendix B.1, "abc"), Node's own
// OpenSSL-backed createHash, and GNU coreutils `sha256sum`, whose listing of the files the split hash
// is defined over (run only where the tool is installed, as on every Debian-based machine).
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdirSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { modelContentHash, modelFilesWords } from '@bulkhead/core';

const bytes = (text: string) => new TextEncoder().encode(text);
const nodeSha256 = (data: Uint8Array | string) => createHash('sha256').update(data).digest('hex');
const hasSha256sum = spawnSync('sha256sum', ['--version']).status === 0;

describe('modelContentHash', () => {
  it('should give the FIPS 180-2 digest of "abc" for a one-file model holding those bytes', async () => {
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    const hash = await modelContentHash({ name: 'abc.bulk', bytes: bytes('abc') });
    expect(hash.sha256).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(hash.files).toEqual([{ name: 'abc.bulk', sha256: hash.sha256 }]);
  });

  it("should give a one-file model the file's own SHA-256, as `sha256sum FILE` prints it", async () => {
    const text = 'site "Hash test site"\n';
    expect((await modelContentHash({ name: 'm.bulk', bytes: bytes(text) })).sha256).toBe(nodeSha256(text));
  });

  it.runIf(hasSha256sum)(
    'should give a split model the SHA-256 of what `sha256sum MAIN PARTS...` prints, parts in code-point order',
    async () => {
      const dir = mkdtempSync(join(tmpdir(), 'bh-content-hash-'));
      mkdirSync(join(dir, 'units'));
      const files = {
        'main.bulk': 'site "x"\npart "units/b.bulk"\npart "units/A.bulk"\n',
        'units/b.bulk': 'b\n',
        'units/A.bulk': 'a\n',
      };
      for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, name), text);
      // Code-point order puts the capital A first.
      const listing = spawnSync('sha256sum', ['main.bulk', 'units/A.bulk', 'units/b.bulk'], {
        cwd: dir,
        encoding: 'utf8',
      });
      expect(listing.status).toBe(0);
      const hash = await modelContentHash({ name: 'main.bulk', bytes: bytes(files['main.bulk']) }, [
        { name: 'units/b.bulk', bytes: bytes(files['units/b.bulk']) },
        { name: 'units/A.bulk', bytes: bytes(files['units/A.bulk']) },
      ]);
      expect(hash.sha256).toBe(nodeSha256(listing.stdout));
      expect(hash.files.map((f) => f.name)).toEqual(['main.bulk', 'units/A.bulk', 'units/b.bulk']);
    },
  );

  it('should change when only a part file changes, or a part is renamed, and not with the order parts are given in', async () => {
    const main = { name: 'main.bulk', bytes: bytes('site "x"\npart "p.bulk"\npart "q.bulk"\n') };
    const p = { name: 'p.bulk', bytes: bytes('vessel V-1\n') };
    const q = { name: 'q.bulk', bytes: bytes('vessel V-2\n') };
    const base = (await modelContentHash(main, [p, q])).sha256;
    expect((await modelContentHash(main, [q, p])).sha256).toBe(base);
    expect((await modelContentHash(main, [p, { ...q, bytes: bytes('vessel V-3\n') }])).sha256).not.toBe(base);
    expect((await modelContentHash(main, [p, { ...q, name: 'r.bulk' }])).sha256).not.toBe(base);
    // The main file alone is a different model from the main file with its parts.
    expect((await modelContentHash(main)).sha256).not.toBe(base);
  });

  it('should say how many files the hash covers', () => {
    expect(modelFilesWords(1)).toBe('1 file');
    expect(modelFilesWords(2)).toBe('2 files: the model file and 1 part file');
    expect(modelFilesWords(4)).toBe('4 files: the model file and 3 part files');
  });
});
