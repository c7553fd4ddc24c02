// `bulkhead export FILE --tables DIR`: the model's elements, functions and scenarios as CSV tables in
// the importer's column words, so the plant can be edited in a spreadsheet and imported back.
import { existsSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { exportTables } from '@bulkhead/import';
import { printDiagnostics, readModel, UsageError, writeFileAtomic } from '../io.ts';

export function exportCommand(file: string, dir: string | undefined, force: boolean): number {
  if (!dir) throw new UsageError('export needs --tables DIR: the folder to write the CSV tables into');
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const tables = exportTables(result.model);
  mkdirSync(dir, { recursive: true });
  const existing = [...tables.keys()].filter((name) => existsSync(join(dir, name)));
  if (existing.length && !force)
    throw new UsageError(`\`${dir}\` already holds ${existing.join(', ')} (use --force to replace them)`);
  for (const [name, text] of tables) writeFileAtomic(join(dir, name), text);
  process.stdout.write(`${dir}: ${[...tables.keys()].join(', ')}\n`);
  return 0;
}
