// `bulkhead report FILE --format md|html|csv|json|sarif [-o OUT] [--date YYYY-MM-DD] [--fail-on LEVEL]`:
// writes the evidence list; exits 1 when an unaccepted finding is at or above --fail-on (CI gate).
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import {
  analyze,
  isReportFormat,
  renderReport,
  reportJsonSchema,
  REPORT_FORMATS,
  SEVERITIES,
  type Finding,
  type SeverityLevel,
} from '@bulkhead/core';
import { printDiagnostics, readModel, UsageError, writeFileAtomic } from '../io.ts';
import { CLI_PACKAGE_ROOT } from '../package-root.ts';

export interface ReportOptions {
  format?: string;
  out?: string;
  date?: string;
  failOn?: string;
  jsonSchema?: boolean;
}

/** Without --fail-on, a voided credit fails the run: the conservative default for a CI gate. */
export const DEFAULT_FAIL_ON: SeverityLevel = 'voids-credit';

function toolVersion(): string {
  const pkg = JSON.parse(readFileSync(new URL('package.json', CLI_PACKAGE_ROOT), 'utf8')) as { version: string };
  return pkg.version;
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

function checkFailOn(level: string | undefined): SeverityLevel {
  if (level === undefined) return DEFAULT_FAIL_ON;
  if (!(SEVERITIES as readonly string[]).includes(level)) throw new UsageError(`--fail-on takes ${SEVERITIES.join(', ')}; found \`${level}\``);
  return level as SeverityLevel;
}

/** Findings that fail the run: unaccepted, and at least as severe as the threshold. */
export function failingFindings(findings: readonly Finding[], failOn: SeverityLevel): Finding[] {
  const rank = (s: SeverityLevel) => SEVERITIES.indexOf(s);
  return findings.filter((f) => f.accepted === undefined && rank(f.severity) <= rank(failOn));
}

export function reportCommand(file: string | undefined, options: ReportOptions): number {
  if (options.jsonSchema) {
    process.stdout.write(`${JSON.stringify(reportJsonSchema(), null, 2)}\n`);
    return 0;
  }
  if (file === undefined) throw new UsageError('`bulkhead report` needs a model file');
  const format = options.format;
  if (format === undefined) throw new UsageError(`\`bulkhead report\` needs --format ${REPORT_FORMATS.join('|')}`);
  if (!isReportFormat(format)) throw new UsageError(`--format takes ${REPORT_FORMATS.join(', ')}; found \`${format}\``);
  const date = options.date === undefined ? undefined : checkDate(options.date);
  const failOn = checkFailOn(options.failOn);
  const result = readModel(file);
  if (!result.model || !result.bytes) {
    printDiagnostics(result);
    return 2;
  }
  const analysis = analyze(result.model, { spans: result.spans });
  const text = renderReport(
    {
      model: result.model,
      analysis,
      file,
      sha256: createHash('sha256').update(result.bytes).digest('hex'),
      toolVersion: toolVersion(),
      ...(date ? { date } : {}),
      spans: result.spans,
    },
    format,
  );
  if (options.out) writeFileAtomic(options.out, text);
  else process.stdout.write(text);
  const failing = failingFindings(analysis.findings, failOn);
  if (failing.length > 0) {
    process.stderr.write(
      `${file}: ${failing.length} unaccepted finding${failing.length === 1 ? '' : 's'} at or above ${failOn}${options.out ? `; report written to ${options.out}` : ''}\n`,
    );
    return 1;
  }
  return 0;
}
