// When the page is served by `bulkhead view`, it fetches the one model at /model and listens on
// /events (server-sent events) for each save. Elsewhere (vite preview, a file) both are absent.

export const MODEL_FILE_HEADER = 'x-bulkhead-file';

export interface ServedModel {
  fileName: string;
  bytes: Uint8Array;
}

export async function fetchServedModel(): Promise<ServedModel | undefined> {
  let response: Response;
  try {
    response = await fetch('./model', { cache: 'no-store' });
  } catch {
    return undefined;
  }
  const fileName = response.headers.get(MODEL_FILE_HEADER);
  if (!response.ok || fileName === null) return undefined;
  return { fileName: decodeURIComponent(fileName), bytes: new Uint8Array(await response.arrayBuffer()) };
}

/** Calls `onChange` after every save the server reports; returns a function that stops listening. */
export function watchServedModel(onChange: () => void, onStatus: (connected: boolean) => void): () => void {
  const events = new EventSource('./events');
  events.addEventListener('change', () => onChange());
  events.onopen = () => onStatus(true);
  events.onerror = () => onStatus(false);
  return () => events.close();
}
