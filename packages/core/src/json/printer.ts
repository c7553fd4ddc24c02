// Canonical JSON for a model: two-space indent, fields in schema order, a final newline.
// Fields are put in schema order by the schema itself, so a model built in code prints like a loaded one.
import { Model } from '../model/schema.ts';

export function printJson(model: Model): string {
  return JSON.stringify(Model.parse(model), null, 2) + '\n';
}
