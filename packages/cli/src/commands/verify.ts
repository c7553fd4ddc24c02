// `bulkhead verify FILE [SIF]`: each SIF's PFDavg and PFH from the failure data in the model, subsystem by
// subsystem, against its claim and the most demanding requirement of the scenarios that credit it.
import { analyze, renderVerificationsText, VERIFY_CAUTION, verifyModel, type SifVerification } from '@bulkhead/core';
import { didYouMeanTag } from './suggest.ts';
import { printDiagnostics, readModel, UsageError } from '../io.ts';

export const VERIFY_FORMATS = ['text', 'json'] as const;

/** A SIF passes when it is computed, and meets its claim and its requirement where it has them. */
function passes(v: SifVerification): boolean {
  if (v.pfd === undefined || v.findings.some((f) => f.code === 'incomplete' || f.code === 'hft-short')) return false;
  if (v.againstTargets?.some((t) => !t.meets)) return false;
  return v.againstClaim?.pfdMeets !== false && v.againstClaim?.pfhMeets !== false;
}

export function verifyCommand(file: string, sif: string | undefined, format = 'text'): number {
  if (!(VERIFY_FORMATS as readonly string[]).includes(format))
    throw new UsageError(`\`--format ${format}\` is not one of ${VERIFY_FORMATS.join(', ')}`);
  const result = readModel(file);
  if (!result.model) {
    printDiagnostics(result);
    return 2;
  }
  const model = result.model;
  if (sif !== undefined) {
    const fn = model.functions.find((f) => f.tag === sif);
    if (fn === undefined || fn.kind !== 'sif') {
      const what =
        fn === undefined
          ? `no SIF \`${sif}\` in ${file}${didYouMeanTag(sif, model)}`
          : `\`${sif}\` is a ${fn.kind} function, not a SIF`;
      process.stderr.write(`bulkhead: ${what}\n`);
      return 2;
    }
  }
  const verifications = verifyModel(model, sif, analyze(model, { spans: result.spans }));
  if (verifications.length === 0) {
    process.stdout.write(`${file}: the model has no SIF to verify\n`);
    return 0;
  }
  if (format === 'json')
    process.stdout.write(
      `${JSON.stringify({ bulkheadVerify: 1, caution: VERIFY_CAUTION, sifs: verifications }, null, 2)}\n`,
    );
  else process.stdout.write(renderVerificationsText(verifications));
  return verifications.every(passes) ? 0 : 1;
}
