// `bulkhead convert FILE --to json|bulk [-o OUT]`: converts between the two model forms without loss.
// The output is read back before it is written, so a conversion that would lose anything stops instead.
import { printDiagnostics, printVerified, readModel, UsageError, writeFileAtomic } from '../io.ts';

export function convertCommand(file: string, to: string | undefined, out: string | undefined): number {
  if (to !== 'json' && to !== 'bulk') {
    throw new UsageError(to === undefined ? 'convert needs --to json or --to bulk' : `convert --to takes json or bulk, not \`${to}\``);
  }
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const text = printVerified(result.model, to, file);
  if (out) writeFileAtomic(out, text);
  else process.stdout.write(text);
  return 0;
}
