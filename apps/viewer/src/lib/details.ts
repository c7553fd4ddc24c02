// What the details panel says about one clicked tag: for an element its kind, links and fail action;
// for a function its parts; for both, every function that relies on it and the scenarios they are in.
import { LINK_FIELDS, groupOf, type Analysis, type ElementKind, type Model } from '@bulkhead/core';
import { LINK_WORDS } from '@bulkhead/layout';

export interface Reliance {
  function: string;
  kind: string;
  title?: string;
  /** How the function reaches the tag. */
  path: string[];
  scenarios: { id: string; role: 'cause' | 'layer' }[];
}

export interface Details {
  tag: string;
  what: 'element' | 'function' | 'unknown';
  kind: string;
  title?: string;
  facts: { label: string; value: string }[];
  links: { words: string; targets: string[] }[];
  reliedOnBy: Reliance[];
}

const FAIL_GROUPS = new Set(['final', 'actuation']);

function scenariosOf(model: Model, fn: string): Reliance['scenarios'] {
  const out: Reliance['scenarios'] = [];
  for (const s of model.scenarios) {
    if (s.cause.function === fn) out.push({ id: s.id, role: 'cause' });
    if ((s.layers ?? []).some((l) => l.function === fn)) out.push({ id: s.id, role: 'layer' });
  }
  return out;
}

const SUPPLY_WORDS = {
  'from-signal': 'none of its own: powered over its signal link',
  mechanical: 'none: mechanical',
  'self-contained': 'none: self-contained',
} as const;

export function detailsOf(model: Model, analysis: Analysis, tag: string): Details {
  const reliedOnBy: Reliance[] = analysis.traces.flatMap((t) => {
    const hit = t.elements.find((e) => e.tag === tag);
    if (!hit) return [];
    const fn = model.functions.find((f) => f.tag === t.function);
    return [
      {
        function: t.function,
        kind: t.kind,
        path: hit.path,
        scenarios: scenariosOf(model, t.function),
        ...(fn?.title ? { title: fn.title } : {}),
      },
    ];
  });
  const element = model.elements.find((e) => e.tag === tag);
  if (element) {
    const group = groupOf(element.kind as ElementKind);
    const facts: Details['facts'] = [{ label: 'group', value: group }];
    if (FAIL_GROUPS.has(group)) {
      const failsTo = 'failsTo' in element ? element.failsTo : undefined;
      facts.push({
        label: 'fail action',
        value: failsTo ? `fails ${failsTo} on loss of power, signal or air` : 'not stated: taken as the worst case',
      });
    }
    if ('supply' in element && element.supply) facts.push({ label: 'supply', value: SUPPLY_WORDS[element.supply] });
    if ('system' in element) facts.push({ label: 'system', value: element.system });
    if ('variable' in element && element.variable) facts.push({ label: 'measures', value: element.variable });
    for (const field of ['make', 'model', 'technology'] as const) {
      const value = field in element ? (element as Record<string, unknown>)[field] : undefined;
      if (typeof value === 'string') facts.push({ label: field, value });
    }
    const links = LINK_FIELDS.flatMap((field) => {
      const targets = element[field];
      return targets && targets.length > 0 ? [{ words: LINK_WORDS[field] ?? field, targets: [...targets] }] : [];
    });
    return {
      tag,
      what: 'element',
      kind: element.kind,
      facts,
      links,
      reliedOnBy,
      ...(element.title ? { title: element.title } : {}),
    };
  }
  const fn = model.functions.find((f) => f.tag === tag);
  if (fn) {
    const facts: Details['facts'] = [];
    const links: Details['links'] = [];
    if ('sensors' in fn)
      links.push({
        words: `sensors${'sensorVoting' in fn && fn.sensorVoting ? ' (' + fn.sensorVoting + ')' : ''}`,
        targets: fn.sensors,
      });
    if ('solver' in fn) links.push({ words: 'logic solver', targets: [fn.solver] });
    if ('raisedIn' in fn) links.push({ words: 'alarm raised in', targets: [fn.raisedIn] });
    if ('console' in fn && fn.console) links.push({ words: 'console', targets: [fn.console] });
    if ('operator' in fn) links.push({ words: 'operator', targets: [fn.operator] });
    if ('finals' in fn && fn.finals)
      links.push({
        words: `final elements${'finalVoting' in fn && fn.finalVoting ? ' (' + fn.finalVoting + ')' : ''}`,
        targets: fn.finals,
      });
    if ('device' in fn) links.push({ words: 'device', targets: [fn.device] });
    if ('trip' in fn && fn.trip)
      facts.push({ label: 'trip action', value: `${fn.trip}${fn.tripMode ? ', ' + fn.tripMode + ' to trip' : ''}` });
    if ('sil' in fn && fn.sil !== undefined) facts.push({ label: 'SIL claimed', value: String(fn.sil) });
    if (fn.pfd !== undefined) facts.push({ label: 'PFD claimed', value: String(fn.pfd) });
    if ('minutes' in fn) facts.push({ label: 'time to respond', value: `${fn.minutes} min` });
    const trace = analysis.traces.find((t) => t.function === tag);
    if (trace) {
      facts.push({ label: 'relies on', value: `${trace.elements.length} elements` });
      if (trace.missing.length > 0) facts.push({ label: 'missing (unverified)', value: trace.missing.join(', ') });
    }
    const usedIn = scenariosOf(model, tag);
    return {
      tag,
      what: 'function',
      kind: fn.kind,
      facts,
      links,
      reliedOnBy: [
        { function: tag, kind: fn.kind, path: [tag], scenarios: usedIn, ...(fn.title ? { title: fn.title } : {}) },
      ],
      ...(fn.title ? { title: fn.title } : {}),
    };
  }
  return { tag, what: 'unknown', kind: 'unknown', facts: [], links: [], reliedOnBy };
}
