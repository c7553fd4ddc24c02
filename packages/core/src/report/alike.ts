// A same-make-model finding compares two devices that share nothing physical: the outputs must not call
// its element "shared". The devices are the last tag of each party's path (one device on each side).
const ALIKE_RULES = new Set(['same-make-model']);

/** The devices a like-for-like finding compares, or undefined when the finding is about a shared element. */
export function alikeDevices(f: {
  rule: string;
  paths: readonly (readonly string[])[];
  element?: string | undefined;
}): string[] | undefined {
  if (!ALIKE_RULES.has(f.rule)) return undefined;
  const devices = [...new Set(f.paths.map((p) => p[p.length - 1]).filter((t): t is string => t !== undefined))];
  return devices.length ? devices.sort() : f.element !== undefined ? [f.element] : [];
}
