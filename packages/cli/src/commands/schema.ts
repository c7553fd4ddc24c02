// `bulkhead schema`: prints the model's JSON Schema, generated from the zod schema.
import { modelJsonSchema } from '@bulkhead/core';

export function schemaCommand(): number {
  process.stdout.write(JSON.stringify(modelJsonSchema(), null, 2) + '\n');
  return 0;
}
