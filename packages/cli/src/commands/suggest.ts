// A "did you mean" tail for a tag given on the command line.
import type { Model } from '@bulkhead/core';
import { suggestTag } from '@bulkhead/core';

export function didYouMeanTag(tag: string, model: Model): string {
  const s = suggestTag(tag, [...model.elements.map((e) => e.tag), ...model.functions.map((f) => f.tag)]);
  return s ? `; did you mean \`${s}\`?` : '';
}
