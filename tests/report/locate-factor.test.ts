// Findings about one enabler or modifier point at its own line (issue 9, item 10), not at the cause line.
import { describe, expect, it } from 'vitest';
import { loadModelText, ModelLocator } from '@bulkhead/core';

const TEXT = `site "Locator test (invented)"
category people tolerable=1e-5 harm=people
scenario S-1 category=people
  cause external="Leak" frequency=0.01 basis="records (invented)"
  enabler "Transfers" probability=0.2
  modifier ignition probability=0.5
  modifier presence probability=0.01
  modifier ignition probability=0.3
`;

describe('ModelLocator.factor', () => {
  const loaded = loadModelText('t.bulk', TEXT);
  const locate = new ModelLocator(loaded.model!, loaded.spans);
  it.each([
    ['condition-no-basis:S-1:enabler-1', 5],
    ['condition-no-basis:S-1:ignition', 6],
    ['condition-no-basis:S-1:presence', 7],
    ['condition-no-basis:S-1:ignition-2', 8],
  ])('%s is on line %i', (key, line) => {
    expect(locate.factor('S-1', key)?.line).toBe(line);
  });

  it('finds nothing for a factor the scenario does not have', () => {
    expect(locate.factor('S-1', 'condition-no-basis:S-1:enabler-2')).toBeUndefined();
    expect(locate.factor('S-1', 'condition-no-basis:S-1:injury')).toBeUndefined();
  });
});
