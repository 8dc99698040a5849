// The printed benchmark table: headline value (median or p95), spread (min–max), unit, runs, note.
import { table } from '../../src/cli/formatReport';
import type { BenchRow } from './row';
import { median, percentile, spread } from './stats';

function fmtValue(v: number): string {
  if (!Number.isFinite(v)) return '—';
  const a = Math.abs(v);
  return a >= 100
    ? v.toFixed(0)
    : a >= 10
      ? v.toFixed(1)
      : a >= 1
        ? v.toFixed(2)
        : v.toPrecision(3);
}

export function headline(row: BenchRow): number {
  return row.stat === 'p95' ? percentile(row.samples, 0.95) : median(row.samples);
}

export function formatBenchTable(rows: readonly BenchRow[]): string {
  return table(
    ['group', 'figure', 'value', 'spread (min–max)', 'unit', 'runs', 'note'],
    rows.map((r) => {
      if (r.error !== undefined)
        return [r.group, r.name, 'ERROR', '', '', '', r.error.slice(0, 160)];
      if (r.notMeasured !== undefined)
        return [r.group, r.name, 'not measured', '', '', '', r.notMeasured];
      const s = spread(r.samples);
      return [
        r.group,
        r.name,
        `${fmtValue(headline(r))}${r.stat === 'p95' ? ' (p95)' : ''}`,
        r.samples.length > 1 ? `${fmtValue(s.min)}–${fmtValue(s.max)}` : '',
        r.unit,
        String(r.samples.length),
        r.note ?? '',
      ];
    }),
  );
}
