// Canonical JSON for a model: two-space indent, fields in schema order, a final newline.
import type { Model } from '../model/schema.ts';

export function printJson(model: Model): string {
  return JSON.stringify(model, null, 2) + '\n';
}
