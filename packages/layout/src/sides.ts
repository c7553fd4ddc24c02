// The sides of a focused scenario (the initiating cause and each claimed layer) and the style each
// one is drawn in: an Okabe-Ito colour AND a line style AND a letter, so colour is never the only cue.

/** How one side is drawn. `dash` is an SVG stroke-dasharray ('' for solid). */
export interface SideStyle {
  colour: string;
  dash: string;
  /** Name of the line style, said in the legend so a reader without colour can match lines. */
  lineName: string;
  /** Text colour on a mark filled with `colour` (contrast of at least 4.5:1). */
  ink: string;
}

/**
 * Okabe & Ito (2008), "Color Universal Design", the eight-colour palette for colour-blind readers.
 * Yellow (#F0E442) is left out: too faint as a line on white. Each entry also has its own dash.
 */
export const SIDE_STYLES: readonly SideStyle[] = [
  { colour: '#D55E00', dash: '', lineName: 'solid', ink: '#000000' },
  { colour: '#0072B2', dash: '9 4', lineName: 'dashed', ink: '#ffffff' },
  { colour: '#009E73', dash: '2 3', lineName: 'dotted', ink: '#000000' },
  { colour: '#CC79A7', dash: '10 3 2 3', lineName: 'dash-dot', ink: '#000000' },
  { colour: '#E69F00', dash: '16 5', lineName: 'long dash', ink: '#000000' },
  { colour: '#56B4E9', dash: '2 3 8 3', lineName: 'dot-dash', ink: '#000000' },
  { colour: '#000000', dash: '1 5', lineName: 'sparse dots', ink: '#ffffff' },
];

export function sideStyle(index: number): SideStyle {
  return SIDE_STYLES[index % SIDE_STYLES.length]!;
}

/** The short mark drawn on every element a side relies on: C for the cause, 1, 2... for layers. */
export function sideLetter(index: number): string {
  return index === 0 ? 'C' : String(index);
}
