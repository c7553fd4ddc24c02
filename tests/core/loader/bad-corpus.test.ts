// Pins the first (primary) diagnostic of every file in fixtures/bad/: its stable code and line:column,
// and a fragment of its wording, so a change in what the loader says about bad input is always noticed.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { CODES, loadModelText, type DiagnosticCode } from '@bulkhead/core';
import { BAD_DIR, CORPUS, corpusFiles, NOT_IN_CORPUS } from './bad-corpus.table.ts';

function load(file: string) {
  return loadModelText(`fixtures/bad/${file}`, readFileSync(new URL(file, BAD_DIR)));
}

describe('the bad-input corpus', () => {
  it('has a row for every file in fixtures/bad and a file for every row', () => {
    expect(CORPUS.map((r) => r.file)).toEqual(corpusFiles());
  });

  it('holds at least 34 files', () => {
    expect(corpusFiles().length).toBeGreaterThanOrEqual(34);
  });

  it('covers every code in the catalogue, or says where that code is tested', () => {
    const shown = new Set(CORPUS.map((r) => r.code));
    const uncovered = (Object.keys(CODES) as DiagnosticCode[]).filter(
      (code) => !shown.has(code) && !NOT_IN_CORPUS[code],
    );
    expect(uncovered).toEqual([]);
  });

  it.each(CORPUS)('$file gives $code at $line:$column', ({ file, code, line, column, says }) => {
    const result = load(file);
    expect(result.model).toBeUndefined();
    const first = result.diagnostics[0]!;
    expect({ code: first.code, line: first.span?.line, column: first.span?.column }).toEqual({ code, line, column });
    expect(`${first.message}\n${first.help ?? ''}`).toContain(says);
    expect(first.severity).toBe('error');
  });

  it.each(
    CORPUS.filter((r) => r.file.endsWith('.bulk') && r.file !== 'empty.bulk' && r.file !== 'whitespace-only.bulk'),
  )('$file reports its one defect once, with no follow-on diagnostics', ({ file }) => {
    expect(load(file).diagnostics.map((d) => d.code)).toHaveLength(1);
  });

  it('the corpus varies a base that is itself valid', () => {
    // Undo the one defect of a few files and the model must load cleanly, so the defect is the only one.
    const fixes: [string, string, string][] = [
      ['unknown-reference.bulk', 'sensors=LT-22', 'sensors=LT-2'],
      ['wrong-kind-link.bulk', 'mounted-on=XV-1', 'mounted-on=N-2'],
      ['bad-number.bulk', 'tolerable=1e ', 'tolerable=1e-4 '],
    ];
    for (const [file, bad, good] of fixes) {
      const text = readFileSync(new URL(file, BAD_DIR), 'utf8');
      expect(text).toContain(bad);
      const result = loadModelText(file, text.replace(bad, good));
      expect(result.diagnostics).toEqual([]);
      expect(result.model).toBeDefined();
    }
  });
});

describe('input too large or unreadable', () => {
  it('refuses more than 50 MB with BH103 before decoding it', () => {
    const bytes = new Uint8Array(50 * 1024 * 1024 + 1).fill(0x23); // all '#', a valid comment if decoded
    const result = loadModelText('huge.bulk', bytes);
    expect(result.model).toBeUndefined();
    expect(result.diagnostics.map((d) => d.code)).toEqual(['BH103']);
    expect(result.diagnostics[0]!.message).toContain('the limit is 50 MB');
  });

  it('loads a file of exactly 50 MB (the limit is inclusive)', () => {
    // One long comment line fills the file, so the test measures the limit, not the parser's speed.
    const head = 'site "Big"\n#';
    const size = 50 * 1024 * 1024;
    const text = head + 'x'.repeat(size - head.length);
    const bytes = new TextEncoder().encode(text);
    expect(bytes.length).toBe(size);
    const result = loadModelText('big.bulk', bytes);
    expect(result.diagnostics).toEqual([]);
    expect(result.model?.site.name).toBe('Big');
  });
});
