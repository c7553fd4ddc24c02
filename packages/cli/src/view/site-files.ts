// The files `bulkhead view` serves and watches: the model file and every part file it names (directly or
// through other parts), read afresh on each request and each save. Part files are found by parsing the
// model as the loader would, so the page is sent exactly the files its own load will ask for, no more.
import { readFileSync, statSync } from 'node:fs';
import { basename, dirname, resolve } from 'node:path';
import { MAX_FILE_BYTES, partFilesOf } from '@bulkhead/core';

/** What a watched path holds now: text, or the reason there is none to show. */
export type FileState = { text: string } | { missing: string };

/** The model file and its part files, keyed by the path a load of the model names each part by. */
export interface SiteFiles {
  main: FileState;
  parts: Map<string, FileState>;
}

/**
 * The path's state without reading more than the limit: a file replaced by a directory, a device or a
 * gigabyte of noise is reported, never read whole or allowed to throw.
 */
export function readState(file: string): FileState {
  try {
    const stat = statSync(file);
    if (stat.isDirectory()) return { missing: 'the path is now a directory, not a file' };
    if (!stat.isFile()) return { missing: 'the path is not a regular file' };
    if (stat.size > MAX_FILE_BYTES)
      return { missing: `the file is ${(stat.size / 1048576).toFixed(1)} MB; the limit is 50 MB` };
    return { text: readFileSync(file, 'latin1') };
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    return {
      missing:
        code === 'ENOENT'
          ? 'the file is missing (deleted or renamed)'
          : `the file cannot be read (${code ?? 'read error'})`,
    };
  }
}

export function sameState(a: FileState, b: FileState): boolean {
  return 'text' in a && 'text' in b ? a.text === b.text : 'missing' in a && 'missing' in b && a.missing === b.missing;
}

export function sameSite(a: SiteFiles, b: SiteFiles): boolean {
  if (!sameState(a.main, b.main) || a.parts.size !== b.parts.size) return false;
  for (const [path, state] of a.parts) {
    const other = b.parts.get(path);
    if (!other || !sameState(state, other)) return false;
  }
  return true;
}

/** Where a part file lies on disk: its path as the model names it, joined to the model file's folder. */
export function partOnDisk(file: string, part: string): string {
  return resolve(dirname(file), part);
}

/** The model file and every part file it names, each read now; parts are keyed relative to the model's folder. */
export function readSiteFiles(file: string): SiteFiles {
  const main = readState(file);
  const parts = new Map<string, FileState>();
  if (!('text' in main)) return { main, parts };
  // Keyed as the page's load will ask: relative to the bare file name it is given.
  partFilesOf(basename(file), Buffer.from(main.text, 'latin1'), (part) => {
    const state = readState(partOnDisk(file, part));
    parts.set(part, state);
    return 'text' in state ? Buffer.from(state.text, 'latin1') : { problem: state.missing };
  });
  return { main, parts };
}

/** The part files as the page is sent them: each file's bytes as latin1 text (one char per byte), or why not. */
export function partsBody(parts: Map<string, FileState>): string {
  return JSON.stringify({ parts: [...parts].map(([path, state]) => ({ path, ...state })) });
}
