// Requests to a worker matched with their replies by id, shared by the layout and analysis clients. A
// request may name a channel: on a channel only the newest request matters, so a newer one rejects the
// older with SupersededError and its answer is dropped. Progress replies reach the request's listener.

export class SupersededError extends Error {
  constructor() {
    super('superseded by a newer request');
  }
}

interface Waiting<Reply> {
  answer: (reply: Reply) => void;
  reject: (e: Error) => void;
  progress?: (stage: string) => void;
}

export class WorkerRequests<Reply extends { id: number }> {
  private next = 1;
  private readonly pending = new Map<number, Waiting<Reply>>();
  private readonly newest = new Map<string, number>();

  constructor(
    private readonly worker: Worker,
    name: string,
  ) {
    worker.onmessage = (ev: MessageEvent<Reply>) => {
      const reply = ev.data;
      const waiting = this.pending.get(reply.id);
      if (!waiting) return;
      if ('progress' in reply && typeof reply.progress === 'string') {
        waiting.progress?.(reply.progress);
        return;
      }
      this.pending.delete(reply.id);
      if ('error' in reply && typeof reply.error === 'string') waiting.reject(new Error(reply.error));
      else waiting.answer(reply);
    };
    worker.onerror = (ev) => {
      for (const w of this.pending.values()) w.reject(new Error(`${name} worker failed: ${ev.message}`));
      this.pending.clear();
    };
  }

  /** Posts `message` with a fresh id; resolves with `pick(reply)`, which returns undefined for a reply of the wrong kind. */
  send<R>(
    message: object,
    pick: (reply: Reply) => { value: R } | undefined,
    options: { channel?: string; progress?: (stage: string) => void } = {},
  ): Promise<R> {
    const id = this.next++;
    if (options.channel !== undefined) {
      const older = this.newest.get(options.channel);
      if (older !== undefined) {
        this.pending.get(older)?.reject(new SupersededError());
        this.pending.delete(older);
      }
      this.newest.set(options.channel, id);
    }
    return new Promise<R>((resolve, reject) => {
      this.pending.set(id, {
        answer: (reply) => {
          const picked = pick(reply);
          if (picked) resolve(picked.value);
          else reject(new Error('unexpected worker reply'));
        },
        reject,
        ...(options.progress ? { progress: options.progress } : {}),
      });
      this.worker.postMessage({ id, ...message });
    });
  }

  terminate(): void {
    this.worker.terminate();
  }
}
