// HU → relative electron density ρ_e through a piecewise-linear calibration curve, read from CSV
// (two columns: HU, ρ_e) and editable. The default curve is generic and from memory: air at
// −1000 HU, water at 0 HU with the air–water line between (ρ_e ≈ 1 + HU/1000), then a shallower
// line through cortical bone (ρ_e 1.78 from its ICRU-44 composition at 1.92 g/cm³, placed at
// about 1500 HU at 120 kVp, from memory). Every scanner differs: replace it with your scanner's.

export interface CalibrationPoint {
  hu: number;
  rhoE: number;
}

export interface Calibration {
  label: string;
  points: readonly CalibrationPoint[];
}

export const DEFAULT_CALIBRATION_LABEL = "generic, from memory — replace with your scanner's";

export const DEFAULT_CALIBRATION_CSV = `HU,relative electron density
-1000,0.001
0,1.000
1500,1.780
3071,2.597
`;

export type CalibrationResult =
  { ok: true; value: Calibration } | { ok: false; problems: string[] };

const MIN_HU = -2000;
const MAX_HU = 40000;
const MAX_RHO_E = 6;

/** Parse a calibration CSV: rows "HU,ρ_e" (comma, semicolon or tab); an optional header row; # comments. */
export function parseCalibrationCsv(text: string, label: string): CalibrationResult {
  const problems: string[] = [];
  const points: CalibrationPoint[] = [];
  const lines = text.split(/\r?\n/);
  lines.forEach((raw, index) => {
    const line = raw.trim();
    const row = index + 1;
    if (line === '' || line.startsWith('#')) return;
    const cells = line.split(/[,;\t]/).map((s) => s.trim());
    const nums = cells.map((s) => (s === '' ? NaN : Number(s)));
    if (points.length === 0 && problems.length === 0 && nums.every((v) => Number.isNaN(v))) return; // header
    if (cells.length < 2) {
      problems.push(`calibration row ${row}: needs two columns, HU and relative electron density`);
      return;
    }
    const [hu, rhoE] = nums as [number, number];
    if (!Number.isFinite(hu))
      problems.push(`calibration row ${row}, column 1 (HU): "${cells[0]}" is not a number`);
    else if (hu < MIN_HU || hu > MAX_HU)
      problems.push(
        `calibration row ${row}, column 1 (HU): ${hu} lies outside ${MIN_HU}…${MAX_HU}`,
      );
    if (!Number.isFinite(rhoE))
      problems.push(
        `calibration row ${row}, column 2 (relative electron density): "${cells[1]}" is not a number`,
      );
    else if (rhoE < 0 || rhoE > MAX_RHO_E)
      problems.push(
        `calibration row ${row}, column 2 (relative electron density): ${rhoE} lies outside 0…${MAX_RHO_E}`,
      );
    if (!Number.isFinite(hu) || !Number.isFinite(rhoE)) return;
    const prev = points[points.length - 1];
    if (prev && hu <= prev.hu)
      problems.push(
        `calibration row ${row}, column 1 (HU): ${hu} must be greater than the row before (${prev.hu})`,
      );
    points.push({ hu, rhoE });
  });
  if (problems.length === 0 && points.length < 2)
    problems.push('calibration: at least two rows (HU, relative electron density) are needed');
  return problems.length > 0 ? { ok: false, problems } : { ok: true, value: { label, points } };
}

export function defaultCalibration(): Calibration {
  const r = parseCalibrationCsv(DEFAULT_CALIBRATION_CSV, DEFAULT_CALIBRATION_LABEL);
  if (!r.ok) throw new Error(r.problems.join('; '));
  return r.value;
}

/** ρ_e at a HU value: linear between points, held at the end values outside the curve. */
export function rhoEOfHu(cal: Calibration, hu: number): number {
  const p = cal.points;
  const first = p[0] as CalibrationPoint;
  const last = p[p.length - 1] as CalibrationPoint;
  if (hu <= first.hu) return first.rhoE;
  if (hu >= last.hu) return last.rhoE;
  let k = 1;
  while ((p[k] as CalibrationPoint).hu < hu) k++;
  const a = p[k - 1] as CalibrationPoint;
  const b = p[k] as CalibrationPoint;
  return a.rhoE + ((hu - a.hu) / (b.hu - a.hu)) * (b.rhoE - a.rhoE);
}
