// `bulkhead convert FILE --to json|bulk [-o OUT]`: converts between the two model forms without loss.
// The output is read back before it is written, so a conversion that would lose anything stops instead.
import { readFileSync } from 'node:fs';
import { printDiagnostics, printVerified, readModel, UsageError, writeFileAtomic } from '../io.ts';
import { checkOutput } from '../output.ts';

export function convertCommand(file: string, to: string | undefined, out: string | undefined, force = false): number {
  if (to !== 'json' && to !== 'bulk') {
    throw new UsageError(
      to === undefined ? 'convert needs --to json or --to bulk' : `convert --to takes json or bulk, not \`${to}\``,
    );
  }
  const what = `${to} model`;
  const unlike = 'holds something else';
  // The model itself is never a target, whatever the options: refused before anything is read.
  if (out) checkOutput(out, { inputs: [file], force: true, replaceable: () => true, what, unlike });
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const text = printVerified(result.model, to, file);
  // A model cannot be told from one the user wrote, so an existing file is replaced only with --force
  // or when it already holds exactly this text.
  if (out)
    checkOutput(out, { inputs: [file], force, replaceable: () => readFileSync(out, 'utf8') === text, what, unlike });
  if (out) writeFileAtomic(out, text);
  else process.stdout.write(text);
  // A split model comes out as one file: that is what was asked, but never done unsaid.
  if (result.parts?.length) {
    const count = `${result.parts.length} part file${result.parts.length === 1 ? '' : 's'}`;
    process.stderr.write(
      `bulkhead convert: note: ${file} names ${count} (${result.parts.join(', ')}); the ${to} model written holds them all in one file, with no \`part\` statement; the part files are not changed\n`,
    );
  }
  return 0;
}
