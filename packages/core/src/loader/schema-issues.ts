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

/** The statement (or JSON item) a collection holds, in the words a user writes. */
const ITEM_NAMES: Record<string, string> = {
  categories: 'category',
  elements: 'element',
  functions: 'function',
  scenarios: 'scenario',
  rules: 'rule',
  justifications: 'accept',
  enablers: 'enabler',
  modifiers: 'modifier',
  layers: 'layer',
  comments: 'comment',
  endComments: 'comment',
};

/** The tag, id or function a user gave the item, when it has one: that is how they know it, not its place. */
function nameOf(item: unknown): string | undefined {
  if (typeof item !== 'object' || item === null) return undefined;
  for (const key of ['tag', 'id', 'function', 'finding']) {
    const value = (item as Record<string, unknown>)[key];
    if (typeof value === 'string' && value !== '') return value;
  }
  return undefined;
}

/**
 * "function `LIC-101`", "layer `SIF-1` of scenario `S-1`": the innermost item on the path and its parent,
 * by the name the user gave it; "element 3" only when the item has no name yet.
 */
function describeItem(path: readonly PropertyKey[], raw?: unknown): string {
  const parts: string[] = [];
  let at: unknown = raw;
  for (let i = 0; i < path.length; i++) {
    const key = path[i];
    const index = path[i + 1];
    const next =
      typeof at === 'object' && at !== null && Object.hasOwn(at, key as string)
        ? (at as Record<PropertyKey, unknown>)[key as string]
        : undefined;
    if (typeof key === 'string' && typeof index === 'number') {
      const item = Array.isArray(next) ? next[index] : undefined;
      const word = (Object.hasOwn(ITEM_NAMES, key) ? ITEM_NAMES[key] : undefined) ?? key;
      const name = nameOf(item);
      parts.unshift(name !== undefined ? `${word} \`${name}\`` : `${word} ${index + 1}`);
    }
    at = next;
  }
  if (parts.length) return parts.slice(0, 2).join(' of ');
  const head = path[0];
  return typeof head === 'string' ? head : 'the model';
}

function article(type: string): string {
  return type === 'array' ? 'a list' : `${/^[aeiou]/.test(type) ? 'an' : 'a'} ${type}`;
}

const POSITIONAL = ['tag', 'id', 'name', 'function', 'title', 'finding'];

/** `raw` is the input as read, so an item is named by its tag rather than its place in a list. */
export function issueToDiagnostics(
  issue: z.core.$ZodIssue,
  spans: SpanMap,
  name: FieldNamer,
  raw?: unknown,
): Diagnostic[] {
  const path = issue.path;
  const last = path[path.length - 1];
  const field = typeof last === 'string' ? name(last) : describeItem(path, raw);
  const span = spanAt(spans, path);
  const input = (issue as { input?: unknown }).input;
  // .bulk names fields in kebab case, JSON in camel case; the hints differ with the syntax.
  const isBulk = name('aB') === 'a-b';
  switch (issue.code) {
    case 'invalid_type': {
      const received = (issue as { received?: string }).received;
      if (issue.expected === 'number' && (received === 'Infinity' || received === 'NaN')) {
        return [
          error('BH305', `\`${field}\` is not a finite number`, span, {
            help: 'the value is too large to hold; write a number such as 1e-4 or 0.1',
          }),
        ];
      }
      if (input === undefined) {
        if (path.length === 1 && typeof last === 'string') {
          return [
            error('BH200', `the model has no \`${field}\``, span, {
              help: last === 'site' ? 'start the model with `site "Site name"`' : `add ${field}`,
            }),
          ];
        }
        return [
          error('BH200', `missing \`${field}\` in ${describeItem(path, raw)}`, span, {
            help:
              typeof last !== 'string'
                ? 'add the missing item'
                : !isBulk
                  ? `add "${last}": ...`
                  : POSITIONAL.includes(last)
                    ? `give the ${last} right after the keyword`
                    : `add ${field}=...`,
          }),
        ];
      }
      if (path.length === 0) {
        return [
          error(
            'BH201',
            `a JSON model is an object with \`site\`, \`elements\`, ...; found ${Array.isArray(input) ? 'a list' : input === null ? 'null' : `a ${typeof input}`}`,
            span,
            {
              help: 'run `bulkhead convert FILE.bulk --to json` to see the shape',
            },
          ),
        ];
      }
      const quotedNumber =
        issue.expected === 'number' &&
        typeof input === 'string' &&
        input.trim() !== '' &&
        Number.isFinite(Number(input));
      return [
        error(
          'BH201',
          `\`${field}\` should be ${article(issue.expected)}`,
          span,
          quotedNumber ? { help: 'write the number without quotes' } : {},
        ),
      ];
    }
    case 'invalid_value': {
      const options = issue.values.map(String);
      const given = String(input ?? '');
      return [
        error('BH202', `\`${given}\` is not allowed for \`${field}\``, span, {
          help: didYouMean(given, options) ?? `use one of: ${options.join(', ')}`,
        }),
      ];
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
        // zod puts the discriminator on the path; the item is the path without it.
        const itemPath = path[path.length - 1] === discriminator ? path.slice(0, -1) : path;
        const what = describeItem(itemPath, raw).replace(/ (\d+|`[^`]*`)( of .*)?$/, '');
        const options = ((issue as { options?: unknown[] }).options ?? []).map(String);
        const value =
          input && typeof input === 'object' ? (input as Record<string, unknown>)[discriminator] : undefined;
        if (value === undefined) {
          return [
            error('BH200', `missing \`${name(discriminator)}\` in ${describeItem(itemPath, raw)}`, span, {
              help: `say which ${what} this is: one of ${options.join(', ')}`,
            }),
          ];
        }
        return [
          error('BH202', `unknown ${what} ${discriminator} \`${String(value)}\``, span, {
            help: didYouMean(String(value), options) ?? `use one of: ${options.join(', ')}`,
          }),
        ];
      }
      return [error('BH201', `\`${field}\` has the wrong shape`, span)];
    }
    case 'too_small':
      if (issue.origin === 'array') {
        return [
          error('BH201', `\`${field}\` is an empty list`, span, {
            help: `leave \`${field}\` out instead of giving an empty list`,
          }),
        ];
      }
      return [error('BH201', `\`${field}\`: ${issue.message.toLowerCase()}`, span)];
    case 'invalid_format':
      return [
        error('BH201', `${describeItem(path, raw)} holds a line break or control character`, span, {
          help: 'a comment is one line of plain text; split it into several comments',
        }),
      ];
    default:
      return [error('BH201', `\`${field}\`: ${issue.message.toLowerCase()}`, span)];
  }
}
