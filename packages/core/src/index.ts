// The public API of @bulkhead/core: model schema, .bulk language, loader and diagnostics.
// Pure TypeScript with no Node APIs, so the same code runs in the CLI and in the viewer.
export * from './model/schema.ts';
export * from './model/kinds.ts';
export {
  kebab,
  camel,
  fieldsOf,
  ELEMENT_SPECS,
  FUNCTION_SPECS,
  LIST_SPECS,
  SCENARIO_LINE_SPECS,
  TEXT_FIELDS,
  type FieldType,
  type StatementSpec,
} from './model/fields.ts';
export * from './diagnostics/diagnostic.ts';
export { renderDiagnostic, renderDiagnostics, diagnosticNotice, splitLines } from './diagnostics/render.ts';
export { renderNotice, position, place, type Notice, type NoticeFact, type SourceText } from './diagnostics/notice.ts';
export { parseBulk, type ParsedFile, type Statement } from './bulk/parser.ts';
export { printBulk, formatNumber, type PartLine } from './bulk/printer.ts';
export { formatModelFile } from './bulk/fragment.ts';
export type { SpanMap } from './bulk/to-model.ts';
export {
  loadModelText,
  partFilesOf,
  detectFormat,
  MAX_FILE_BYTES,
  type LoadResult,
  type LoadOptions,
  type ModelFormat,
} from './loader/load.ts';
export { joinRelative, normalPath, PART_KEYWORD, type PartReader, type PartBytes } from './loader/parts.ts';
export { spanAt } from './loader/schema-issues.ts';
export { printJson } from './json/printer.ts';
export { summarize, type ModelSummary } from './model/summary.ts';
export * from './vocabulary/types.ts';
export {
  ALL_RULE_IDS,
  ASSESSMENT_ENTRIES,
  CATALOGUE,
  catalogueEntry,
  INDEPENDENCE_ENTRIES,
  JUSTIFICATION_ENTRIES,
  renderMessage,
  ruleIdOf,
  say,
  type FindingMessage,
  type FindingMessages,
  type MessageId,
  type MessageOf,
  type RuleId,
} from './catalogue/catalogue.ts';
export type { RuleEntry, RuleKind } from './catalogue/define.ts';
export type { SideRef } from './catalogue/words.ts';
export { analyze, independenceRulesInForce, ruleEnvironment, type AnalyzeOptions } from './analysis/analyze.ts';
export {
  buildPlantGraph,
  roleTargets,
  type PlantGraph,
  type NodeAttributes,
  type EdgeAttributes,
} from './graph/plant-graph.ts';
export { PlantIndex } from './graph/plant-index.ts';
export { Tracer } from './trace/trace.ts';
export { RULES, RULE_IDS, ruleById } from './rules/registry.ts';
export { runRules, scenarioContext, type RuleEnvironment } from './rules/run.ts';
export {
  findingKey as independenceFindingKey,
  SEVERITY_RANK,
  type Rule,
  type SharedElementRule,
  type ScenarioRule,
  type Side,
  type ScenarioContext,
} from './rules/define.ts';
export * from './assess/index.ts';
export * from './justify/index.ts';
export * from './report/index.ts';
export { ModelLocator, FACTOR_RULES, findingSpans } from './loader/locate.ts';
export { findingNotice, renderFindingText } from './report/finding-notice.ts';
export { suggest as suggestTag } from './util/suggest.ts';
export * from './cutsets/index.ts';
export * from './ranking/index.ts';
export * from './diff/index.ts';
export * from './verify/index.ts';
export { modelContentHash, modelFilesWords, type ModelContentHash, type ModelFileBytes } from './util/content-hash.ts';
