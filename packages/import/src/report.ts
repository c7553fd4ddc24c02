// The `--report` summary: per table, rows read, imported and skipped by reason, and the columns no
// mapping knew; then kinds suggested from tag letters. Nothing read is left uncounted.
import type { TableTally } from './records.ts';

export function renderReport(tallies: readonly TableTally[], suggestedKinds: number): string {
  const rows = tallies.map((t) => {
    const skipped = [...t.skipped].map(([reason, n]) => `${n} ${reason}`).join(', ');
    return [t.table, String(t.read), String(t.imported), skipped || '-'];
  });
  const head = ['table', 'rows read', 'imported', 'skipped (by reason)'];
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) => cells.map((c, i) => (i === cells.length - 1 ? c : c.padEnd(widths[i]!))).join('  ');
  const out = [line(head), ...rows.map(line)];
  for (const t of tallies) {
    if (t.unknownColumns.length)
      out.push(`${t.table}: columns not read (unknown to the mapping): ${t.unknownColumns.join(', ')}`);
    if (t.skippedRows.length) out.push(`${t.table}: skipped`, ...t.skippedRows.map((r) => `  ${r}`));
  }
  if (suggestedKinds > 0)
    out.push(
      `${suggestedKinds} kind${suggestedKinds === 1 ? '' : 's'} suggested from ISA-5.1 tag letters, marked in the generated file: confirm them`,
    );
  return out.join('\n') + '\n';
}
