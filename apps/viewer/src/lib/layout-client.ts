// The page's side of the layout worker: posts a scene, resolves with the drawing. Only the newest
// request matters, so an answer to an older one is dropped. The worker file holds elkjs.
import type { Drawing, Scene } from '@bulkhead/layout';
import { WorkerRequests } from './worker-requests.ts';

export interface LayoutAnswer {
  drawing: Drawing;
  /** Time the worker spent on the ELK layout, milliseconds. */
  ms: number;
}

type Reply = { id: number; drawing: Drawing; ms: number } | { id: number; error: string } | { id: number; pong: true };

export class LayoutClient {
  private readonly requests = new WorkerRequests<Reply>(
    new Worker(new URL('./layout.worker.ts', import.meta.url), { type: 'module' }),
    'layout',
  );

  /** Resolves once the worker has started and answered: the canary that the worker runs at all. */
  ping(): Promise<void> {
    return this.requests.send({ ping: true }, (r) => ('pong' in r ? { value: undefined } : undefined));
  }

  /** `scene` must be plain data: callers pass `$state.snapshot(...)` of anything reactive. */
  layout(scene: Scene): Promise<LayoutAnswer> {
    return this.requests.send(
      { scene },
      (r) => ('drawing' in r ? { value: { drawing: r.drawing, ms: r.ms } } : undefined),
      { channel: 'layout' },
    );
  }

  terminate(): void {
    this.requests.terminate();
  }
}
