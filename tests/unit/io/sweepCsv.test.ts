// CSV of a CF sweep: parses back to the same numbers, a missing value is an empty cell, and text a
// spreadsheet would run as a formula is neutralised.
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import type { SweepResult } from '../../../src/contract/explain';
import { sweepCsv } from '../../../src/io/sweepCsv';

const result = (conditions: string): SweepResult => ({
  variable: 'density',
  xLabel: 'Density of layer 2, Lung (g/cm³)',
  x: Float64Array.of(0.1, 0.55, 1),
  conditions,
  doseTo: 'water',
  series: [
    {
      methodId: 'rtmr',
      label: 'Ratio of TMR',
      energy: '6MV',
      cf: Float64Array.of(1.4179, 1.2, 1.0032),
    },
    { methodId: 'batho', label: 'Batho', energy: '18MV', cf: Float64Array.of(1.2, Number.NaN, 1) },
  ],
  notes: [],
});

describe('sweepCsv', () => {
  it('sweepCsv(result) writes one row per x with a CF column per method and energy, parsed back exactly', () => {
    const text = sweepCsv(result('point at 20 cm'));
    const rows = Papa.parse<Record<string, unknown>>(text, {
      header: true,
      dynamicTyping: true,
      skipEmptyLines: true,
    });
    expect(rows.meta.fields).toEqual([
      'density_g_per_cm3',
      'rtmr_6MV_cf',
      'batho_18MV_cf',
      'conditions',
      'dose_to',
    ]);
    expect(rows.data.map((r) => r.density_g_per_cm3)).toEqual([0.1, 0.55, 1]);
    expect(rows.data.map((r) => r.rtmr_6MV_cf)).toEqual([1.4179, 1.2, 1.0032]);
    expect(rows.data[1]?.batho_18MV_cf).toBeNull();
    expect(rows.data[0]?.dose_to).toBe('water');
  });

  it('neutralises formula-like text (a case name starting with =) with a leading apostrophe', () => {
    const text = sweepCsv(result('=HYPERLINK("http://x")'));
    expect(text).toContain(`"'=HYPERLINK(""http://x"")"`);
    expect(text).not.toMatch(/,=HYPERLINK/);
  });

  it("an energy sweep names each row's energy and has one column per method", () => {
    const r: SweepResult = {
      ...result('point at 20 cm'),
      variable: 'energy',
      x: Float64Array.of(1.25, 6),
      xNames: ['Co-60', '6MV'],
      series: [
        { methodId: 'rtmr', label: 'Ratio of TMR', energy: 'each', cf: Float64Array.of(1.5, 1.3) },
      ],
    };
    const lines = sweepCsv(r).split(/\r?\n/);
    expect(lines[0]).toBe('nominal_energy_mv,energy,rtmr_cf,conditions,dose_to');
    expect(lines[1]).toBe('1.25,Co-60,1.5,point at 20 cm,water');
  });
});
