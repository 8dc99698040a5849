// CSV of a CF sweep (src/contract/explain.ts): one row per x value, one CF column per method and
// energy, then the fixed conditions and the dose convention on every row. Numbers at full
// precision; a value the method does not give is an empty cell. Text cells that a spreadsheet
// would read as a formula (=, +, -, @, tab, CR first) are written with a leading apostrophe.
import Papa from 'papaparse';
import type { SweepResult } from '../contract/explain';

const X_FIELDS: Record<SweepResult['variable'], string> = {
  density: 'density_g_per_cm3',
  field: 'field_side_cm',
  energy: 'nominal_energy_mv',
  depth: 'depth_cm',
};

export function sweepCsv(result: SweepResult): string {
  const energyColumn = result.xNames !== undefined;
  const fields = [
    X_FIELDS[result.variable],
    ...(energyColumn ? ['energy'] : []),
    ...result.series.map((s) =>
      s.energy === 'each' ? `${s.methodId}_cf` : `${s.methodId}_${s.energy}_cf`,
    ),
    'conditions',
    'dose_to',
  ];
  const data = Array.from(result.x, (x, i) => [
    x,
    ...(energyColumn ? [result.xNames?.[i] ?? ''] : []),
    ...result.series.map((s) => {
      const v = s.cf[i] as number;
      return Number.isFinite(v) ? v : '';
    }),
    result.conditions,
    result.doseTo,
  ]);
  return Papa.unparse({ fields, data }, { escapeFormulae: true });
}
