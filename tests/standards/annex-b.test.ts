// The PFDavg tables of IEC 61508-6:2010 Annex B (Tables B.2 to B.5: proof-test interval T1 of 6 months, 1, 2
// and 10 years; MTTR = MRT = 8 h; each channel's dangerous failure rate lambdaD is half its total rate lambda;
// betaD = beta / 2), reproduced within the rounding of the printed tables (two significant figures).
//
// FROM MEMORY: the standard was not at hand. The expected figures below are the table entries as recalled, each
// re-worked by hand from the Annex B equations under the table's stated assumptions before being written here;
// they agree with the derived check values of the project's rule basis (1oo1 2.2e-3 and 8.8e-4, 1oo2 5.0e-5 at
// T1 = 1 year, lambda = 1e-6 /h). Columns: lambda = 1e-7, 1e-6 and 1e-5 per hour.
import { describe, expect, it } from 'vitest';
import { groupPfd, groupPfh, type GroupFigures } from '@bulkhead/core';

interface TableRow {
  table: string;
  t1: number;
  vote: [number, number];
  dc: number;
  beta: number;
  printed: [number, number, number];
}

const LAMBDAS = [1e-7, 1e-6, 1e-5] as const;

const ROWS: TableRow[] = [
  // Table B.2, T1 = 6 months (4,380 h).
  { table: 'B.2', t1: 4380, vote: [1, 1], dc: 0, beta: 0, printed: [1.1e-4, 1.1e-3, 1.1e-2] },
  { table: 'B.2', t1: 4380, vote: [1, 1], dc: 0.9, beta: 0, printed: [1.1e-5, 1.1e-4, 1.1e-3] },
  { table: 'B.2', t1: 4380, vote: [1, 2], dc: 0, beta: 0.02, printed: [2.2e-6, 2.4e-5, 3.7e-4] },
  { table: 'B.2', t1: 4380, vote: [2, 2], dc: 0.6, beta: 0, printed: [8.8e-5, 8.8e-4, 8.8e-3] },
  { table: 'B.2', t1: 4380, vote: [2, 3], dc: 0, beta: 0.02, printed: [2.2e-6, 2.7e-5, 6.8e-4] },
  // Table B.3, T1 = 1 year (8,760 h).
  { table: 'B.3', t1: 8760, vote: [1, 1], dc: 0, beta: 0, printed: [2.2e-4, 2.2e-3, 2.2e-2] },
  { table: 'B.3', t1: 8760, vote: [1, 1], dc: 0.6, beta: 0, printed: [8.8e-5, 8.8e-4, 8.8e-3] },
  { table: 'B.3', t1: 8760, vote: [1, 1], dc: 0.9, beta: 0, printed: [2.2e-5, 2.2e-4, 2.2e-3] },
  { table: 'B.3', t1: 8760, vote: [1, 1], dc: 0.99, beta: 0, printed: [2.6e-6, 2.6e-5, 2.6e-4] },
  { table: 'B.3', t1: 8760, vote: [1, 2], dc: 0, beta: 0.02, printed: [4.4e-6, 5.0e-5, 1.1e-3] },
  { table: 'B.3', t1: 8760, vote: [1, 2], dc: 0, beta: 0.1, printed: [2.2e-5, 2.2e-4, 2.7e-3] },
  { table: 'B.3', t1: 8760, vote: [1, 2], dc: 0.9, beta: 0.1, printed: [2.2e-6, 2.2e-5, 2.3e-4] },
  { table: 'B.3', t1: 8760, vote: [2, 2], dc: 0.6, beta: 0, printed: [1.8e-4, 1.8e-3, 1.8e-2] },
  { table: 'B.3', t1: 8760, vote: [2, 3], dc: 0, beta: 0.02, printed: [4.6e-6, 6.2e-5, 2.3e-3] },
  { table: 'B.3', t1: 8760, vote: [2, 3], dc: 0.6, beta: 0.1, printed: [8.8e-6, 9.1e-5, 1.1e-3] },
  { table: 'B.3', t1: 8760, vote: [1, 3], dc: 0, beta: 0.02, printed: [4.4e-6, 4.4e-5, 4.6e-4] },
  // Table B.4, T1 = 2 years (17,520 h).
  { table: 'B.4', t1: 17520, vote: [1, 1], dc: 0, beta: 0, printed: [4.4e-4, 4.4e-3, 4.4e-2] },
  { table: 'B.4', t1: 17520, vote: [1, 2], dc: 0, beta: 0.02, printed: [9.0e-6, 1.1e-4, 3.3e-3] },
  { table: 'B.4', t1: 17520, vote: [1, 2], dc: 0.9, beta: 0.1, printed: [4.4e-6, 4.4e-5, 4.6e-4] },
  { table: 'B.4', t1: 17520, vote: [2, 3], dc: 0.6, beta: 0.1, printed: [1.8e-5, 1.9e-4, 2.8e-3] },
  { table: 'B.4', t1: 17520, vote: [1, 3], dc: 0, beta: 0.02, printed: [8.8e-6, 8.8e-5, 1.0e-3] },
  // Table B.5, T1 = 10 years (87,600 h).
  { table: 'B.5', t1: 87600, vote: [1, 1], dc: 0.9, beta: 0, printed: [2.2e-4, 2.2e-3, 2.2e-2] },
  { table: 'B.5', t1: 87600, vote: [1, 2], dc: 0, beta: 0.02, printed: [5.0e-5, 1.1e-3, 6.6e-2] },
  { table: 'B.5', t1: 87600, vote: [1, 2], dc: 0.9, beta: 0.1, printed: [2.2e-5, 2.2e-4, 2.8e-3] },
  { table: 'B.5', t1: 87600, vote: [2, 3], dc: 0.6, beta: 0.1, printed: [9.0e-5, 1.1e-3, 3.5e-2] },
];

