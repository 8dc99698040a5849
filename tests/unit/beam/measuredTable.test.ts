// Measured-table import: the demo tables in public/tables are invented data generated from the
// analytic 6 MV-like fixture, so the imported WaterData can be compared with the analytic function.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buildMeasuredWaterData } from '../../../src/engine/beam/measuredTable';
import type { ExtrapolationFlag } from '../../../src/engine/beam/waterData';
import { pddOf } from '../../../src/engine/beam/waterDataFunctions';
import { f6Psf, f6Tmr } from '../../fixtures/f6WaterData';
import { expectAbsClose, expectRelClose } from '../../helpers/expectClose';

const TMR_CSV = readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8');
const PDD_CSV = readFileSync('public/tables/demo-6mv-pdd-ssd100.csv', 'utf8');
const SCATTER_CSV = readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8');

function demoTmr(withScatter = true) {
  const r = buildMeasuredWaterData({
    kind: 'tmr',
    fileName: 'demo-6mv-tmr.csv',
    csv: TMR_CSV,
    dMaxCm: 1.5,
    ...(withScatter ? { scatterFileName: 'demo-6mv-scatter.csv', scatterCsv: SCATTER_CSV } : {}),
  });
  if (!r.ok) throw new Error(r.problems.join('\n'));
  return r;
}

describe('buildMeasuredWaterData (TMR table)', () => {
  it('buildMeasuredWaterData names the file and the first 12 hex digits of its SHA-256 in source', () => {
    const { waterData } = demoTmr();
    expect(waterData.source).toMatch(
      /^measured table: demo-6mv-tmr\.csv \(sha-256 [0-9a-f]{12}\); scatter factors: demo-6mv-scatter\.csv \(sha-256 [0-9a-f]{12}\); reference dose rate not supplied: 1 cGy\/MU$/,
    );
  });

  it('tmr(...) returns the tabulated values at table nodes', () => {
    const { waterData } = demoTmr();
    // table values are the fixture rounded to 4 decimals
    for (const [d, s] of [
      [10, 10],
      [20, 5],
      [0.5, 3],
      [1.5, 40],
    ] as const)
      expectAbsClose(waterData.tmr(d, s), f6Tmr(d, s), 5e-5);
  });

  it('tmr(...) between nodes is log-linear in depth beyond d_max and linear in the build-up', () => {
    const { waterData } = demoTmr();
    // beyond d_max: log interpolation between 10 and 11 cm follows the near-exponential fixture;
    // 3e-4 covers the table's 4-decimal rounding (≈ 7e-5) and the fixture's small curvature in log
    expectRelClose(waterData.tmr(10.5, 10), f6Tmr(10.5, 10), 3e-4);
    // build-up: exactly the straight line between the nodes at 0 and 0.25 cm
    const t0 = waterData.tmr(0, 10);
    const t1 = waterData.tmr(0.25, 10);
    expectRelClose(waterData.tmr(0.1, 10), t0 + (t1 - t0) * 0.4, 1e-12);
    // linear in field side between 10 and 12 cm
    expectRelClose(
      waterData.tmr(10, 11),
      (waterData.tmr(10, 10) + waterData.tmr(10, 12)) / 2,
      1e-12,
    );
  });

  it('tmr(...) clamps outside the table and reports each clamp to the recorder', () => {
    const { waterData } = demoTmr();
    const flags: ExtrapolationFlag[] = [];
    const recorder = { flag: (f: ExtrapolationFlag) => flags.push(f) };
    expect(waterData.tmr(50, 10, recorder)).toBe(waterData.tmr(40, 10));
    expect(waterData.tmr(10, 2, recorder)).toBe(waterData.tmr(10, 3));
    expect(flags).toEqual([
      { quantity: 'depth', requested: 50, clampedTo: 40 },
      { quantity: 'field', requested: 2, clampedTo: 3 },
    ]);
    expect(waterData.depthRangeCm).toEqual([0, 40]);
    expect(waterData.fieldRangeCm).toEqual([3, 40]);
  });

  it('scatter factors come from the scatter table, PSF from its fourth column', () => {
    const { waterData } = demoTmr();
    expectAbsClose(waterData.sp(10), 1, 5e-5);
    expectAbsClose(waterData.psf(6), f6Psf(6), 5e-5);
    expect(waterData.sc(5)).toBeLessThan(1);
  });

  it('without scatter factors S_p = S_c = 1 and the source says so', () => {
    const { waterData } = demoTmr(false);
    expect(waterData.sp(5)).toBe(1);
    expect(waterData.sc(30)).toBe(1);
    expect(waterData.source).toContain('S_p not supplied: taken as 1');
    expect(waterData.source).toContain('PSF not supplied');
  });

  it('d_max is inferred from the 10 cm column when not supplied', () => {
    const r = buildMeasuredWaterData({ kind: 'tmr', fileName: 't.csv', csv: TMR_CSV });
    expect(r.ok && r.waterData.dMaxCm).toBe(1.5);
    expect(r.ok && r.summary.notes[0]).toMatch(/d_max not supplied/);
  });

  it('problems carry the file name; a PDD table without its SSD is refused', () => {
    const bad = buildMeasuredWaterData({ kind: 'tmr', fileName: 'x.csv', csv: 'd,5\n0,abc' });
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.problems.every((p) => p.startsWith('x.csv: '))).toBe(true);
    const noSsd = buildMeasuredWaterData({ kind: 'pdd', fileName: 'p.csv', csv: PDD_CSV });
    expect(!noSsd.ok && noSsd.problems).toEqual(['p.csv: a PDD table needs its SSD (cm)']);
  });
});

