// The point check of a plan: for every beam, point and dose method, the MU for the beam's share
// of the prescription, the dose the planning system's MU give, their percent differences from the
// planning values and a verdict; then the dose summed over beams at each shared point. Numbers in,
// numbers out: the dose per MU of each method at each point comes from the dose methods.
import {
  quadratureSum,
  sigmaOfDoseCGy,
  sigmaOfMu,
  sigmaOfPercentDifference,
  verdictWithSigma,
} from './checkUncertainty';
import { doseForMu, muForDose } from './monitorUnits';
import { isHeterogeneousPath, type PathLayer } from './heterogeneousPath';
import {
  percentDifference,
  toleranceFor,
  worstVerdict,
  type Tolerances,
  type Verdict,
} from './tolerance';
import { weightFractions } from './weightFractions';

export interface CheckPointInput {
  id: string;
  depthCm: number;
  planningDoseCGy?: number | undefined;
  planningMu?: number | undefined;
}

export interface CheckMethodInput {
  id: string;
  label: string;
  points: {
    id: string;
    dosePerMuCGy: number | null;
    /** 1σ of dosePerMuCGy (statistical, Monte Carlo only). */
    sigmaDosePerMuCGy?: number | undefined;
  }[];
}

export interface CheckBeamInput {
  id: string;
  label: string;
  /** Relative weight: the beam's share of the prescribed dose is weight / Σ weights. */
  weight: number;
  layers: readonly PathLayer[];
  points: readonly CheckPointInput[];
  methods: readonly CheckMethodInput[];
}

export interface Prescription {
  pointId: string;
  /** Total dose per fraction at the point from all beams (cGy). */
  doseCGy: number;
}

export interface CheckOptions {
  tolerances: Tolerances;
  prescription?: Prescription | undefined;
  /** Method whose verdict decides the plan's verdict; a preferred available method when absent. */
  decisiveMethodId?: string | undefined;
}

export interface MethodPointCheck {
  methodId: string;
  dosePerMuCGy: number | null;
  /**
   * MU to deliver this beam's share of the prescription (prescription point), else the planning
   * system's dose at the point.
   */
  mu: number | null;
  muDiffPercent: number | null;
  /** Dose at the point for the planning system's MU (cGy). */
  doseCGy: number | null;
  doseDiffPercent: number | null;
  /**
   * Present only for a method with a statistical 1σ (Monte Carlo): the σ of the dose per MU, of
   * the check MU (σ_MU / MU = σ_(D/MU) / (D/MU)), of the dose for the planning MU (cGy) and of
   * the two differences (percent points). Null where the value itself is missing.
   */
  sigma?: {
    dosePerMuCGy: number;
    mu: number | null;
    muDiffPercent: number | null;
    doseCGy: number | null;
    doseDiffPercent: number | null;
  };
  /** See verdictWithSigma: with a σ, "uncertain" when within the tolerance ± 2σ. */
  verdict: Verdict;
}

export interface PointCheck {
  pointId: string;
  depthCm: number;
  heterogeneous: boolean;
  tolerancePercent: number;
  /** This beam's share of the prescribed dose at this point (cGy), or null. */
  prescribedDoseCGy: number | null;
  planningDoseCGy: number | null;
  planningMu: number | null;
  methods: MethodPointCheck[];
}

export interface BeamCheck {
  id: string;
  label: string;
  weight: number;
  weightFraction: number;
  /** The planning system's MU for the beam (prescription point first, else the first point giving one). */
  planningMu: number | null;
  points: PointCheck[];
  verdictByMethod: Record<string, Verdict>;
}

export interface TotalPointCheck {
  pointId: string;
  /** Beams that do not list this point (then no total is formed). */
  missingInBeams: string[];
  heterogeneous: boolean;
  tolerancePercent: number;
  /** Σ of the beams' planning doses, when every beam gives one. */
  planningDoseCGy: number | null;
  methods: {
    methodId: string;
    doseCGy: number | null;
    diffPercent: number | null;
    /**
     * 1σ of the summed dose (cGy), beams' runs being independent (quadrature), and of the
     * difference (percent points); present only for a method with a σ, null when a beam lacks it.
     */
    sigma?: { doseCGy: number | null; diffPercent: number | null };
    verdict: Verdict;
  }[];
}

