// `bulkhead view FILE [--port N] [--compare OLD]`: serves the built viewer for one model file on 127.0.0.1
// and pushes every save to the page; with --compare the page opens comparing FILE with the earlier
// revision OLD, which is served and followed too. Builds nothing at run time: without apps/viewer/dist it
// says how.
import { statSync } from 'node:fs';
import { resolve } from 'node:path';
import { analyze, diffRevisions, loadModelText, renderDiffText, type Model } from '@bulkhead/core';
import { printDiagnostics, readModel, readPartFile, UsageError } from '../io.ts';
import { renderCheck } from './check-render.ts';
import { hasBuiltViewer } from '../view/assets.ts';
import { startViewServer, type FileState } from '../view/server.ts';
import { repositoryPath } from '../package-root.ts';

export const DEFAULT_PORT = 4780;
export const VIEWER_DIST = repositoryPath('apps/viewer/dist/');

export function parsePort(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  if (!/^\d{1,5}$/.test(text) || Number(text) > 65535)
    throw new UsageError(`--port takes a number from 0 to 65535 (0: any free port); found \`${text}\``);
  return Number(text);
}

function describe(file: string, state: FileState, keeps = 'the last good view'): string {
  if ('missing' in state) return `${state.missing}; the page says so and keeps ${keeps}`;
  let result;
  try {
    result = loadModelText(file, Buffer.from(state.text, 'latin1'), { readPart: readPartFile });
  } catch (e) {
    return `could not be checked here (${(e as Error).message}); see the page`;
  }
  const errors = result.diagnostics.filter((d) => d.severity === 'error');
  if (errors.length === 0) return 'loads cleanly';
  const first = errors[0]!.span;
  return `${errors.length} error${errors.length === 1 ? '' : 's'}${first ? `, first at ${first.file ?? file}:${first.line}:${first.column}` : ''}; the page keeps ${keeps}`;
}

/** The part files a save touched, when it was not the model file alone, named before the model's verdict. */
function savedFiles(file: string, changed: string[]): string {
  return changed.length === 1 && changed[0] === file ? '' : `${changed.join(', ')}; `;
}

/**
 * The earlier revision must load when the command starts, as every command's input must: its errors are
 * printed with file, line, column and code, and the command stops. A later save that breaks it only
 * shows in the page.
 */
function readEarlier(compare: string, file: string): Model | undefined {
  const earlier = readModel(compare);
  if (earlier.model && !earlier.diagnostics.some((d) => d.severity === 'error')) {
    if (resolve(compare) === resolve(file))
      process.stderr.write(`bulkhead view: --compare names the model file itself; nothing will differ\n`);
    return earlier.model;
  }
  process.stderr.write(`bulkhead view: the earlier revision \`${compare}\` (--compare) does not load:\n`);
  printDiagnostics(earlier);
  return undefined;
}

export function viewCommand(
  file: string,
  portText: string | undefined,
  distDir = VIEWER_DIST,
  compare?: string,
): number {
  const asked = parsePort(portText);
  if (compare !== undefined && compare.trim() === '') throw new UsageError('--compare needs an earlier model file');
  try {
    if (!statSync(file).isFile()) throw new Error('not a file');
  } catch {
    process.stderr.write(`bulkhead view: cannot read \`${file}\`: no such file\n`);
    return 2;
  }
  const earlier = compare !== undefined ? readEarlier(compare, file) : undefined;
  if (compare !== undefined && !earlier) return 2;
  if (!hasBuiltViewer(distDir)) {
    process.stderr.write(
      `bulkhead view: the viewer is not built (no ${distDir}index.html).\n` +
        'Build it once with:\n  npm run build -w @bulkhead/viewer\nthen run this command again.\n',
    );
    return 2;
  }
  // The terminal gets the same analysis as `bulkhead check`, so the URL comes with the verdicts.
  const initial = readModel(file);
  if (initial.model) {
    const analysis = analyze(initial.model, { spans: initial.spans });
    process.stdout.write(renderCheck({ ...initial, model: initial.model }, analysis) + '\n');
    // And with --compare, the headline of `bulkhead diff OLD FILE`.
    if (earlier && compare !== undefined) {
      const diff = diffRevisions({ model: earlier, label: compare }, { model: initial.model, label: file, analysis });
      process.stdout.write(`since ${compare}: ${renderDiffText(diff).split('\n')[0]}\n`);
    }
  } else printDiagnostics(initial);
  const start = (port: number, fallback: boolean): void => {
    startViewServer({
      file,
      ...(compare !== undefined ? { compare } : {}),
      distDir,
      port,
      onChange: (state, changed, kind) => {
        const which = kind === 'model' ? file : compare!;
        const role = kind === 'model' ? '' : ' (the earlier revision compared with)';
        process.stdout.write(
          `${new Date().toLocaleTimeString()} ${'text' in state ? 'saved' : 'changed'}: ${savedFiles(which, changed)}${which}${role} ${describe(which, state, kind === 'model' ? undefined : 'the last comparison')}\n`,
        );
      },
    }).then(
      (server) => {
        const against = compare !== undefined ? `\n  compared with the earlier revision ${compare}` : '';
        process.stdout.write(
          `bulkhead view: ${file}${against}\n  open ${server.url}\n  the page follows every save; Ctrl+C stops\n`,
        );
        const stop = () => void server.close().then(() => process.exit(0));
        process.once('SIGINT', stop);
        process.once('SIGTERM', stop);
      },
      (e: NodeJS.ErrnoException) => {
        if (e.code === 'EADDRINUSE' && fallback) return start(0, false);
        process.stderr.write(
          `bulkhead view: cannot listen on 127.0.0.1:${port}: ${e.code ?? e.message}${e.code === 'EADDRINUSE' ? ' (choose another with --port N, or --port 0 for any free port)' : ''}\n`,
        );
        process.exit(2);
      },
    );
  };
  start(asked ?? DEFAULT_PORT, asked === undefined);
  return 0;
}
