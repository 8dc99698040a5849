import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeApi } from '../../../src/compute/computeApi';
import { presetById } from '../../../src/state/presets';

const withTable = () => {
  const c = presetById('chest')!.make();
  c.waterData = {
    kind: 'tmr',
    fileName: 'demo-6mv-tmr.csv',
    csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
  };
  return c;
};

function rtmrSource(options: Parameters<typeof computeApi.calculate>[1]): string | undefined {
  const r = computeApi.calculate(withTable(), { ...options, methods: ['rtmr'] });
  if (!r.ok) throw new Error('case should be valid');
  return r.report.methods.find((m) => m.id === 'rtmr')?.waterData;
}

describe('computeApi.calculate(..., { waterSource })', () => {
  it('uses the case table by default and the modelled beam when asked', () => {
    expect(rtmrSource({})).toMatch(/^measured table: demo-6mv-tmr\.csv/);
    expect(rtmrSource({ waterSource: 'case' })).toMatch(/^measured table: demo-6mv-tmr\.csv/);
    expect(rtmrSource({ waterSource: 'modelled' })).toMatch(/^modelled beam \(6MV/);
  });
});
