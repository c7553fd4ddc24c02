// The analysis worker: reads the model, analyses it and keeps both, off the main thread, so a large
// site never freezes the page. The page asks it for a summary, for the view of one focus (scene,
// assessment, findings) and for the details of one tag; it reports its progress stage by stage.
import { analyze, loadModelText, type Analysis, type Model } from '@bulkhead/core';
import { detailsOf } from './details.ts';
import { focusView, rankingView, searchTags, summariseSite, type RankingView } from './site-view.ts';
import type {
  AnalysisReply,
  AnalysisRequest,
  CompareOutcome,
  EarlierFile,
  LoadOutcome,
  WhatIfOutcome,
} from './analysis-protocol.ts';
import { applyWhatIf, isWhatIf, statementsToPaste, type WhatIf } from './what-if.ts';
import { isoDate } from './sheet.ts';
import type { ServedParts } from './live.ts';
import { compareView } from './compare-view.ts';

/** The last model that loaded and analysed; a later load with errors leaves it in place. */
let fromFile: { model: Model; analysis: Analysis } | undefined;
/** What the page is shown: the file's model, or a what-if made from it (never written anywhere). */
let current: { model: Model; analysis: Analysis } | undefined;
/** The ranking of `current`, worked out the first time the matrix asks (it assesses scenarios again). */
let ranked: { of: typeof current; view: RankingView } | undefined;

/** The earlier revision the page compares with, once a file for it loaded. */
let earlier: { model: Model; analysis: Analysis; fileName: string } | undefined;
let currentFileName = '';

/** Part files as the reader asks for them; a part the server did not send is said so, never read elsewhere. */
function servedPartReader(parts: ServedParts | undefined) {
  const served = parts ? new Map(parts) : undefined;
  return served
    ? {
        readPart: (path: string) =>
          served.get(path) ?? { problem: 'the view server had not sent it yet; the page reloads on the next save' },
      }
    : {};
}

function compare(file: EarlierFile | null): CompareOutcome {
  if (!current) throw new Error('no model is loaded');
  if (file) {
    const result = loadModelText(file.fileName, file.bytes, servedPartReader(file.parts));
    const errors = result.diagnostics.filter((d) => d.severity === 'error');
    if (!result.model || errors.length > 0) return { diagnostics: errors };
    earlier = {
      model: result.model,
      analysis: analyze(result.model, { spans: result.spans }),
      fileName: file.fileName,
    };
  }
  if (!earlier) return { diagnostics: [] };
  return { diagnostics: [], view: compareView(earlier, { ...current, fileName: currentFileName }) };
}

function ranking(): RankingView {
  if (!current) throw new Error('no model is loaded');
  if (ranked?.of !== current) ranked = { of: current, view: rankingView(current.model, current.analysis) };
  return ranked.view;
}

function whatIf(question: WhatIf): WhatIfOutcome {
  if (!fromFile) throw new Error('no model is loaded');
  if (!isWhatIf(question)) {
    current = fromFile;
    return { summary: summariseSite(fromFile.model, fromFile.analysis), add: [], remove: [] };
  }
  const model = applyWhatIf(fromFile.model, question, isoDate(new Date()));
  current = { model, analysis: analyze(model) };
  return { summary: summariseSite(model, current.analysis), ...statementsToPaste(fromFile.model, model) };
}

const reply = (message: AnalysisReply) => self.postMessage(message);

function load(id: number, fileName: string, bytes: Uint8Array, parts: ServedParts | undefined): LoadOutcome {
  const partBytes = (parts ?? []).reduce((n, [, part]) => n + (part instanceof Uint8Array ? part.length : 0), 0);
  const files = parts?.length ? ` and ${parts.length} part file${parts.length === 1 ? '' : 's'}` : '';
  reply({ id, progress: `reading ${fileName}${files} (${Math.ceil((bytes.length + partBytes) / 1024)} kB)` });
  // Served parts are all the model can name: the server found them by the same reading of the same file.
  const result = loadModelText(fileName, bytes, servedPartReader(parts));
  const failed = result.diagnostics.some((d) => d.severity === 'error');
  // The file's lines are needed only to show the errors' excerpts.
  const source = failed ? result.source : { file: result.source.file, lines: [] };
  const base = { format: result.format, diagnostics: result.diagnostics, source };
  if (!result.model) return base;
  reply({
    id,
    progress: `analysing ${result.model.elements.length} elements, ${result.model.functions.length} functions, ${result.model.scenarios.length} scenarios`,
  });
  try {
    const analysis = analyze(result.model, { spans: result.spans });
    fromFile = { model: result.model, analysis };
    currentFileName = fileName;
    current = fromFile;
    return { ...base, summary: summariseSite(result.model, analysis) };
  } catch (e) {
    return { ...base, analysisError: e instanceof Error ? e.message : String(e) };
  }
}

self.onmessage = (ev: MessageEvent<AnalysisRequest>) => {
  const request = ev.data;
  try {
    if ('load' in request) {
      reply({
        id: request.id,
        loaded: load(request.id, request.load.fileName, request.load.bytes, request.load.parts),
      });
    } else if ('focus' in request) {
      if (!current) throw new Error('no model is loaded');
      reply({ id: request.id, view: focusView(current.model, current.analysis, request.focus ?? undefined) });
    } else if ('whatIf' in request) {
      reply({ id: request.id, whatIf: whatIf(request.whatIf) });
    } else if ('search' in request) {
      if (!current) throw new Error('no model is loaded');
      reply({ id: request.id, matches: searchTags(current.model, current.analysis, request.search) });
    } else if ('compare' in request) {
      reply({ id: request.id, compared: compare(request.compare) });
    } else if ('ranking' in request) {
      reply({ id: request.id, ranking: ranking() });
    } else if ('details' in request) {
      if (!current) throw new Error('no model is loaded');
      reply({ id: request.id, details: detailsOf(current.model, current.analysis, request.details) });
    }
  } catch (e) {
    reply({ id: request.id, error: e instanceof Error ? e.message : String(e) });
  }
};
