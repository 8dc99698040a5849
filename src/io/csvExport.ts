// CSV exports of a calculation: the depth curves of every method and the point-check tables
// (per beam and total). Numbers are written at full precision so the files parse back exactly;
// a missing value is an empty cell; text a spreadsheet would run as a formula is neutralised.
import Papa from 'papaparse';
import type { CalcReport } from '../contract/reports';
import type { PlanCheck } from '../engine/check/planCheck';

type Cell = string | number | null;

const cell = (v: number | null | undefined): Cell =>
  v === null || v === undefined || !Number.isFinite(v) ? null : v;

/**
 * Text that a spreadsheet would read as a formula (leading =, +, -, @, tab or carriage return;
 * OWASP "CSV injection"): such a cell is written with a leading apostrophe, so it stays text.
 * Numbers are written as numbers (a negative difference stays a number).
 */
export const FORMULA_LIKE = /^[=+\-@\t\r]/;

export function toCsv(fields: string[], rows: Cell[][]): string {
  return Papa.unparse(
    { fields, data: rows.map((r) => r.map((c) => (c === null ? '' : c))) },
    { escapeFormulae: FORMULA_LIKE },
  );
}

/**
 * One row per depth: geometric and radiological depth, then dose per MU and CF of each method (and
 * 1σ where a method has one); the last column names the dose convention (water or medium).
 */
export function curvesCsv(report: CalcReport): string {
  const fields = ['depth_cm', 'radiological_depth_cm'];
  for (const m of report.methods) {
    fields.push(`${m.id}_dose_per_mu_cgy`, `${m.id}_cf`);
    // A statistical method (Monte Carlo) adds its 1σ.
    if (m.curve.sigmaDosePerMuCGy) fields.push(`${m.id}_sigma_dose_per_mu_cgy`);
  }
  const rows = report.depthCm.map((d, i) => {
    const row: Cell[] = [d, cell(report.radiologicalDepthCm[i])];
    for (const m of report.methods) {
      row.push(cell(m.curve.dosePerMuCGy[i]), cell(m.curve.cf[i]));
      // No σ beside a withheld value (a bin without an uncertainty has no value either).
      if (m.curve.sigmaDosePerMuCGy)
        row.push(cell(m.curve.dosePerMuCGy[i] === null ? null : m.curve.sigmaDosePerMuCGy[i]));
    }
    row.push(report.doseTo);
    return row;
  });
  return toCsv([...fields, 'dose_to'], rows);
}

export const POINT_CHECK_FIELDS = [
  'beam',
  'point',
  'depth_cm',
  'method',
  'dose_per_mu_cgy',
  'prescribed_dose_cgy',
  'check_mu',
  'planning_mu',
  'mu_diff_percent',
  'dose_for_planning_mu_cgy',
  'planning_dose_cgy',
  'dose_diff_percent',
  'tolerance_percent',
  'verdict',
  // 1σ of a statistical method (Monte Carlo); empty for the deterministic ones.
  'sigma_dose_per_mu_cgy',
  'sigma_check_mu',
  'sigma_mu_diff_percent',
  'sigma_dose_for_planning_mu_cgy',
  'sigma_dose_diff_percent',
  // Dose to water or dose to medium (every dose in the row).
  'dose_to',
];

/** One row per beam, point and method. */
export function pointCheckCsv(check: PlanCheck): string {
  const rows: Cell[][] = [];
  for (const b of check.beams)
    for (const p of b.points)
      for (const m of p.methods)
        rows.push([
          b.id,
          p.pointId,
          p.depthCm,
          m.methodId,
          cell(m.dosePerMuCGy),
          cell(p.prescribedDoseCGy),
          cell(m.mu),
          cell(p.planningMu),
          cell(m.muDiffPercent),
          cell(m.doseCGy),
          cell(p.planningDoseCGy),
          cell(m.doseDiffPercent),
          p.tolerancePercent,
          m.verdict,
          cell(m.sigma?.dosePerMuCGy),
          cell(m.sigma?.mu),
          cell(m.sigma?.muDiffPercent),
          cell(m.sigma?.doseCGy),
          cell(m.sigma?.doseDiffPercent),
          check.doseTo,
        ]);
  return toCsv(POINT_CHECK_FIELDS, rows);
}

export const TOTAL_CHECK_FIELDS = [
  'point',
  'method',
  'dose_cgy',
  'planning_dose_cgy',
  'diff_percent',
  'tolerance_percent',
  'verdict',
  // 1σ of a statistical method summed over beams (quadrature); empty otherwise.
  'sigma_dose_cgy',
  'sigma_diff_percent',
  'dose_to',
];

/** One row per shared point and method: dose summed over beams. */
export function totalCheckCsv(check: PlanCheck): string {
  const rows: Cell[][] = [];
  for (const t of check.totals)
    for (const m of t.methods)
      rows.push([
        t.pointId,
        m.methodId,
        cell(m.doseCGy),
        cell(t.planningDoseCGy),
        cell(m.diffPercent),
        t.tolerancePercent,
        m.verdict,
        cell(m.sigma?.doseCGy),
        cell(m.sigma?.diffPercent),
        check.doseTo,
      ]);
  return toCsv(TOTAL_CHECK_FIELDS, rows);
}
