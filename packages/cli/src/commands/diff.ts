// `bulkhead diff OLD NEW` or `bulkhead diff FILE --git REV`: what a revision did to independence, as
// text (answer first), Markdown, JSON or SARIF (new findings only); `--fail-on worse` gates CI on it.
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { basename, dirname } from 'node:path';
import {
  analyze,
  diffRevisions,
  loadModelText,
  madeWorse,
  renderDiffMarkdown,
  renderDiffSarif,
  renderDiffText,
  type LoadResult,
} from '@bulkhead/core';
import { printDiagnostics, readModel, UsageError, type ReadResult } from '../io.ts';
import { cliVersion } from '../version.ts';

export const DIFF_FORMATS = ['text', 'md', 'json', 'sarif'] as const;

export interface DiffOptions {
  git?: string | undefined;
  format?: string | undefined;
  failOn?: string | undefined;
}

/** The file as it stands in git revision `rev`, read with `git show` from the file's own folder. */
function readAtRevision(file: string, rev: string): ReadResult {
  if (rev.startsWith('-')) throw new UsageError(`--git takes a revision; found \`${rev}\``);
  let bytes: Buffer;
  try {
    bytes = execFileSync('git', ['show', `${rev}:./${basename(file)}`], {
      cwd: dirname(file),
      stdio: ['ignore', 'pipe', 'pipe'],
      maxBuffer: 64 * 1024 * 1024,
    });
  } catch (e) {
    const said = String((e as { stderr?: Buffer }).stderr ?? '')
      .trim()
      .split('\n')[0];
    throw new UsageError(`cannot read \`${file}\` at git revision \`${rev}\`${said ? `: ${said}` : ''}`);
  }
  return { ...loadModelText(`${file}@${rev}`, bytes), bytes };
}

function loadedOrNull(result: LoadResult): boolean {
  if (result.model) return true;
  printDiagnostics(result);
  return false;
}

export function diffCommand(files: string[], options: DiffOptions): number {
  const format = options.format ?? 'text';
  if (!(DIFF_FORMATS as readonly string[]).includes(format))
    throw new UsageError(`--format takes ${DIFF_FORMATS.join(', ')}; found \`${format}\``);
  if (options.failOn !== undefined && options.failOn !== 'worse')
    throw new UsageError(`--fail-on takes \`worse\` for diff; found \`${options.failOn}\``);
  if (options.git !== undefined ? files.length !== 1 : files.length !== 2) {
    throw new UsageError(
      options.git !== undefined
        ? '`bulkhead diff FILE --git REV` takes one file'
        : '`bulkhead diff` needs two model files, OLD and NEW (or one file and --git REV)',
    );
  }
  const newFile = files[files.length - 1]!;
  const oldRead = options.git !== undefined ? readAtRevision(newFile, options.git) : readModel(files[0]!);
  const newRead = readModel(newFile);
  const oldOk = loadedOrNull(oldRead);
  const newOk = loadedOrNull(newRead);
  if (!oldOk || !newOk) return 2;
  const oldLabel = options.git !== undefined ? `${newFile}@${options.git}` : files[0]!;
  const newAnalysis = analyze(newRead.model!, { spans: newRead.spans });
  const diff = diffRevisions(
    { model: oldRead.model!, label: oldLabel },
    { model: newRead.model!, label: newFile, analysis: newAnalysis },
  );
  if (format === 'json') process.stdout.write(`${JSON.stringify(diff, null, 2)}\n`);
  else if (format === 'md') process.stdout.write(renderDiffMarkdown(diff));
  else if (format === 'text') process.stdout.write(renderDiffText(diff));
  else {
    const sha256 = createHash('sha256')
      .update(newRead.bytes ?? '')
      .digest('hex');
    process.stdout.write(
      renderDiffSarif(diff, {
        model: newRead.model!,
        analysis: newAnalysis,
        file: newFile,
        sha256,
        toolVersion: cliVersion(),
        spans: newRead.spans,
      }),
    );
  }
  if (options.failOn === 'worse' && madeWorse(diff)) {
    process.stderr.write(`${newFile}: the change made independence worse than ${oldLabel}\n`);
    return 1;
  }
  return 0;
}