export interface PlanCheck {
  tolerances: Tolerances;
  prescription: Prescription | null;
  methods: { id: string; label: string }[];
  decisiveMethodId: string | null;
  beams: BeamCheck[];
  totals: TotalPointCheck[];
  verdictByMethod: Record<string, Verdict>;
  /** Verdict of the decisive method over every beam, point and total. */
  verdict: Verdict;
}

/** Methods preferred to decide the verdict, in order: effective-depth methods first (AAPM TG-114 advises an effective depth when the plan is heterogeneity-corrected; from memory). */
export const DECISIVE_METHOD_PREFERENCE: readonly string[] = [
  'rtmr',
  'epl-pdd',
  'batho-modified',
  'batho',
  'etar',
  'water',
];

function unionMethods(beams: readonly CheckBeamInput[]): { id: string; label: string }[] {
  const seen = new Map<string, string>();
  for (const b of beams) for (const m of b.methods) if (!seen.has(m.id)) seen.set(m.id, m.label);
  return [...seen].map(([id, label]) => ({ id, label }));
}

function beamPlanningMu(beam: CheckBeamInput, prescription: Prescription | null): number | null {
  const atRx = prescription ? beam.points.find((p) => p.id === prescription.pointId) : undefined;
  return (
    atRx?.planningMu ?? beam.points.find((p) => p.planningMu !== undefined)?.planningMu ?? null
  );
}

function checkBeam(
  beam: CheckBeamInput,
  weightFraction: number,
  methods: readonly { id: string }[],
  options: CheckOptions,
): BeamCheck {
  const rx = options.prescription ?? null;
  const beamMu = beamPlanningMu(beam, rx);
  const points = beam.points.map((p): PointCheck => {
    const heterogeneous = isHeterogeneousPath(beam.layers, p.depthCm);
    const tolerancePercent = toleranceFor(heterogeneous, options.tolerances);
    const prescribedDoseCGy = rx && rx.pointId === p.id ? rx.doseCGy * weightFraction : null;
    const mu = p.planningMu ?? beamMu;
    return {
      pointId: p.id,
      depthCm: p.depthCm,
      heterogeneous,
      tolerancePercent,
      prescribedDoseCGy,
      planningDoseCGy: p.planningDoseCGy ?? null,
      planningMu: mu,
      methods: methods.map(({ id }): MethodPointCheck => {
        const at = beam.methods.find((m) => m.id === id)?.points.find((q) => q.id === p.id);
        const dpm = at?.dosePerMuCGy ?? null;
        const sigmaDpm = at?.sigmaDosePerMuCGy;
        const toDeliver = prescribedDoseCGy ?? p.planningDoseCGy ?? null;
        const checkMu = toDeliver === null ? null : muForDose(toDeliver, dpm);
        const doseCGy = mu === null ? null : doseForMu(mu, dpm);
        const muDiffPercent = percentDifference(checkMu, mu);
        const doseDiffPercent = percentDifference(doseCGy, p.planningDoseCGy);
        const sigma =
          sigmaDpm === undefined || !Number.isFinite(sigmaDpm)
            ? undefined
            : sigmaOfCheck(checkMu, dpm, sigmaDpm, mu, doseCGy, p.planningDoseCGy);
        return {
          methodId: id,
          dosePerMuCGy: dpm,
          mu: checkMu,
          muDiffPercent,
          doseCGy,
          doseDiffPercent,
          ...(sigma ? { sigma } : {}),
          verdict: worstVerdict([
            verdictWithSigma(muDiffPercent, sigma?.muDiffPercent, tolerancePercent),
            verdictWithSigma(doseDiffPercent, sigma?.doseDiffPercent, tolerancePercent),
          ]),
        };
      }),
    };
  });
  const verdictByMethod: Record<string, Verdict> = {};
  methods.forEach(({ id }, k) => {
    verdictByMethod[id] = worstVerdict(points.map((p) => p.methods[k]?.verdict ?? 'none'));
  });
  return {
    id: beam.id,
    label: beam.label,
    weight: beam.weight,
    weightFraction,
    planningMu: beamMu,
    points,
    verdictByMethod,
  };
}

