// `bulkhead trace FILE TAG`: what one function (or element) relies on, as a tree in which each element
// hangs under the element that first brings it in, so every line reads as a path from the top.
import { kebab, Tracer, type EdgeRole, type FunctionTrace, type Model, type TracedElement } from '@bulkhead/core';
import { didYouMeanTag } from './suggest.ts';
import { printDiagnostics, readModel, UsageError } from '../io.ts';

const ROLE_WORDS: Partial<Record<EdgeRole, string>> = { raisedIn: 'raised in', final: 'final element' };

function roleWord(role: EdgeRole): string {
  return ROLE_WORDS[role] ?? kebab(role);
}

export function renderTree(start: string, elements: readonly TracedElement[], model: Model): string[] {
  const children = new Map<string, TracedElement[]>();
  for (const e of elements) {
    if (e.tag === start) continue;
    const parent = e.path[e.path.length - 2]!;
    (children.get(parent) ?? children.set(parent, []).get(parent)!).push(e);
  }
  const titles = new Map<string, string | undefined>(
    [...model.elements, ...model.functions].map((x) => [x.tag, x.title]),
  );
  const lines: string[] = [];
  const walk = (tag: string, prefix: string) => {
    const kids = children.get(tag) ?? [];
    kids.forEach((child, i) => {
      const last = i === kids.length - 1;
      const title = titles.get(child.tag);
      const stop = child.group === 'equipment' ? ' [process equipment: not traced further]' : '';
      lines.push(
        `${prefix}${last ? '└─' : '├─'} ${roleWord(child.links[child.links.length - 1]!)} ${child.tag} (${child.kind})${title ? ` ${title}` : ''}${stop}`,
      );
      walk(child.tag, prefix + (last ? '   ' : '│  '));
    });
  };
  walk(start, '');
  return lines;
}

function summary(trace: FunctionTrace): string[] {
  const out = [`${trace.elements.length} elements relied on`];
  for (const c of trace.channels) out.push(`${c.role} channel ${c.head}: ${c.elements.join(', ')}`);
  if (trace.missing.length)
    out.push(`incomplete: the model gives no ${trace.missing.join(', ')}; independence cannot be verified`);
  return out;
}

export function traceCommand(file: string, tag: string | undefined): number {
  if (tag === undefined) throw new UsageError('`bulkhead trace` needs a model file and a function or element tag');
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const model = result.model;
  const tracer = Tracer.ofModel(model);
  const fn = model.functions.find((f) => f.tag === tag);
  const element = model.elements.find((e) => e.tag === tag);
  if (!fn && !element) {
    process.stderr.write(`bulkhead: no function or element \`${tag}\` in ${file}${didYouMeanTag(tag, model)}\n`);
    return 2;
  }
  const head = fn
    ? `${tag} (${fn.kind})${fn.title ? ` ${fn.title}` : ''}`
    : `${tag} (${element!.kind})${element!.title ? ` ${element!.title}` : ''}`;
  const elements = fn ? tracer.traceFunction(tag).elements : tracer.paths(tag);
  const lines = [head, ...renderTree(tag, elements, model), ''];
  if (fn) lines.push(...summary(tracer.traceFunction(tag)).map((l) => `  ${l}`), '');
  const users = model.functions
    .filter((f) => f.tag !== tag && tracer.traceFunction(f.tag).elements.some((e) => e.tag === tag))
    .map((f) => f.tag);
  if (element) lines.push(`  functions that rely on ${tag}: ${users.length ? users.join(', ') : 'none'}`, '');
  process.stdout.write(lines.join('\n'));
  return 0;
}
