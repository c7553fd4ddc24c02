// The layout worker: runs elkjs off the main thread. elk.bundled.js installs its own `self.onmessage`
// when evaluated in a worker, so we assign ours after the import (replacing it), never addEventListener.
import ELK from 'elkjs/lib/elk.bundled.js';
import { fromElk, layoutStageColumns, toElk, warmUpScene, type Scene } from '@bulkhead/layout';

const elk = new ELK();
// Pay ELK's JIT warm-up while the page is still loading the model, not on the first real layout.
const warm: Promise<unknown> = elk.layout(toElk(warmUpScene(24))).catch(() => undefined);

type Request = { id: number; scene: Scene } | { id: number; ping: true };

self.onmessage = async (ev: MessageEvent<Request>) => {
  const request = ev.data;
  if ('ping' in request) {
    self.postMessage({ id: request.id, pong: true });
    return;
  }
  try {
    const started = performance.now();
    // A scenario is a sheet in stage columns, laid out without ELK; only the overview waits for it.
    const drawing =
      request.scene.view === 'scenario'
        ? layoutStageColumns(request.scene)
        : await warm.then(async () => fromElk(request.scene, await elk.layout(toElk(request.scene))));
    self.postMessage({ id: request.id, drawing, ms: Math.round(performance.now() - started) });
  } catch (e) {
    self.postMessage({ id: request.id, error: e instanceof Error ? e.message : String(e) });
  }
};
