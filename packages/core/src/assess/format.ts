// How the assessment writes numbers in text: the figures (util/figures.ts), and the criterion's edge
// convention in words, so that every output states whether a figure may equal the target.
import type { Edge } from './numbers.ts';

export {
  formatFigure,
  formatFrequency,
  formatPerHour,
  formatProbability,
  formatRatio,
  formatScientific,
  gapParts,
  gapText,
  SIGNIFICANT_FIGURES,
} from '../util/figures.ts';

/** The criterion's edge convention as the outputs print it. */
export function edgeText(edge: Edge): string {
  return edge === 'below' ? 'must be strictly below' : 'may equal';
}

/** The relation a requirement holds under the edge convention: "<" for below, "<=" for at-most. */
export function edgeRelation(edge: Edge): '<' | '<=' {
  return edge === 'below' ? '<' : '<=';
}
