// Message builders shared by the shared-element rules, so every finding reads the same way.
import type { Element, SeverityLevel } from '../../model/schema.ts';
import { describeSide, type PairContext } from '../define.ts';

export function sharedMessage(what: string) {
  return (element: Element, pair: PairContext, severity: SeverityLevel): string => {
    const verdict = severity === 'voids-credit' ? 'not independent' : severity === 'note' ? 'shared' : 'possibly not independent';
    return `${describeSide(pair.b)} and ${describeSide(pair.a)} both rely on ${what} \`${element.tag}\` (${element.kind}): ${verdict}`;
  };
}
