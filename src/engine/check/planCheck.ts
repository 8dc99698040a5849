// The point check of a plan: for every beam, point and dose method, the MU for the beam's share
// of the prescription, the dose the beam's planning MU give, their percent differences from the
// planning values and a verdict; then the dose summed over beams at each shared point, the
// deciding method, the difference that decides and the spread between methods. Numbers in,
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
import { decidingMethodOf, type DecidingReason } from './decidingMethod';
import { decidingDifferenceOf, type DecidingDifference } from './decidingDifference';
import { methodSpreadOf, type MethodSpread } from './methodSpread';
import type { DoseQuantity } from '../dose/doseQuantity';
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
  /** The planning system's dose at the point from this beam (cGy). */
  planningDoseCGy?: number | undefined;
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
  /** The planning system's MU for this beam (one value per beam). */
  planningMu?: number | undefined;
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
  /** Method whose verdict decides the plan's verdict; the default for the path when absent. */
  decisiveMethodId?: string | undefined;
  /** The dose convention of the methods' doses (printed with the check). */
  doseTo?: DoseQuantity | undefined;
}

/** A number a comparison needs and does not have. */
export type MissingValue = 'planning-mu' | 'planning-dose' | 'dose-per-mu';

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
  /** With verdict "none": the numbers missing for any comparison here (empty otherwise). */
  missing: MissingValue[];
}

export interface PointCheck {
  pointId: string;
  depthCm: number;
  heterogeneous: boolean;
  tolerancePercent: number;
  /** This beam's share of the prescribed dose at this point (cGy), or null. */
  prescribedDoseCGy: number | null;
  planningDoseCGy: number | null;
  /** The beam's planning MU (the same for every point of the beam). */
  planningMu: number | null;
  methods: MethodPointCheck[];
}

export interface BeamCheck {
  id: string;
  label: string;
  weight: number;
  weightFraction: number;
  /** The planning system's MU for the beam. */
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
  /** The dose convention of every dose in the check (null when the caller did not say). */
  doseTo: DoseQuantity | null;
  prescription: Prescription | null;
  methods: { id: string; label: string }[];
  decisiveMethodId: string | null;
  /** How the deciding method was chosen; a requested method not computed for every beam. */
  decisiveMethodReason: DecidingReason;
  requestedMethodUnavailable: string | null;
  /** Some checked point's path crosses a heterogeneity. */
  heterogeneous: boolean;
  beams: BeamCheck[];
  totals: TotalPointCheck[];
  verdictByMethod: Record<string, Verdict>;
  /** Verdict of the decisive method over every beam, point and total. */
  verdict: Verdict;
  /** The comparison of the decisive method that gives the verdict (null when none was made). */
  decidingDifference: DecidingDifference | null;
  /** Range of the check's value across the correction methods where the verdict is decided. */
  spread: MethodSpread | null;
}

function unionMethods(beams: readonly CheckBeamInput[]): { id: string; label: string }[] {
  const seen = new Map<string, string>();
  for (const b of beams) for (const m of b.methods) if (!seen.has(m.id)) seen.set(m.id, m.label);
  return [...seen].map(([id, label]) => ({ id, label }));
}

/** The numbers missing for a comparison at a point: ΔMU needs dose per MU, the beam's MU and a
 * dose to deliver (prescription share or planning dose); Δdose needs the dose per MU, the MU and
 * the planning dose. Listed only when neither comparison can be made. */
function missingFor(
  dpm: number | null,
  mu: number | null,
  toDeliver: number | null,
  planningDose: number | null,
): MissingValue[] {
  if (dpm !== null && mu !== null && toDeliver !== null) return [];
  const out: MissingValue[] = [];
  if (mu === null) out.push('planning-mu');
  if (toDeliver === null && planningDose === null) out.push('planning-dose');
  if (dpm === null) out.push('dose-per-mu');
  return out;
}

function checkBeam(
  beam: CheckBeamInput,
  weightFraction: number,
  methods: readonly { id: string }[],
  options: CheckOptions,
): BeamCheck {
  const rx = options.prescription ?? null;
  const beamMu = beam.planningMu ?? null;
  const points = beam.points.map((p): PointCheck => {
    const heterogeneous = isHeterogeneousPath(beam.layers, p.depthCm);
    const tolerancePercent = toleranceFor(heterogeneous, options.tolerances);
    const prescribedDoseCGy = rx && rx.pointId === p.id ? rx.doseCGy * weightFraction : null;
    const mu = beamMu;
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
        const raw = at?.dosePerMuCGy ?? null;
        const dpm = raw !== null && Number.isFinite(raw) && raw > 0 ? raw : null;
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
          missing: missingFor(dpm, mu, toDeliver, p.planningDoseCGy ?? null),
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
  const heterogeneous = beamChecks.some((b) => b.points.some((p) => p.heterogeneous));
  const deciding = decidingMethodOf(
    beams.map((b) =>
      b.methods.filter((m) => m.points.some((p) => p.dosePerMuCGy !== null)).map((m) => m.id),
    ),
    heterogeneous,
    options.decisiveMethodId || undefined,
  );
  const decisiveMethodId = deciding.id;
  const partial = {
    tolerances: { ...options.tolerances },
    doseTo: options.doseTo ?? null,
    prescription: options.prescription ?? null,
    methods,
    decisiveMethodId,
    decisiveMethodReason: deciding.reason,
    requestedMethodUnavailable: deciding.requestedUnavailable,
    heterogeneous,
    beams: beamChecks,
    totals,
    verdictByMethod,
    verdict:
      decisiveMethodId === null ? ('none' as const) : (verdictByMethod[decisiveMethodId] ?? 'none'),
  };
  const decidingDifference = decidingDifferenceOf(partial);
  return { ...partial, decidingDifference, spread: methodSpreadOf(partial, decidingDifference) };
}
