// HTTP helpers for tests of the `bulkhead view` server: a plain request, the next server-sent change
// event, and waiting for a condition (bounded, for file-system events that arrive when they arrive).
import { request } from 'node:http';

export function get(
  port: number,
  path: string,
  options: { method?: string; host?: string } = {},
): Promise<{ status: number; headers: Record<string, unknown>; body: string }> {
  return new Promise((resolve, reject) => {
    const req = request(
      {
        host: '127.0.0.1',
        port,
        path,
        method: options.method ?? 'GET',
        headers: options.host ? { Host: options.host } : {},
      },
      (res) => {
        let body = '';
        res.on('data', (b: Buffer) => (body += b.toString()));
        res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body }));
      },
    );
    req.on('error', reject);
    req.end();
  });
}

/** Opens /events and resolves with the first `change` event's data. */
export function nextChange(port: number): { ready: Promise<void>; change: Promise<string>; close: () => void } {
  let close = () => {};
  let ready!: () => void;
  const readyP = new Promise<void>((r) => (ready = r));
  const change = new Promise<string>((resolve, reject) => {
    const req = request({ host: '127.0.0.1', port, path: '/events' }, (res) => {
      let buffer = '';
      res.on('data', (b: Buffer) => {
        buffer += b.toString();
        if (buffer.includes('event: hello')) ready();
        const m = /event: change\ndata: (.*)\n\n/.exec(buffer);
        if (m) resolve(m[1]!);
      });
    });
    req.on('error', reject);
    req.end();
    close = () => req.destroy();
  });
  return { ready: readyP, change, close };
}

export const until = async (check: () => boolean | Promise<boolean>, ms = 5_000) => {
  const deadline = Date.now() + ms;
  while (!(await check())) {
    if (Date.now() > deadline) throw new Error('timed out');
    await new Promise((r) => setTimeout(r, 50));
  }
};