describe('buildMeasuredWaterData (PDD table)', () => {
  const r = buildMeasuredWaterData({
    kind: 'pdd',
    fileName: 'demo-6mv-pdd-ssd100.csv',
    csv: PDD_CSV,
    ssdCm: 100,
    dMaxCm: 1.5,
    scatterCsv: SCATTER_CSV,
  });
  if (!r.ok) throw new Error(r.problems.join('\n'));
  const wd = r.waterData;

  it('PDD → TMR recovers the TMR the PDD was built from', () => {
    // the PDD table was generated from the fixture TMR; interpolation in surface side and the
    // 4-decimal rounding of the table leave ≲ 0.2 % (checked away from the small-field edge)
    for (const [d, s] of [
      [5, 10],
      [10, 10],
      [20, 15],
      [25, 20],
      [10, 6],
    ] as const)
      expectRelClose(wd.tmr(d, s), f6Tmr(d, s), 2e-3);
  });

  it('PDD → TMR → PDD round trip returns the table PDD', () => {
    const rows = PDD_CSV.split('\n').filter((l) => /^\d/.test(l));
    const header = (PDD_CSV.split('\n')[1] as string).split(',').slice(1).map(Number);
    for (const depth of [3, 10, 20]) {
      const row = (rows.find((l) => l.startsWith(`${depth},`)) as string).split(',').map(Number);
      for (const side of [5, 10, 20]) {
        const tablePdd = row[header.indexOf(side) + 1] as number;
        // same interpolation allowance as above
        expectRelClose(pddOf(wd, depth, side, 100), tablePdd, 2e-3);
      }
    }
  });

  it('the summary notes the conversion and extrapolation below the smallest field', () => {
    expect(r.summary.notes.join(' ')).toMatch(/converted to TMR/);
    expect(r.summary.notes.join(' ')).toMatch(/extrapolated linearly in field side/);
  });
});

describe('table summary', () => {
  it('the summary gives TPR20,10 of the demo table (6 MV-like, 0.678) and no warning note', () => {
    const { summary } = demoTmr();
    // derived test vector: analytic 6 MV-like TMR fixture, TMR(20,10)/TMR(10,10) = 0.678 (3 decimals)
    expectAbsClose(summary.tpr2010 as number, 0.678, 5e-4);
    expect(summary.notes.join(' ')).not.toMatch(/TPR20,10/);
  });

  it('an implausibly flat table gets a TPR20,10 note', () => {
    const flat = 'd,5,10,20\n0,0.9,0.9,0.9\n1.5,1,1,1\n10,0.99,0.99,0.99\n20,0.98,0.98,0.98\n';
    const r = buildMeasuredWaterData({ kind: 'tmr', fileName: 'flat.csv', csv: flat, dMaxCm: 1.5 });
    expect(r.ok && r.summary.notes.join(' ')).toMatch(/TPR20,10 0\.990 lies outside/);
  });
});
