// `bulkhead import TABLE... -o PART.bulk [--model MAIN.bulk] [--mapping FILE] [--report] [--partial]`:
// plant data from CSV and XLSX tables into a generated .bulk part file. Bad rows are reported at
// file, sheet, row and column, and nothing is written (exit 2) unless --partial asks for the rest.
// Writing over an earlier generated file is a revision: what was added, removed or changed is listed.
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { dirname, extname } from 'node:path';
import { loadModelText, normalPath } from '@bulkhead/core';
import {
  defaultHeaderMap,
  GENERATED_MARK,
  importTables,
  readCsvTable,
  readDexpi,
  type DexpiResult,
  readMapping,
  readXlsxTables,
  renderIssue,
  renderReport,
  revisionChanges,
  staleJustifications,
  type ImportIssue,
  type Table,
} from '@bulkhead/import';
import { readPartFile, UsageError, writeFileAtomic } from '../io.ts';

export interface ImportCommandOptions {
  out?: string | undefined;
  model?: string | undefined;
  mapping?: string | undefined;
  report: boolean;
  partial: boolean;
  force: boolean;
}

function readBytes(file: string, issues: ImportIssue[]): Uint8Array | undefined {
  const got = readPartFile(file);
  if (got instanceof Uint8Array) return got;
  issues.push({
    code: 'BH500',
    severity: 'error',
    message: `cannot read \`${file}\`: ${got.problem}`,
    place: { file },
    help: 'check the path',
  });
  return undefined;
}

async function readTables(
  files: string[],
  issues: ImportIssue[],
  pids: { file: string; result: DexpiResult }[],
): Promise<Table[]> {
  const tables: Table[] = [];
  for (const file of files) {
    const bytes = readBytes(file, issues);
    if (!bytes) continue;
    const ext = extname(file).toLowerCase();
    if (ext === '.xml') {
      const result = readDexpi(file, Buffer.from(bytes).toString('utf8'), issues);
      if (result) pids.push({ file, result });
    } else if (ext === '.xlsx') tables.push(...(await readXlsxTables(file, bytes, issues)));
    else if (ext === '.csv' || ext === '.txt') {
      const table = readCsvTable(file, Buffer.from(bytes).toString('utf8'), issues);
      if (table) tables.push(table);
    } else throw new UsageError(`\`${file}\`: import reads .csv and .xlsx tables and DEXPI .xml P&IDs`);
  }
  return tables;
}

/** A progress line on a terminal once the import has run for a second; nothing when piped. */
function progressLine(): { tick: (stage: string, rows: number) => void; done: () => void } {
  const start = Date.now();
  let shown = false;
  const tty = process.stderr.isTTY === true;
  return {
    tick: (stage, rows) => {
      if (!tty || Date.now() - start < 1000) return;
      shown = true;
      process.stderr.write(`\r\x1b[Kimporting: ${rows} rows read; ${stage}...`);
    },
    done: () => {
      if (shown) process.stderr.write('\r\x1b[K');
    },
  };
}

export async function importCommand(files: string[], options: ImportCommandOptions): Promise<number> {
  const out = options.out;
  if (!out) throw new UsageError('import needs -o PART.bulk: the generated file the model names with `part`');
  if (!/\.bulk$/i.test(out)) throw new UsageError('import writes a .bulk part file: give -o a name ending in .bulk');
  const before = existsSync(out) ? readFileSync(out, 'utf8') : undefined;
  if (before !== undefined && !before.startsWith(GENERATED_MARK) && !options.force) {
    throw new UsageError(
      `\`${out}\` was not written by \`bulkhead import\`; it may hold hand-written statements (use --force to replace it)`,
    );
  }
  const issues: ImportIssue[] = [];
  const progress = progressLine();
  const map = options.mapping
    ? readMapping(options.mapping, readFileSync(options.mapping, 'utf8'), issues)
    : defaultHeaderMap();
  const pids: { file: string; result: DexpiResult }[] = [];
  const tables = await readTables(files, issues, pids);
  const model = options.model
    ? { file: options.model, text: readFileSync(options.model, 'utf8'), readPart: readPartFile }
    : undefined;
  const result = importTables(
    tables,
    map,
    {
      generatedPath: normalPath(out),
      ...(model ? { model } : {}),
      partial: options.partial,
      progress: progress.tick,
      pids,
    },
    issues,
  );
  progress.done();
  for (const i of result.issues) process.stderr.write(renderIssue(i) + '\n\n');
  for (const p of result.modelProblems) process.stderr.write(p + '\n\n');
  if (options.report) process.stdout.write(renderReport(result.tallies, result.suggestedKinds));
  if (result.onlyIn) {
    process.stdout.write(
      `instruments, valves and loops only in the P&ID (${result.onlyIn.pid.length}): ${result.onlyIn.pid.join(', ') || '-'}\n`,
    );
    process.stdout.write(
      `instruments, valves and loops only in the tables (${result.onlyIn.tables.length}): ${result.onlyIn.tables.join(', ') || '-'}\n`,
    );
  }
  const errors = result.issues.filter((i) => i.severity === 'error').length + result.modelProblems.length;
  if (result.text === undefined) {
    process.stderr.write(
      `${errors} error${errors === 1 ? '' : 's'}; nothing was written (--partial writes the rows without errors)\n`,
    );
    return 2;
  }
  if (!model)
    process.stderr.write(
      'note: references between tables and to hand-written statements are checked only with --model MAIN.bulk\n',
    );
  mkdirSync(dirname(out), { recursive: true });
  writeFileAtomic(out, result.text);
  const sources = [
    `${tables.length} table${tables.length === 1 ? '' : 's'}`,
    ...(pids.length ? [`${pids.length} P&ID${pids.length === 1 ? '' : 's'}`] : []),
  ];
  process.stdout.write(`${out}: ${result.statements} statements from ${sources.join(' and ')}\n`);
  if (result.leftOut.length) process.stdout.write(`left out for errors (--partial): ${result.leftOut.join(', ')}\n`);
  if (before !== undefined) {
    const changes = revisionChanges(before, result.text);
    const list = (what: string, tags: string[]) =>
      process.stdout.write(`${what} (${tags.length}): ${tags.length ? tags.join(', ') : '-'}\n`);
    list('added', changes.added);
    list('removed', changes.removed);
    list('changed', changes.changed);
    if (model) {
      const loaded = loadModelText(model.file, model.text, { readPart: readPartFile });
      const stale = staleJustifications(loaded.model?.justifications ?? [], changes);
      for (const j of stale)
        process.stdout.write(`accept ${j.finding}: names an element that changed or went; review it\n`);
    }
  }
  return errors > 0 ? 2 : 0;
}
