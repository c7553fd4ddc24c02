// The public API of @bulkhead/layout: model + analysis -> scene -> ELK graph -> drawing -> SVG.
// No elkjs code here (see ./elk.ts), so the viewer's main bundle stays small; ELK runs in a worker.
export {
  scenarioScene,
  PARTITIONS,
  edgeId,
  type Scene,
  type SceneNode,
  type SceneEdge,
  type SceneCluster,
  type Side,
  type SharedMark,
  type FindingPath,
  type NodeRole,
} from './scene.ts';
export { siteOverview, OVERVIEW_NODE_LIMIT } from './overview.ts';
export { toElk, fromElk } from './elk-graph.ts';
export { layoutStageColumns, STAGES, type Stage } from './stage-columns.ts';
export { countCrossings } from './orthogonal-routes.ts';
export { warmUpScene } from './warm-up.ts';
export {
  offsetPolyline,
  boxSize,
  bannerText,
  LANE_GAP,
  type Drawing,
  type DrawnBox,
  type DrawnEdge,
  type DrawnLane,
  type DrawnCluster,
  type DrawnStage,
  type DrawnText,
  type DrawnMark,
  type Point,
} from './drawing.ts';
export {
  renderPlan,
  pointsAttr,
  LINK_WORDS,
  type RenderPlan,
  type PlannedBox,
  type PlannedEdge,
  type PlannedLane,
  type ViewState,
} from './render-plan.ts';
export { toSvg, escapeXml, cornerRadius, arrowDefs, CAUTION, type TitleRow } from './svg.ts';
export { DRAWING_CSS, ARROW_MARKER } from './style.ts';
export { SIDE_STYLES, sideStyle, sideLetter, type SideStyle } from './sides.ts';
