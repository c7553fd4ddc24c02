// `bulkhead report FILE --format md|html|csv|json|sarif [-o OUT] [--date YYYY-MM-DD] [--fail-on LEVEL]`:
// writes the evidence list; exits 1 when an unaccepted finding is at or above --fail-on (CI gate).
import { createHash } from 'node:crypto';
import { basename, dirname, relative, sep } from 'node:path';
import {
  analyze,
  modelContentHash,
  FORMATS_OF,
  isReportContents,
  isReportFormat,
  REPORT_CONTENTS,
  renderReport,
  reportJsonSchema,
  REPORT_FORMATS,
} from '@bulkhead/core';
import { printDiagnostics, readModel, UsageError, writeFileAtomic } from '../io.ts';
import { gateFindings } from './fail-on.ts';
import { cliVersion } from '../version.ts';
import { checkOutput, isReportText } from '../output.ts';

export interface ReportOptions {
  format?: string | undefined;
  out?: string | undefined;
  date?: string | undefined;
  failOn?: string | undefined;
  jsonSchema?: boolean;
  /** Replace an existing -o file that Bulkhead did not write. */
  force?: boolean;
  /** evidence (default), worksheet or actions. */
  contents?: string | undefined;
  /** Document control: each replaces the model's own. */
  document?: string | undefined;
  revision?: string | undefined;
  status?: string | undefined;
}

/** A real calendar date in YYYY-MM-DD: 2025-02-30 is refused, not rolled over to March. */
function checkDate(date: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const day = m ? new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3]))) : undefined;
  if (!day || Number.isNaN(day.getTime()) || day.toISOString().slice(0, 10) !== date) {
    throw new UsageError(`--date \`${date}\` is not a date in the form YYYY-MM-DD`);
  }
  return date;
}

export async function reportCommand(file: string | undefined, options: ReportOptions): Promise<number> {
  if (options.jsonSchema) {
    process.stdout.write(`${JSON.stringify(reportJsonSchema(), null, 2)}\n`);
    return 0;
  }
  if (file === undefined) throw new UsageError('`bulkhead report` needs a model file');
  const format = options.format;
  if (format === undefined) throw new UsageError(`\`bulkhead report\` needs --format ${REPORT_FORMATS.join('|')}`);
  if (!isReportFormat(format)) throw new UsageError(`--format takes ${REPORT_FORMATS.join(', ')}; found \`${format}\``);
  const contents = options.contents ?? 'evidence';
  if (!isReportContents(contents))
    throw new UsageError(`--contents takes ${REPORT_CONTENTS.join(', ')}; found \`${contents}\``);
  if (!FORMATS_OF[contents].includes(format)) {
    throw new UsageError(`the ${contents} report comes as ${FORMATS_OF[contents].join(', ')}, not \`${format}\``);
  }
  for (const [name, value] of [
    ['document', options.document],
    ['revision', options.revision],
    ['status', options.status],
  ] as const) {
    if (value !== undefined && value.trim() === '') throw new UsageError(`--${name} needs a value`);
  }
  const date = options.date === undefined ? undefined : checkDate(options.date);
  const gate = gateFindings(options.failOn, options.out);
  if (options.out)
    checkOutput(options.out, {
      inputs: [file],
      force: options.force ?? false,
      replaceable: isReportText,
      what: 'report',
      unlike: 'is not a Bulkhead report',
    });
  const result = readModel(file);
  if (!result.model || !result.bytes) {
    printDiagnostics(result);
    return 2;
  }
  const analysis = analyze(result.model, { spans: result.spans });
  // The hash the viewer's title block shows too: parts named by their path from the model file's folder.
  const content = result.partBytes
    ? await modelContentHash(
        { name: basename(file), bytes: result.bytes },
        [...result.partBytes].map(([part, bytes]) => ({
          name: relative(dirname(file), part).split(sep).join('/'),
          bytes,
        })),
      )
    : undefined;
  const text = renderReport(
    {
      model: result.model,
      analysis,
      file,
      sha256: createHash('sha256').update(result.bytes).digest('hex'),
      ...(result.partBytes
        ? {
            parts: [...result.partBytes].map(([part, bytes]) => ({
              file: part,
              sha256: createHash('sha256').update(bytes).digest('hex'),
            })),
          }
        : {}),
      ...(content ? { contentSha256: content.sha256 } : {}),
      toolVersion: cliVersion(),
      ...(date ? { date } : {}),
      spans: result.spans,
      control: {
        ...(options.document !== undefined ? { document: options.document } : {}),
        ...(options.revision !== undefined ? { revision: options.revision } : {}),
        ...(options.status !== undefined ? { status: options.status } : {}),
      },
    },
    format,
    contents,
  );
  if (options.out) writeFileAtomic(options.out, text);
  else process.stdout.write(text);
  return gate(file, analysis.findings);
}