function figures(row: TableRow, lambda: number): GroupFigures {
  const lambdaD = lambda / 2;
  return {
    lambdaDu: lambdaD * (1 - row.dc),
    lambdaDd: lambdaD * row.dc,
    lambdaSd: 0,
    t1: row.t1,
    mttr: 8,
    mrt: 8,
    beta: row.beta,
    betaD: row.beta / 2,
  };
}

/** Half a unit of the printed table's second significant figure, and a hair for binary fractions. */
function printedRounding(printed: number): number {
  return 0.5 * 10 ** (Math.floor(Math.log10(printed)) - 1) * 1.000001;
}

describe('IEC 61508-6:2010 Annex B PFDavg tables (from memory; see the head of this file)', () => {
  it.each(
    ROWS.flatMap((row) =>
      LAMBDAS.map((lambda, i) => ({ ...row, lambda, value: row.printed[i]!, name: `${row.vote[0]}oo${row.vote[1]}` })),
    ),
  )('Table $table, $name, DC $dc, beta $beta, lambda $lambda /h: $value', (row) => {
    const pfd = groupPfd({ m: row.vote[0], n: row.vote[1] }, figures(row, row.lambda))!;
    expect(Math.abs(pfd - row.value)).toBeLessThanOrEqual(printedRounding(row.value));
  });
});

describe('IEC 61508-6:2010 Annex B PFH, worked by hand from the B.3.3 equations (from memory)', () => {
  // lambda = 1e-6 /h, lambdaD = 5e-7, DC 0, T1 = 1 year, MTTR = MRT = 8 h: tCE = T1/2 + MRT = 4,388 h.
  const f: GroupFigures = {
    lambdaDu: 5e-7,
    lambdaDd: 0,
    lambdaSd: 0,
    t1: 8760,
    mttr: 8,
    mrt: 8,
    beta: 0.1,
    betaD: 0.05,
  };

  it('1oo1 is lambdaDU: 5.0e-7 /h', () => {
    expect(groupPfh({ m: 1, n: 1 }, f)).toBe(5e-7);
  });

  it('2oo2 is twice lambdaDU: 1.0e-6 /h', () => {
    expect(groupPfh({ m: 2, n: 2 }, f)).toBeCloseTo(1e-6, 20);
  });

  it('1oo2 with beta 10%: 2 x (0.9 x 5e-7)^2 x 4,388 + 0.1 x 5e-7 = 5.18e-8 /h', () => {
    // 2 x 2.025e-13 x 4,388 = 1.777e-9; plus 5.0e-8.
    expect(groupPfh({ m: 1, n: 2 }, f)).toBeCloseTo(5.1777e-8, 11);
  });

  it('2oo3 with beta 10%: 6 x (0.9 x 5e-7)^2 x 4,388 + 0.1 x 5e-7 = 5.53e-8 /h', () => {
    expect(groupPfh({ m: 2, n: 3 }, f)).toBeCloseTo(5.5332e-8, 11);
  });
});