/** The σ block of a method point with a statistical 1σ of its dose per MU. */
function sigmaOfCheck(
  checkMu: number | null,
  dpm: number | null,
  sigmaDpm: number,
  planningMu: number | null,
  doseCGy: number | null,
  planningDoseCGy: number | undefined,
): NonNullable<MethodPointCheck['sigma']> {
  const sMu = sigmaOfMu(checkMu, dpm, sigmaDpm);
  const sDose = doseCGy === null ? null : sigmaOfDoseCGy(planningMu, sigmaDpm);
  return {
    dosePerMuCGy: sigmaDpm,
    mu: sMu,
    muDiffPercent: sigmaOfPercentDifference(sMu, planningMu),
    doseCGy: sDose,
    doseDiffPercent: sigmaOfPercentDifference(sDose, planningDoseCGy),
  };
}

function sumOrNull(values: readonly (number | null)[]): number | null {
  let s = 0;
  for (const v of values) {
    if (v === null) return null;
    s += v;
  }
  return s;
}

function totalsOf(beams: readonly BeamCheck[], methods: readonly { id: string }[], t: Tolerances) {
  const ids: string[] = [];
  for (const b of beams)
    for (const p of b.points) if (!ids.includes(p.pointId)) ids.push(p.pointId);
  return ids.map((pointId): TotalPointCheck => {
    const here = beams.map((b) => b.points.find((p) => p.pointId === pointId));
    const missingInBeams = beams.filter((_, i) => here[i] === undefined).map((b) => b.id);
    const present = here.filter((p): p is PointCheck => p !== undefined);
    const heterogeneous = present.some((p) => p.heterogeneous);
    const tolerancePercent = toleranceFor(heterogeneous, t);
    const planningDoseCGy =
      missingInBeams.length > 0 ? null : sumOrNull(present.map((p) => p.planningDoseCGy));
    return {
      pointId,
      missingInBeams,
      heterogeneous,
      tolerancePercent,
      planningDoseCGy,
      methods: methods.map(({ id }, k) => {
        const doseCGy =
          missingInBeams.length > 0
            ? null
            : sumOrNull(present.map((p) => p.methods[k]?.doseCGy ?? null));
        const diffPercent = percentDifference(doseCGy, planningDoseCGy);
        const parts = present.map((p) => p.methods[k]);
        const withSigma = parts.some((m) => m?.sigma !== undefined);
        const sigmaDose =
          withSigma && doseCGy !== null
            ? quadratureSum(parts.map((m) => m?.sigma?.doseCGy ?? null))
            : null;
        const sigma = withSigma
          ? {
              doseCGy: sigmaDose,
              diffPercent: sigmaOfPercentDifference(sigmaDose, planningDoseCGy),
            }
          : undefined;
        return {
          methodId: id,
          doseCGy,
          diffPercent,
          ...(sigma ? { sigma } : {}),
          verdict: verdictWithSigma(diffPercent, sigma?.diffPercent, tolerancePercent),
        };
      }),
    };
  });
}

/** The full check of one or more beams against the planning system's values. */
export function checkPlan(beams: readonly CheckBeamInput[], options: CheckOptions): PlanCheck {
  const methods = unionMethods(beams);
  const fractions = weightFractions(beams.map((b) => b.weight));
  const beamChecks = beams.map((b, i) => checkBeam(b, fractions[i] ?? 0, methods, options));
  const totals = totalsOf(beamChecks, methods, options.tolerances);
  const verdictByMethod: Record<string, Verdict> = {};
  methods.forEach(({ id }, k) => {
    verdictByMethod[id] = worstVerdict([
      ...beamChecks.map((b) => b.verdictByMethod[id] ?? 'none'),
      ...totals.map((t) => t.methods[k]?.verdict ?? 'none'),
    ]);
  });
  const available = new Set(methods.map((m) => m.id));
  const decisiveMethodId =
    options.decisiveMethodId !== undefined && available.has(options.decisiveMethodId)
      ? options.decisiveMethodId
      : (DECISIVE_METHOD_PREFERENCE.find((id) => available.has(id)) ?? methods[0]?.id ?? null);
  return {
    tolerances: { ...options.tolerances },
    prescription: options.prescription ?? null,
    methods,
    decisiveMethodId,
    beams: beamChecks,
    totals,
    verdictByMethod,
    verdict: decisiveMethodId === null ? 'none' : (verdictByMethod[decisiveMethodId] ?? 'none'),
  };
}
