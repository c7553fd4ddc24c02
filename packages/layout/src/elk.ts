// In-process layout with elkjs for Node (the CLI, tests, benchmarks). The viewer does the same in a
// web worker; this entry is separate so the viewer's main bundle never pulls in elk.bundled.js.
import ELK from 'elkjs/lib/elk.bundled.js';
import { fromElk, toElk } from './elk-graph.ts';
import { layoutStageColumns } from './stage-columns.ts';
import type { Drawing } from './drawing.ts';
import type { Scene } from './scene.ts';

const elk = new ELK();

/** A scenario is drawn as a sheet in stage columns; the site overview is laid out by ELK. */
export async function layoutScene(scene: Scene): Promise<Drawing> {
  if (scene.view === 'scenario') return layoutStageColumns(scene);
  return fromElk(scene, await elk.layout(toElk(scene)));
}
