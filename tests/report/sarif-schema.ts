// Validates SARIF logs against the published SARIF 2.1.0 JSON Schema (fixtures/sarif, source noted there)
// with plain ajv. The file is draft-04; see fixtures/sarif/README.md for why draft-07 reads it the same.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import Ajv, { type ErrorObject } from 'ajv';

export const SARIF_SCHEMA_FILE = fileURLToPath(new URL('../../fixtures/sarif/sarif-2.1.0-rtm.5.json', import.meta.url));

const RFC3339 = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?(Z|[+-]\d{2}:\d{2})$/i;

function parsesAsUrl(text: string, base?: string): boolean {
  try {
    new URL(text, base);
    return true;
  } catch {
    return false;
  }
}

export function sarifValidator(): (log: unknown) => ErrorObject[] {
  const schema = JSON.parse(readFileSync(SARIF_SCHEMA_FILE, 'utf8')) as Record<string, unknown>;
  const { $schema: _draft, id, ...rest } = schema;
  // unicodeRegExp off: the schema's `language` pattern holds a stray `]`, a literal in plain ECMA-262
  // regular expressions but an error under the `u` flag that ajv uses by default.
  const ajv = new Ajv({ allErrors: true, strict: false, unicodeRegExp: false });
  ajv.addFormat('uri', (s: string) => /^[A-Za-z][A-Za-z0-9+.-]*:/.test(s) && parsesAsUrl(s));
  ajv.addFormat('uri-reference', (s: string) => !/\s/.test(s) && parsesAsUrl(s, 'http://base.invalid/'));
  ajv.addFormat('date-time', (s: string) => RFC3339.test(s));
  const validate = ajv.compile({ ...rest, $id: String(id) });
  return (log) => (validate(log) ? [] : [...(validate.errors ?? [])]);
}
