// When the page is served by `bulkhead view`, it fetches the model at /model, the part files it names
// at /parts, the earlier revision to compare with (`view --compare OLD`) at /earlier and /earlier-parts,
// and listens on /events (server-sent events) for each save of any of them. Elsewhere (vite preview, a
// file) all are absent.
import type { PartBytes } from '@bulkhead/core';

export const MODEL_FILE_HEADER = 'x-bulkhead-file';
/** Why the served file cannot be shown (deleted, renamed, a directory, too large), from the server. */
export const MISSING_HEADER = 'x-bulkhead-missing';

/** The part files, keyed by the path the model's load asks for each, as the reader hands them over. */
export type ServedParts = [path: string, part: PartBytes][];

/** The served file's bytes and its parts, or why there are none just now; the file name either way. */
export type ServedModel =
  { fileName: string; bytes: Uint8Array; parts: ServedParts } | { fileName: string; missing: string };

/** One part as the server sends it: the bytes as latin1 text (one char per byte), or why it was not read. */
type SentPart = { path: string; text: string } | { path: string; missing: string };

function latin1Bytes(text: string): Uint8Array {
  const bytes = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
  return bytes;
}

/** Which served model: the one shown, or the earlier revision it is compared with. */
export type ServedKind = 'model' | 'earlier';
const PATHS: Record<ServedKind, { model: string; parts: string }> = {
  model: { model: './model', parts: './parts' },
  earlier: { model: './earlier', parts: './earlier-parts' },
};

async function fetchServedParts(kind: ServedKind): Promise<ServedParts> {
  const response = await fetch(PATHS[kind].parts, { cache: 'no-store' });
  if (!response.ok) throw new Error(`the server answered ${response.status} for the part files`);
  const sent = ((await response.json()) as { parts: SentPart[] }).parts;
  return sent.map((part) => [part.path, 'text' in part ? latin1Bytes(part.text) : { problem: part.missing }]);
}

/** The served model (or the earlier revision), or undefined when the page is not served with one. */
export async function fetchServedModel(kind: ServedKind = 'model'): Promise<ServedModel | undefined> {
  let response: Response;
  try {
    response = await fetch(PATHS[kind].model, { cache: 'no-store' });
    const fileName = response.headers.get(MODEL_FILE_HEADER);
    if (fileName === null) return undefined;
    const missing = response.headers.get(MISSING_HEADER);
    if (!response.ok)
      return {
        fileName: decodeURIComponent(fileName),
        missing: missing !== null ? decodeURIComponent(missing) : `the server answered ${response.status}`,
      };
    const [bytes, parts] = await Promise.all([response.arrayBuffer(), fetchServedParts(kind)]);
    return { fileName: decodeURIComponent(fileName), bytes: new Uint8Array(bytes), parts };
  } catch {
    return undefined;
  }
}

/**
 * Calls `onChange` after every save the server reports, with which models it changed; returns a function
 * that stops listening.
 */
export function watchServedModel(
  onChange: (changed: ServedKind[]) => void,
  onStatus: (connected: boolean) => void,
): () => void {
  const events = new EventSource('./events');
  events.addEventListener('change', (e) => {
    let changed: ServedKind[] = ['model'];
    try {
      const said = (JSON.parse((e as MessageEvent<string>).data) as { changed?: ServedKind[] }).changed;
      if (Array.isArray(said)) changed = said;
    } catch {
      // An event without a list: take it as a save of the model, as it always was.
    }
    onChange(changed);
  });
  events.onopen = () => onStatus(true);
  events.onerror = () => onStatus(false);
  return () => events.close();
}
