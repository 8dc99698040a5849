import type { MethodId } from '../../../src/engine/methodRegistry';
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { checkPlan } from '../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../src/engine/check/tolerance';
import { parseCaseText } from '../../../src/io/caseFile';
import {
  curvesCsv,
  pointCheckCsv,
  POINT_CHECK_FIELDS,
  totalCheckCsv,
} from '../../../src/io/csvExport';
import type { MethodResult } from '../../../src/engine/methodResult';

const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
if (!parsed.ok) throw new Error('demo case must be valid');

function parse(text: string) {
  return Papa.parse<Record<string, number | string | null>>(text, {
    header: true,
    dynamicTyping: true,
    skipEmptyLines: true,
  });
}

describe('CSV exports', () => {
  it('curvesCsv(report) parses back to the same depths and method values', () => {
    const report = calculateCase(parsed.value, { depthStepCm: 0.5 });
    // An exporter test: a synthetic method curve (1/(1+d)) with one missing value.
    const m: MethodResult = {
      id: 'synthetic' as MethodId, // an exporter test: any id
      label: 'synthetic',
      variant: '',
      methodClass: 'none',
      waterData: 'none',
      curve: {
        depthCm: report.depthCm,
        dosePerMuCGy: report.depthCm.map((d, i) => (i === 3 ? null : 1 / (1 + d))),
        cf: report.depthCm.map(() => 1),
      },
      points: [],
    };
    const withMethod = { ...report, methods: [m] };
    const back = parse(curvesCsv(withMethod));
    expect(back.meta.fields).toEqual([
      'depth_cm',
      'radiological_depth_cm',
      'synthetic_dose_per_mu_cgy',
      'synthetic_cf',
      'dose_to',
    ]);
    expect(back.data).toHaveLength(report.depthCm.length);
    back.data.forEach((row, i) => {
      expect(row.depth_cm).toBe(report.depthCm[i]);
      expect(row.radiological_depth_cm).toBe(report.radiologicalDepthCm[i]);
      expect(row.synthetic_dose_per_mu_cgy).toBe(m.curve.dosePerMuCGy[i]);
      expect(row.dose_to).toBe('water');
    });
  });

  it('curvesCsv(report) adds a 1σ column for a method whose curve carries one', () => {
    const report = calculateCase(parsed.value, { depthStepCm: 0.5 });
    const sigma = report.depthCm.map((d) => 0.01 + d / 1000);
    const m: MethodResult = {
      id: 'stat' as MethodId, // an exporter test: any id
      label: 'stat',
      variant: '',
      methodClass: 'type C',
      waterData: 'none',
      curve: {
        depthCm: report.depthCm,
        dosePerMuCGy: report.depthCm.map((d) => 1 / (1 + d)),
        cf: report.depthCm.map(() => 1),
        sigmaDosePerMuCGy: sigma,
      },
      points: [],
    };
    const back = parse(curvesCsv({ ...report, methods: [m] }));
    expect(back.meta.fields).toContain('stat_sigma_dose_per_mu_cgy');
    back.data.forEach((row, i) => expect(row.stat_sigma_dose_per_mu_cgy).toBe(sigma[i]));
    // A withheld value (no uncertainty there) has an empty σ cell too, never "value empty, σ 0".
    const gap: MethodResult = {
      ...m,
      curve: { ...m.curve, dosePerMuCGy: m.curve.dosePerMuCGy.map((v, i) => (i === 0 ? null : v)) },
    };
    const row0 = parse(curvesCsv({ ...report, methods: [gap] })).data[0]!;
    expect(row0.stat_dose_per_mu_cgy).toBeNull();
    expect(row0.stat_sigma_dose_per_mu_cgy).toBeNull();
  });

  it('pointCheckCsv(check) and totalCheckCsv(check) parse back to the check values', () => {
    const beam = (id: string, dpm: number) => ({
      id,
      label: id,
      weight: 1,
      planningMu: 120,
      layers: [{ topCm: 0, bottomCm: 20, relativeElectronDensity: 1 }],
      points: [{ id: 'P', depthCm: 10, planningDoseCGy: 100 }],
      methods: [{ id: 'water', label: 'water', points: [{ id: 'P', dosePerMuCGy: dpm }] }],
    });
    const check = checkPlan([beam('AP', 0.81), beam('PA', 0.79)], {
      tolerances: DEFAULT_TOLERANCES,
      prescription: { pointId: 'P', doseCGy: 200 },
    });
    const rows = parse(pointCheckCsv(check));
    expect(rows.meta.fields).toEqual(POINT_CHECK_FIELDS);
    expect(rows.data).toHaveLength(2);
    const pa = rows.data[1];
    const expected = check.beams[1]?.points[0]?.methods[0];
    expect(pa?.beam).toBe('PA');
    expect(pa?.check_mu).toBe(expected?.mu);
    expect(pa?.mu_diff_percent).toBe(expected?.muDiffPercent);
    expect(pa?.verdict).toBe(expected?.verdict);
    const totals = parse(totalCheckCsv(check));
    expect(totals.data[0]?.dose_cgy).toBe(check.totals[0]?.methods[0]?.doseCGy);
    expect(totals.data[0]?.planning_dose_cgy).toBe(200);
    // A deterministic method leaves the σ columns empty.
    expect(pa?.sigma_dose_per_mu_cgy).toBeNull();
    expect(totals.data[0]?.sigma_dose_cgy).toBeNull();
  });

  it('the check CSVs carry the 1σ of a Monte Carlo value (per beam and, in quadrature, total)', () => {
    const beam = (id: string, dpm: number, sigma: number) => ({
      id,
      label: id,
      weight: 1,
      planningMu: 120,
      layers: [{ topCm: 0, bottomCm: 20, relativeElectronDensity: 1 }],
      points: [{ id: 'P', depthCm: 10, planningDoseCGy: 100 }],
      methods: [
        {
          id: 'monte-carlo',
          label: 'Monte Carlo',
          points: [{ id: 'P', dosePerMuCGy: dpm, sigmaDosePerMuCGy: sigma }],
        },
      ],
    });
    const check = checkPlan([beam('AP', 0.81, 0.008), beam('PA', 0.79, 0.006)], {
      tolerances: DEFAULT_TOLERANCES,
    });
    const rows = parse(pointCheckCsv(check));
    const ap = check.beams[0]?.points[0]?.methods[0];
    expect(rows.data[0]?.sigma_dose_per_mu_cgy).toBe(0.008);
    expect(rows.data[0]?.sigma_dose_for_planning_mu_cgy).toBe(ap?.sigma?.doseCGy);
    expect(rows.data[0]?.sigma_dose_diff_percent).toBe(ap?.sigma?.doseDiffPercent);
    const totals = parse(totalCheckCsv(check));
    // Dose for the planning MU: 120 MU × σ per MU; the two beams add in quadrature.
    expect(totals.data[0]?.sigma_dose_cgy).toBeCloseTo(Math.hypot(120 * 0.008, 120 * 0.006), 9);
  });
});

