// The proof of a finding as the viewer shows it: one chain of tags per party (the failing cause, a
// claimed layer) from the function to the element they share, and the statement that accepts it.
import type { Finding } from '@bulkhead/core';
import { sideStyle, type Side } from '@bulkhead/layout';

export interface ProofChain {
  /** "Cause LIC-101" or "Layer 1 SIF-101". */
  role: string;
  letter: string;
  side?: number;
  colour: string;
  ink: string;
  /** The function first, then each element it relies on, up to (not including) the meeting element. */
  tags: string[];
}

export interface Proof {
  chains: ProofChain[];
  /** The element every chain ends at; absent when the chains end at different elements (alike, not shared). */
  meeting?: string;
  through: string[];
}

function sideOf(party: Finding['parties'][number], sides: readonly Side[]): Side | undefined {
  return party.role === 'cause'
    ? sides.find((s) => s.role === 'cause')
    : sides.find((s) => s.role === 'layer' && s.tag === party.tag);
}

export function chainsOf(finding: Finding, sides: readonly Side[], through: readonly string[] = []): Proof {
  const ends = new Set(finding.paths.map((p) => p.at(-1)));
  const meeting =
    finding.element !== undefined && ends.size === 1 && ends.has(finding.element) ? finding.element : undefined;
  const chains = finding.paths.map((path, i): ProofChain => {
    const party = finding.parties[i];
    const side = party ? sideOf(party, sides) : undefined;
    const style = sideStyle(side?.index ?? 6);
    const role =
      party?.role === 'cause'
        ? `Cause ${party.tag ?? ''}`.trim()
        : `Layer ${side?.index ?? '?'} ${party?.tag ?? ''}`.trim();
    return {
      role,
      letter: side?.letter ?? '?',
      ...(side ? { side: side.index } : {}),
      colour: style.colour,
      ink: style.ink,
      tags: meeting ? path.slice(0, -1) : [...path],
    };
  });
  return { chains, ...(meeting ? { meeting } : {}), through: [...through] };
}

/**
 * The `accept` statement for a finding, as the .bulk language writes it (README, Justifications), dated
 * today; who accepts it and why are for the team to fill in.
 */
export function acceptStatement(key: string, today: Date): string {
  const date = `${today.getFullYear()}-${String(today.getMonth() + 1).padStart(2, '0')}-${String(today.getDate()).padStart(2, '0')}`;
  return `accept ${key} by="NAME" date=${date} reason="WHY THE TEAM ACCEPTS IT"`;
}
