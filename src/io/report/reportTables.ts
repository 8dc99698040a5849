// The point-check tables as text rows, shared by the printed record, the CLI and the page.
import type { MethodPointCheck, PlanCheck } from '../../engine/check/planCheck';

const MISSING_SHORT: Record<MethodPointCheck['missing'][number], string> = {
  'planning-mu': 'plan MU',
  'planning-dose': 'plan dose',
  'dose-per-mu': 'D/MU',
};

/** The verdict cell: the verdict, or for "none" which numbers were missing ("none: no plan MU"). */
function verdictCell(m: MethodPointCheck): string {
  if (m.verdict !== 'none' || m.missing.length === 0) return m.verdict;
  return `none: no ${m.missing.map((k) => MISSING_SHORT[k]).join(', ')}`;
}

const f = (v: number | null | undefined, digits: number): string =>
  v === null || v === undefined || !Number.isFinite(v) ? '—' : v.toFixed(digits);

const signed = (v: number | null | undefined): string =>
  v === null || v === undefined || !Number.isFinite(v) ? '—' : `${v > 0 ? '+' : ''}${v.toFixed(2)}`;

/** "value ± σ" when the value carries a statistical 1σ (Monte Carlo), else the value alone. */
const pm = (
  text: string,
  sigma: number | null | undefined,
  digits: number,
  hasSigma: boolean,
): string => (!hasSigma || text === '—' ? text : `${text} ± ${f(sigma, digits)}`);

export const POINT_TABLE_HEADERS = [
  'beam',
  'point',
  'depth cm',
  'method',
  'D/MU cGy',
  'check MU',
  'plan MU',
  'ΔMU %',
  'dose cGy',
  'plan dose',
  'Δdose %',
  'tol %',
  'verdict',
];

export function pointTableRows(check: PlanCheck): string[][] {
  const label = new Map(check.methods.map((m) => [m.id, m.label]));
  return check.beams.flatMap((b) =>
    b.points.flatMap((p) =>
      p.methods.map((m) => {
        const s = m.sigma;
        const has = s !== undefined;
        return [
          b.id,
          p.pointId,
          p.depthCm.toFixed(2),
          label.get(m.methodId) ?? m.methodId,
          pm(f(m.dosePerMuCGy, 4), s?.dosePerMuCGy, 4, has),
          pm(f(m.mu, 1), s?.mu, 1, has),
          f(p.planningMu, 1),
          pm(signed(m.muDiffPercent), s?.muDiffPercent, 2, has),
          pm(f(m.doseCGy, 1), s?.doseCGy, 1, has),
          f(p.planningDoseCGy, 1),
          pm(signed(m.doseDiffPercent), s?.doseDiffPercent, 2, has),
          String(p.tolerancePercent),
          verdictCell(m),
        ];
      }),
    ),
  );
}

export const TOTAL_TABLE_HEADERS = [
  'point',
  'method',
  'dose cGy',
  'plan dose cGy',
  'Δ %',
  'tol %',
  'verdict',
];

export function totalTableRows(check: PlanCheck): string[][] {
  const label = new Map(check.methods.map((m) => [m.id, m.label]));
  return check.totals.flatMap((t) =>
    t.methods.map((m) => [
      t.pointId,
      label.get(m.methodId) ?? m.methodId,
      pm(f(m.doseCGy, 1), m.sigma?.doseCGy, 1, m.sigma !== undefined),
      f(t.planningDoseCGy, 1),
      pm(signed(m.diffPercent), m.sigma?.diffPercent, 2, m.sigma !== undefined),
      String(t.tolerancePercent),
      t.missingInBeams.length > 0 ? `not in ${t.missingInBeams.join(', ')}` : m.verdict,
    ]),
  );
}

/** One row per beam (and "total" for a multi-beam plan): the verdict of every method. */
export function beamVerdictHeaders(check: PlanCheck): string[] {
  return ['beam', ...check.methods.map((m) => m.id)];
}

export function beamVerdictRows(check: PlanCheck): string[][] {
  const rows = check.beams.map((b) => [
    b.id,
    ...check.methods.map((m) => b.verdictByMethod[m.id] ?? 'none'),
  ]);
  if (check.beams.length > 1)
    rows.push([
      'all (with totals)',
      ...check.methods.map((m) => check.verdictByMethod[m.id] ?? 'none'),
    ]);
  return rows;
}
