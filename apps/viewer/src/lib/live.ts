// When the page is served by `bulkhead view`, it fetches the one model at /model and listens on
// /events (server-sent events) for each save. Elsewhere (vite preview, a file) both are absent.

export const MODEL_FILE_HEADER = 'x-bulkhead-file';
/** Why the served file cannot be shown (deleted, renamed, a directory, too large), from the server. */
export const MISSING_HEADER = 'x-bulkhead-missing';

/** The served file's bytes, or why there are none just now; the file name either way. */
export type ServedModel = { fileName: string; bytes: Uint8Array } | { fileName: string; missing: string };

export async function fetchServedModel(): Promise<ServedModel | undefined> {
  let response: Response;
  try {
    response = await fetch('./model', { cache: 'no-store' });
    const fileName = response.headers.get(MODEL_FILE_HEADER);
    if (fileName === null) return undefined;
    const missing = response.headers.get(MISSING_HEADER);
    if (!response.ok) return { fileName: decodeURIComponent(fileName), missing: missing !== null ? decodeURIComponent(missing) : `the server answered ${response.status}` };
    return { fileName: decodeURIComponent(fileName), bytes: new Uint8Array(await response.arrayBuffer()) };
  } catch {
    return undefined;
  }
}

/** Calls `onChange` after every save the server reports; returns a function that stops listening. */
export function watchServedModel(onChange: () => void, onStatus: (connected: boolean) => void): () => void {
  const events = new EventSource('./events');
  events.addEventListener('change', () => onChange());
  events.onopen = () => onStatus(true);
  events.onerror = () => onStatus(false);
  return () => events.close();
}
