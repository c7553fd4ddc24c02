// Turns zod's issues into our diagnostics: a stable code, a message in the user's own field names,
// and the span of the narrowest piece of source the issue's path reaches.
import type { z } from 'zod';
import { error, type Diagnostic, type Span } from '../diagnostics/diagnostic.ts';
import type { SpanMap } from '../bulk/to-model.ts';
import { didYouMean } from '../util/suggest.ts';

export type FieldNamer = (field: string) => string;

/** The span of the longest prefix of `path` that has one. */
export function spanAt(spans: SpanMap, path: readonly PropertyKey[]): Span | undefined {
  for (let n = path.length; n >= 0; n--) {
    const span = spans.get(path.slice(0, n).map(String).join('.'));
    if (span) return span;
  }
  return undefined;
}

function describeItem(path: readonly PropertyKey[]): string {
  const head = path[0];
  if (typeof head === 'string' && typeof path[1] === 'number') return `${head.replace(/s$/, '')} ${path[1] + 1}`;
  return String(head ?? 'model');
}

export function issueToDiagnostics(issue: z.core.$ZodIssue, spans: SpanMap, name: FieldNamer): Diagnostic[] {
  const path = issue.path;
  const last = path[path.length - 1];
  const field = typeof last === 'string' ? name(last) : describeItem(path);
  const span = spanAt(spans, path);
  switch (issue.code) {
    case 'invalid_type':
      if (issue.input === undefined) {
        return [error('BH200', `missing \`${field}\` in ${describeItem(path)}`, span, {
          help: typeof last === 'string' && ['tag', 'id', 'name', 'function', 'title', 'kind', 'finding'].includes(last)
            ? `give the ${last} right after the keyword`
            : `add ${field}=...`,
        })];
      }
      return [error('BH201', `\`${field}\` should be ${issue.expected === 'array' ? 'a list' : `a ${issue.expected}`}`, span)];
    case 'invalid_value': {
      const options = issue.values.map(String);
      const input = String((issue as { input?: unknown }).input ?? '');
      return [error('BH202', `\`${input}\` is not allowed for \`${field}\``, span, {
        help: didYouMean(input, options) ?? `use one of: ${options.join(', ')}`,
      })];
    }
    case 'unrecognized_keys':
      return issue.keys.map((key) => {
        const keyPath = [...path, key].map(String).join('.');
        return error('BH203', `unknown field \`${name(key)}\``, spans.get(`${keyPath}#key`) ?? span, {
          help: 'remove it, or check its spelling against `bulkhead schema`',
        });
      });
    case 'invalid_union': {
      const discriminator = (issue as { discriminator?: string }).discriminator;
      if (discriminator) {
        const options = ((issue as { options?: unknown[] }).options ?? []).map(String);
        return [error('BH202', `unknown ${describeItem(path).replace(/ \d+$/, '')} ${discriminator}`, span, {
          help: `use one of: ${options.join(', ')}`,
        })];
      }
      return [error('BH201', `\`${field}\` has the wrong shape`, span)];
    }
    default:
      return [error('BH201', `\`${field}\`: ${issue.message.toLowerCase()}`, span)];
  }
}
