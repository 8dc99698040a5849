// Hand-worked monitor-unit examples, TMR formalism of AAPM TG-71 (Gibbons et al. 2014):
//   MU = D / (D′₀ · S_c(r_c) · S_p(r_d) · TMR(d, r_d) · ((100 + d_max)/(SSD + d))² · CF)
// The water data are a small invented table (not beam data); every factor is written out by hand.
import { describe, expect, it } from 'vitest';
import type { WaterData } from '../../../src/engine/beam/waterData';
import { dosePerMuFactors } from '../../../src/engine/check/dosePerMu';
import { muForDose } from '../../../src/engine/check/monitorUnits';
import { expectRelClose } from '../../helpers/expectClose';

/** Water data that answer only the look-ups the example needs (any other look-up throws). */
function handTable(entries: {
  tmr: [depthCm: number, sideCm: number, value: number][];
  sp: [sideCm: number, value: number][];
  sc: [sideCm: number, value: number][];
}): WaterData {
  const near = (a: number, b: number) => Math.abs(a - b) < 1e-9;
  const find = <T extends number[]>(rows: T[], match: (r: T) => boolean, what: string): number => {
    const row = rows.find(match);
    if (!row) throw new Error(`unexpected look-up of ${what}`);
    return row[row.length - 1] as number;
  };
  return {
    source: 'hand-worked table',
    dMaxCm: 1.5,
    depthRangeCm: [0, 30],
    fieldRangeCm: [4, 30],
    tmr: (d, s) => find(entries.tmr, (r) => near(r[0], d) && near(r[1], s), `TMR(${d}, ${s})`),
    sp: (s) => find(entries.sp, (r) => near(r[0], s), `Sp(${s})`),
    sc: (s) => find(entries.sc, (r) => near(r[0], s), `Sc(${s})`),
    psf: () => {
      throw new Error('PSF is not part of the TMR chain');
    },
    referenceDosePerMuCGy: 1.0,
  };
}

// Exact arithmetic on the written-out factors: only round-off separates the two sides.
const ROUND_OFF = 1e-12;

describe('hand-worked MU (TG-71 TMR formalism)', () => {
  it('SSD set-up: 200 cGy at 10 cm depth, SSD 100 cm, 10 × 10 cm² needs 295.78 MU', () => {
    // r_c = 10 cm (collimator, at 100 cm); r_d = 10 · (100 + 10)/100 = 11 cm at the point.
    // D′₀ = 1.000 cGy/MU; S_c(10) = 1.000; S_p(11) = 1.004; TMR(10, 11) = 0.791;
    // inverse square ((100 + 1.5)/(100 + 10))² = (101.5/110)² = 0.851425620; CF = 1 (water).
    // D/MU = 1.000 × 1.000 × 1.004 × 0.791 × 0.851425620 × 1 = 0.676171576 cGy/MU.
    // MU = 200 / 0.676171576 = 295.7829 MU.
    const wd = handTable({ tmr: [[10, 11, 0.791]], sp: [[11, 1.004]], sc: [[10, 1.0]] });
    const f = dosePerMuFactors({
      waterData: wd,
      ssdCm: 100,
      depthCm: 10,
      fieldXCm: 10,
      fieldYCm: 10,
      cf: 1,
    });
    expect(f.collimatorSideCm).toBe(10);
    expectRelClose(f.sideAtDepthCm, 11, ROUND_OFF);
    expect([f.referenceDosePerMuCGy, f.sc, f.sp, f.tmr, f.cf]).toEqual([1.0, 1.0, 1.004, 0.791, 1]);
    expectRelClose(f.inverseSquare, 0.85142562, 1e-9); // written to 9 digits
    expectRelClose(f.dosePerMuCGy, 0.676171576, 1e-9); // written to 9 digits
    expectRelClose(muForDose(200, f.dosePerMuCGy) as number, 295.78291533, 1e-9);
  });

  it('SSD set-up behind lung: CF = 1.05 lowers the MU by the same factor (281.70 MU)', () => {
    // Same chain with a heterogeneity correction CF = 1.05:
    // D/MU = 0.676171576 × 1.05 = 0.709980155 cGy/MU; MU = 200 / 0.709980155 = 281.6980 MU.
    const wd = handTable({ tmr: [[10, 11, 0.791]], sp: [[11, 1.004]], sc: [[10, 1.0]] });
    const f = dosePerMuFactors({
      waterData: wd,
      ssdCm: 100,
      depthCm: 10,
      fieldXCm: 10,
      fieldYCm: 10,
      cf: 1.05,
    });
    expectRelClose(f.dosePerMuCGy, 0.709980155, 1e-9);
    expectRelClose(muForDose(200, f.dosePerMuCGy) as number, 281.6980146, 1e-9);
    expectRelClose(muForDose(200, f.dosePerMuCGy) as number, 295.78291533 / 1.05, 1e-9); // 295.78291533 is written to 11 digits
  });

  it('SAD set-up: 180 cGy at the isocentre 10 cm deep, 15 × 10 cm² needs 216.69 MU', () => {
    // SAD 100 cm, isocentre depth 10 cm → SSD 90 cm. Rectangular field 15 × 10 cm² at 100 cm:
    // r_c = 2·15·10/(15 + 10) = 12 cm; at the isocentre the field is still 15 × 10 → r_d = 12 cm.
    // D′₀ = 1.000; S_c(12) = 1.010; S_p(12) = 1.008; TMR(10, 12) = 0.792;
    // inverse square ((100 + 1.5)/(90 + 10))² = 1.015² = 1.030225; CF = 1.
    // D/MU = 1.000 × 1.010 × 1.008 × 0.792 × 1.030225 = 0.830690363 cGy/MU.
    // MU = 180 / 0.830690363 = 216.6872 MU.
    const wd = handTable({ tmr: [[10, 12, 0.792]], sp: [[12, 1.008]], sc: [[12, 1.01]] });
    const f = dosePerMuFactors({
      waterData: wd,
      ssdCm: 90,
      depthCm: 10,
      fieldXCm: 15,
      fieldYCm: 10,
      cf: 1,
    });
    expectRelClose(f.collimatorSideCm, 12, ROUND_OFF);
    expectRelClose(f.sideAtDepthCm, 12, ROUND_OFF);
    expect([f.sc, f.sp, f.tmr]).toEqual([1.01, 1.008, 0.792]);
    expectRelClose(f.inverseSquare, 1.030225, ROUND_OFF * 10);
    expectRelClose(f.dosePerMuCGy, 0.830690363, 1e-9);
    expectRelClose(muForDose(180, f.dosePerMuCGy) as number, 216.68723762, 1e-9);
  });
});
