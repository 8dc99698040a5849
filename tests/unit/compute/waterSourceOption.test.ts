import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeApi } from '../../../src/compute/computeApi';
import type { WaterSourceSpec } from '../../../src/compute/waterSource';
import { measuredTableOf, resolveWater } from '../../../src/compute/waterSource';
import { presetById } from '../../../src/state/presets';

const TMR = {
  kind: 'tmr' as const,
  fileName: 'demo-6mv-tmr.csv',
  csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
};
const withTable = () => ({ ...presetById('chest')!.make(), waterData: TMR });

function rtmrSource(water: WaterSourceSpec, c: unknown = withTable()): string | undefined {
  const r = computeApi.calculateCase({
    purpose: 'full',
    case: c,
    water,
    options: { methods: ['rtmr'] },
  });
  if (!r.ok) throw new Error('case should be valid');
  return r.report.methods.find((m) => m.id === 'rtmr')?.waterData;
}

describe('water source of a calculation (src/compute/waterSource)', () => {
  it("'case' uses the case's own table, 'modelled' the modelled beam", () => {
    expect(rtmrSource({ kind: 'case' })).toMatch(/^measured table: demo-6mv-tmr\.csv/);
    expect(rtmrSource({ kind: 'modelled' })).toMatch(/^modelled beam \(6MV/);
  });

  it("'case' without a table in the case uses the modelled beam", () => {
    expect(rtmrSource({ kind: 'case' }, presetById('chest')!.make())).toMatch(/^modelled beam/);
  });

  it('a table given with the request replaces the case table (CLI --tmr)', () => {
    const other = { ...TMR, fileName: 'other.csv' };
    expect(rtmrSource({ kind: 'table', table: other })).toMatch(/^measured table: other\.csv/);
  });

  it('builds a table once per content and reuses it', () => {
    const c = withTable();
    const a = resolveWater(c);
    const b = resolveWater({ ...c, waterData: { ...TMR } });
    expect(a.ok && b.ok && a.waterData === b.waterData).toBe(true);
    expect(measuredTableOf({ ...TMR })).toBe(measuredTableOf({ ...TMR }));
  });

  it('a plan reads the same water data as the case calculation', () => {
    const plan = computeApi.calculatePlan({
      purpose: 'plan',
      plan: withTable(),
      water: { kind: 'case' },
      options: { methods: ['rtmr'] },
    });
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    expect(plan.isPlan).toBe(false);
    expect(plan.report.beams[0]!.report.methods[0]!.waterData).toBe(rtmrSource({ kind: 'case' }));
  });
});
