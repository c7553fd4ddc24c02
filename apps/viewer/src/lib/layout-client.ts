// The page's side of the layout worker: posts a scene, resolves with the drawing. Only the newest
// request matters, so an answer to an older one is dropped. The worker file holds elkjs.
import type { Drawing, Scene } from '@bulkhead/layout';

export interface LayoutAnswer {
  drawing: Drawing;
  /** Time the worker spent on the ELK layout, milliseconds. */
  ms: number;
}

type Reply = { id: number; drawing: Drawing; ms: number } | { id: number; error: string } | { id: number; pong: true };

export class LayoutClient {
  private readonly worker: Worker;
  private next = 1;
  /** The layout request whose answer will be shown; older ones are superseded. */
  private current: number | undefined;
  private readonly pending = new Map<number, { answer: (reply: Reply) => void; reject: (e: Error) => void }>();

  constructor() {
    this.worker = new Worker(new URL('./layout.worker.ts', import.meta.url), { type: 'module' });
    this.worker.onmessage = (ev: MessageEvent<Reply>) => {
      const reply = ev.data;
      const waiting = this.pending.get(reply.id);
      if (!waiting) return;
      this.pending.delete(reply.id);
      if ('error' in reply) waiting.reject(new Error(reply.error));
      else waiting.answer(reply);
    };
    this.worker.onerror = (ev) => {
      for (const w of this.pending.values()) w.reject(new Error(`layout worker failed: ${ev.message}`));
      this.pending.clear();
    };
  }

  /** Resolves once the worker has started and answered: the canary that the worker runs at all. */
  ping(): Promise<void> {
    const id = this.next++;
    return new Promise((resolve, reject) => {
      this.pending.set(id, { answer: () => resolve(), reject });
      this.worker.postMessage({ id, ping: true });
    });
  }

  /** `scene` must be plain data: callers pass `$state.snapshot(...)` of anything reactive. */
  layout(scene: Scene): Promise<LayoutAnswer> {
    const id = this.next++;
    // An older layout will never be shown; drop it so its answer is ignored.
    if (this.current !== undefined) {
      this.pending.get(this.current)?.reject(new SupersededError());
      this.pending.delete(this.current);
    }
    this.current = id;
    return new Promise((resolve, reject) => {
      this.pending.set(id, {
        answer: (reply) => ('drawing' in reply ? resolve({ drawing: reply.drawing, ms: reply.ms }) : reject(new Error('unexpected worker reply'))),
        reject,
      });
      this.worker.postMessage({ id, scene });
    });
  }

  terminate(): void {
    this.worker.terminate();
  }
}

export class SupersededError extends Error {
  constructor() {
    super('superseded by a newer layout');
  }
}
