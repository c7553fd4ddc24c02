// The --fail-on gate shared by `check` and `report`, the one exit-code rule of both: exit 1 when an
// unaccepted finding is at or above the level (default voids-credit, the conservative CI gate), 0 otherwise;
// `--fail-on none` never fails on findings. Bad input or usage is exit 2 whatever the level.
import { SEVERITIES, type Finding, type SeverityLevel } from '@bulkhead/core';
import { UsageError } from '../io.ts';

/** Without --fail-on, a voided credit fails the run. */
export const DEFAULT_FAIL_ON: SeverityLevel = 'voids-credit';
export const FAIL_ON_WORDS = [...SEVERITIES, 'none'] as const;

/** A severity named on the command line (or `none`), refused with a usage error when it is not one. */
export function parseFailOn(level: string): SeverityLevel | 'none' {
  if (!(FAIL_ON_WORDS as readonly string[]).includes(level))
    throw new UsageError(`--fail-on takes ${FAIL_ON_WORDS.join(', ')}; found \`${level}\``);
  return level as SeverityLevel | 'none';
}

/** Findings that fail the run: unaccepted, and at least as severe as the threshold. */
export function failingFindings(findings: readonly Finding[], failOn: SeverityLevel | 'none'): Finding[] {
  if (failOn === 'none') return [];
  const rank = (s: SeverityLevel) => SEVERITIES.indexOf(s);
  return findings.filter((f) => f.accepted === undefined && rank(f.severity) <= rank(failOn));
}

/**
 * Parses the option before any work (a bad level is a usage error, exit 2) and returns the gate: it says on
 * standard error why the run fails, and gives the exit code.
 */
export function gateFindings(
  option: string | undefined,
  written?: string,
): (file: string, findings: readonly Finding[]) => number {
  const level = option === undefined ? DEFAULT_FAIL_ON : parseFailOn(option);
  return (file, findings) => {
    const failing = failingFindings(findings, level);
    if (failing.length === 0) return 0;
    const count = `${failing.length} unaccepted finding${failing.length === 1 ? '' : 's'}`;
    process.stderr.write(
      `${file}: ${count} at or above ${level}${option === undefined ? ' (the default --fail-on)' : ''}${written ? `; report written to ${written}` : ''}\n`,
    );
    return 1;
  };
}
