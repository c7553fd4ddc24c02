// Architectural constraints: the hardware fault tolerance (HFT) a SIL needs, by IEC 61511-1:2016 11.4.5,
// Table 6 (the route of 11.4; rows from memory). A MooN group tolerates N - M faults.

export const HFT_SOURCE = 'IEC 61511-1:2016 11.4.5 Table 6, from memory';

/** Least HFT for a SIL in a demand mode. */
export function requiredHft(sil: number, mode: 'low-demand' | 'high-demand'): number {
  if (sil >= 4) return 2;
  if (sil === 3) return 1;
  if (sil === 2) return mode === 'high-demand' ? 1 : 0;
  return 0;
}
