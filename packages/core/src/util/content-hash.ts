// One hash that names a model exactly as it was read, the same in the report and in the viewer's title
// block: for a model in one file, the SHA-256 of its bytes (what `sha256sum FILE` prints); for a model
// split over part files, the SHA-256 of the list `sha256sum` prints for all of them, the model file first
// and then each part by its path in code-point order. An auditor can check either by hand:
//   sha256sum marrow-fen-site.bulk generated/plant.bulk | sha256sum
// Uses the Web Crypto digest, which Node 20 and every browser the viewer runs in have, so core stays
// free of Node APIs.

/** One file of a model: its name (the model file's own name, or a part's path as the model names it) and bytes. */
export interface ModelFileBytes {
  name: string;
  bytes: Uint8Array;
}

export interface ModelContentHash {
  /** Lower-case hex SHA-256 over the model's content (see above). */
  sha256: string;
  /** Each file, the model file first, then the parts in the order hashed, with the SHA-256 of its own bytes. */
  files: { name: string; sha256: string }[];
}

function hex(digest: ArrayBuffer): string {
  return [...new Uint8Array(digest)].map((b) => b.toString(16).padStart(2, '0')).join('');
}

async function sha256Of(bytes: Uint8Array): Promise<string> {
  return hex(await globalThis.crypto.subtle.digest('SHA-256', bytes as Uint8Array<ArrayBuffer>));
}

/** Code-point order, so the order never depends on a locale. */
const byName = (a: { name: string }, b: { name: string }) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0);

/** The hash of a model file and its part files; `parts` may come in any order. */
export async function modelContentHash(
  main: ModelFileBytes,
  parts: readonly ModelFileBytes[] = [],
): Promise<ModelContentHash> {
  const ordered = [main, ...[...parts].sort(byName)];
  const files = await Promise.all(ordered.map(async (f) => ({ name: f.name, sha256: await sha256Of(f.bytes) })));
  if (files.length === 1) return { sha256: files[0]!.sha256, files };
  // Two spaces between hash and name: `sha256sum`'s text-mode line.
  const listing = files.map((f) => `${f.sha256}  ${f.name}\n`).join('');
  return { sha256: await sha256Of(new TextEncoder().encode(listing)), files };
}

/** "1 file" or "3 files: the model file and 2 part files", for a title block or a report header. */
export function modelFilesWords(count: number): string {
  if (count <= 1) return '1 file';
  return `${count} files: the model file and ${count - 1} part file${count === 2 ? '' : 's'}`;
}
