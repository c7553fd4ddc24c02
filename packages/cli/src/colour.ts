// Terminal colour for the text commands: only when standard output is a terminal, never under NO_COLOR
// (https://no-color.org: any non-empty value), TERM=dumb or a pipe. Colour only repeats what the words say.
export interface Paint {
  good(text: string): string;
  bad(text: string): string;
  warn(text: string): string;
  strong(text: string): string;
  dim(text: string): string;
}

const sgr = (open: number, close: number) => (text: string) => `\u001b[${open}m${text}\u001b[${close}m`;

export const COLOUR: Paint = {
  good: sgr(32, 39),
  bad: (t) => sgr(1, 22)(sgr(31, 39)(t)),
  warn: sgr(33, 39),
  strong: sgr(1, 22),
  dim: sgr(2, 22),
};
const same = (text: string) => text;
export const PLAIN: Paint = { good: same, bad: same, warn: same, strong: same, dim: same };

export function wantsColour(stream: { isTTY?: boolean }, env: NodeJS.ProcessEnv): boolean {
  if (env.NO_COLOR !== undefined && env.NO_COLOR !== '') return false;
  if (env.TERM === 'dumb') return false;
  return stream.isTTY === true;
}