describe('CSV exports and spreadsheet formulas', () => {
  const check = (pointId: string, beamId = 'AP') =>
    checkPlan(
      [
        {
          id: beamId,
          label: beamId,
          weight: 1,
          planningMu: 130,
          layers: [{ topCm: 0, bottomCm: 20, relativeElectronDensity: 1 }],
          points: [{ id: pointId, depthCm: 10, planningDoseCGy: 100 }],
          methods: [{ id: 'water', label: 'water', points: [{ id: pointId, dosePerMuCGy: 0.8 }] }],
        },
      ],
      { tolerances: DEFAULT_TOLERANCES },
    );

  it.each(['=HYPERLINK("http://x","y")', '+1+1', '-2+3', '@SUM(A1)', '\tx', '\rx', '=1\n2'])(
    'a point id %j is written with a leading apostrophe (text, not a formula)',
    (id) => {
      for (const csv of [pointCheckCsv(check(id)), totalCheckCsv(check(id))]) {
        const row = parse(csv).data[0]!;
        expect(row.point).toBe(`'${id}`);
      }
      // A beam id too.
      expect(parse(pointCheckCsv(check('P', id))).data[0]!.beam).toBe(`'${id}`);
    },
  );

  it('ordinary ids and negative numbers are written as they are', () => {
    const rows = parse(pointCheckCsv(check('P1'))).data;
    expect(rows[0]!.point).toBe('P1');
    // 100/0.8 = 125 MU against 130: −3.846… %, a number in the file, not text.
    expect(rows[0]!.mu_diff_percent).toBeCloseTo((100 * (125 - 130)) / 130, 12);
    expect(pointCheckCsv(check('P1'))).not.toMatch(/'-/);
  });
});
