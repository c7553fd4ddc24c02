// The --fail-on gate shared by `check` and `report`: which unaccepted findings fail the run.
import { SEVERITIES, type Finding, type SeverityLevel } from '@bulkhead/core';
import { UsageError } from '../io.ts';

/** A severity named on the command line, refused with a usage error when it is not one. */
export function parseFailOn(level: string): SeverityLevel {
  if (!(SEVERITIES as readonly string[]).includes(level)) throw new UsageError(`--fail-on takes ${SEVERITIES.join(', ')}; found \`${level}\``);
  return level as SeverityLevel;
}

/** Findings that fail the run: unaccepted, and at least as severe as the threshold. */
export function failingFindings(findings: readonly Finding[], failOn: SeverityLevel): Finding[] {
  const rank = (s: SeverityLevel) => SEVERITIES.indexOf(s);
  return findings.filter((f) => f.accepted === undefined && rank(f.severity) <= rank(failOn));
}
