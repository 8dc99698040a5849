// Turning merged batch tallies into the report: dose per fluence per bin for each scenario, dose
// per MU by the calibration run, CF against the water run, the MethodResult on the report's
// depth grid, and the x–z dose plane for the page.
import { makeSlabPhantom } from '../phantom/slabPhantom';
import { FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import { cumulativeMassThicknessGPerCm2 } from '../phantom/slabPhantom';
import type { MethodResult } from '../methodResult';
import type { BatchAccumulator } from './batchStatistics';
import {
  binDoseFactors,
  depthDoseFromStatistics,
  depthOfMaximum,
  GRAY_PER_MEV_PER_G,
  type McDepthDose,
} from './depthDose';
import { calibrationMaximum } from './calibrationMaximum';
import { binReadings, sampleBinsAtDepths } from './gridSampling';
import type { McPlan } from './monteCarloPlan';
import { scoringGrid, type ScoringGrid } from './scenario';
import { makeSpectrumSampler } from './spectrumSampler';
import type { EnergyTally } from './transport';
import { convertMethodDose, depthConversionFactors } from '../dose/doseConversion';

/** Planar dose (x across the field, z down the central axis), dose per MU. */
export interface McPlane {
  xCm: number[];
  /** Depth bin centres (cm). */
  depthCm: number[];
  /** Row per depth: dose per MU (cGy/MU) at each x. */
  dosePerMuCGy: number[][];
}

export interface McResult {
  method: MethodResult;
  histories: number;
  batchesDone: number;
  batches: number;
  seed: number;
  /** Per-bin dose per fluence of the case, the water run and the calibration run. */
  depthDose: { case: McDepthDose; water: McDepthDose; reference: McDepthDose };
  referenceDMaxCm: number;
  /** cGy/MU per (Gy·cm² per photon): multiply a dose per fluence by this to get dose per MU. */
  muPerFluence: number;
  /** CF = D_case/D_water (and its 1σ) at each point of interest (null where not scored). */
  pointCf: { cf: number | null; sigmaCf: number }[];
  plane: McPlane;
  energyBalance: EnergyTally;
}

/** Flag of a Monte Carlo point withheld for want of an uncertainty. */
export const MC_SIGMA_UNKNOWN =
  'MC: no value, 1σ unknown (fewer than two batches scored dose here: run more histories)';

export function finalizeMonteCarlo(
  plan: McPlan,
  accumulators: readonly BatchAccumulator[],
  depthGridCm: readonly number[],
): McResult {
  const opts = plan.options;
  const doseTo = opts.doseTo ?? 'medium';
  const dd = (i: number): McDepthDose => {
    const s = plan.scenarios[i]!;
    return depthDoseFromStatistics(
      s,
      scoringGrid(s, plan.binning),
      accumulators[i]!.caxStatistics(),
    );
  };
  const caseDd = dd(plan.roles.case);
  const waterDd = dd(plan.roles.water);
  const refDd = dd(plan.roles.reference);
  const max = calibrationOf(refDd, accumulators[plan.roles.reference]!, opts.referenceDMaxCm);
  const refRate = opts.referenceDosePerMuCGy ?? 1;
  const sc = opts.collimatorScatterFactor ?? 1;
  const muPerFluence = (refRate * sc) / max.value;
  const relRef = max.sigma / max.value;
  const caseScenario = plan.scenarios[plan.roles.case]!;
  const phantom = makeSlabPhantom(caseScenario.layers);
  const binCm = (caseDd.edgesCm[1] as number) - (caseDd.edgesCm[0] as number);

  const perMu = caseDd.dosePerFluenceGyCm2.map((d) => d * muPerFluence);
  const perMuSigma = caseDd.dosePerFluenceGyCm2.map((d, i) => {
    const rel = (caseDd.sigmaGyCm2[i] as number) / d;
    return d * muPerFluence * Math.sqrt(rel * rel + relRef * relRef);
  });
  const cf = caseDd.dosePerFluenceGyCm2.map(
    (d, i) => d / (waterDd.dosePerFluenceGyCm2[i] as number),
  );
  const cfSigma = cf.map((r, i) => {
    const a = (caseDd.sigmaGyCm2[i] as number) / (caseDd.dosePerFluenceGyCm2[i] as number);
    const b = (waterDd.sigmaGyCm2[i] as number) / (waterDd.dosePerFluenceGyCm2[i] as number);
    return r * Math.sqrt(a * a + b * b);
  });
  const acc = accumulators[plan.roles.case]!;
  const caseFactors = binDoseFactors(caseScenario, scoringGrid(caseScenario, plan.binning));
  /**
   * Dose per MU at depths and its 1σ: the case's part taken batch by batch on the reading itself
   * (interpolating the bins' σ would count neighbouring bins as fully correlated and overstate it
   * by up to √2 between bin centres), the calibration's part in quadrature.
   */
  const perMuAt = (depths: readonly number[]) => {
    const { value } = sampleBinsAtDepths(phantom, binCm, perMu, perMuSigma, depths);
    const sigma = binReadings(phantom, binCm, perMu.length, depths).map((r, k) => {
      const a = (caseFactors[r.i] as number) * muPerFluence * (r.j < 0 ? 1 : 1 - r.t);
      const b = r.j < 0 ? 0 : (caseFactors[r.j] as number) * muPerFluence * r.t;
      const s = acc.caxPairStatistics(r.i, a, r.j < 0 ? r.i : r.j, b).sigma;
      return Math.hypot(s, (value[k] as number) * relRef);
    });
    return { value, sigma };
  };
  const onGrid = perMuAt(depthGridCm);
  const cfGrid = sampleBinsAtDepths(phantom, binCm, cf, cfSigma, depthGridCm);
  const pointDepths = plan.points.map((p) => p.depthCm);
  const atPoints = perMuAt(pointDepths);
  const cfPoints = sampleBinsAtDepths(phantom, binCm, cf, cfSigma, pointDepths);
  const histories = acc.histories;
  const spectrum = makeSpectrumSampler(caseScenario.energy);
  const finite = (v: number): number | null => (Number.isFinite(v) ? v : null);
  // A value whose 1σ is unknown (fewer than two batches scored dose there) is withheld: with σ = 0
  // it would read as exact ("0 ± 0" where nothing was scored).
  const withSigma = (v: readonly number[], s: readonly number[]) =>
    v.map((x, i) => (Number.isFinite(s[i]) ? finite(x) : null));
  const scored: MethodResult = {
    id: 'monte-carlo',
    label: 'Monte Carlo',
    variant: [
      `${binCm.toFixed(3)} cm depth bins`,
      'central axis from laterally integrated pencil deposits over the field projected to each depth (reciprocity), inverse-square fluence',
      'CF against a Monte Carlo water run with the same set-up',
      `dose/MU calibrated by a water run 10 × 10 cm², SSD 100, d_max ${max.depthCm.toFixed(2)} cm = ${refRate} cGy/MU`,
      `S_c = ${sc}`,
      `${histories} histories in ${acc.completed} of ${plan.batches} batches, seed ${plan.seed}`,
      varianceNote(plan),
      spectrum.approximate ? 'spectrum approximate (derived stand-in)' : 'published spectrum',
      caseScenario.parallel
        ? 'no contaminant electrons'
        : 'contaminant electrons of the modelled beam',
    ].join('; '),
    methodClass: 'type C',
    waterData: 'not used (Monte Carlo from spectra and cross sections)',
    curve: {
      depthCm: [...depthGridCm],
      dosePerMuCGy: withSigma(onGrid.value, onGrid.sigma),
      cf: withSigma(cfGrid.value, cfGrid.sigma),
      sigmaDosePerMuCGy: onGrid.sigma.map((s) => (Number.isFinite(s) ? s : 0)),
      sigmaCf: cfGrid.sigma.map((s) => (Number.isFinite(s) ? s : 0)),
    },
    points: plan.points.map((p, i) => {
      const dose = atPoints.value[i] as number;
      const sigma = atPoints.sigma[i] as number;
      const flags: string[] = [];
      // As on the curve: no value without a known 1σ (the point check would read σ = 0 as exact).
      const known = Number.isFinite(sigma) && Number.isFinite(dose);
      if (!known) flags.push(MC_SIGMA_UNKNOWN);
      else if (!(sigma / dose <= 0.02)) flags.push('MC 1σ > 2 %');
      return {
        id: p.id,
        depthCm: p.depthCm,
        cf: known ? finite(cfPoints.value[i] as number) : null,
        dosePerMuCGy: known ? dose : null,
        sigmaDosePerMuCGy: known ? sigma : 0,
        flags,
      };
    }),
  };
  // Scored as dose to medium; dose to water through the one conversion module.
  const method = convertMethodDose(scored, doseTo, phantom, caseScenario.energy);
  const grid = scoringGrid(caseScenario, plan.binning);
  const plane = planeOf(grid, acc.lateralMean(), phantom, caseScenario.ssdCm, muPerFluence);
  const rowFactors = depthConversionFactors(
    method.id,
    doseTo,
    phantom,
    caseScenario.energy,
    plane.depthCm,
  );
  const pointFactors = depthConversionFactors(
    method.id,
    doseTo,
    phantom,
    caseScenario.energy,
    pointDepths,
  );
  return {
    method,
    histories,
    batchesDone: acc.completed,
    batches: plan.batches,
    seed: plan.seed,
    depthDose: { case: caseDd, water: waterDd, reference: refDd },
    referenceDMaxCm: max.depthCm,
    muPerFluence,
    // CF at each point in the same convention as the method (the measured-table calibration
    // multiplies it by the table's water dose per MU).
    pointCf: plan.points.map((_, i) => {
      const cfi = cfPoints.value[i] as number;
      const sigma = cfPoints.sigma[i] as number;
      const k = pointFactors[i] ?? 1;
      return Number.isFinite(cfi) && Number.isFinite(sigma)
        ? { cf: cfi * k, sigmaCf: sigma * k }
        : { cf: null, sigmaCf: 0 };
    }),
    plane: {
      ...plane,
      dosePerMuCGy: plane.dosePerMuCGy.map((row, i) => row.map((v) => v * (rowFactors[i] ?? 1))),
    },
    energyBalance: acc.energy(),
  };
}

/** How the run reduced its variance (stated with every result). */
function varianceNote(plan: McPlan): string {
  const vr = plan.variance[plan.roles.case];
  if (!vr) return 'analogue transport (no variance reduction)';
  return `variance reduction (unbiased): first interaction of the incident photons forced into the depths feeding the points and the calibration window, Russian roulette (survival 1/${Math.round(1 / vr.survival)}) of electrons and positrons that cannot reach them; the curve away from the points is noisier`;
}

/** Box filter of the lateral deposit histogram by the field width at each depth (see depthDoseScorer). */
function planeOf(
  grid: ScoringGrid,
  lateral: Float64Array,
  phantom: ReturnType<typeof makeSlabPhantom>,
  ssdCm: number,
  muPerFluence: number,
): McPlane {
  const step = 0.5;
  const half = (grid.halfXCm[grid.nDepth - 1] as number) + 3;
  const xs: number[] = [];
  for (let x = -Math.floor(half / step) * step; x <= half + 1e-9; x += step)
    xs.push(Math.round(x * 1e6) / 1e6);
  const rows: number[][] = [];
  const depths: number[] = [];
  const dz = grid.depthBinCm;
  for (let iz = 0; iz < grid.nDepth; iz++) {
    const zc = (iz + 0.5) * dz;
    depths.push(zc);
    const mass =
      cumulativeMassThicknessGPerCm2(phantom, Math.min(phantom.totalThicknessCm, (iz + 1) * dz)) -
      cumulativeMassThicknessGPerCm2(phantom, iz * dz);
    const factor =
      ((GRAY_PER_MEV_PER_G * (FIELD_DEFINITION_DISTANCE_CM / (ssdCm + zc)) ** 2) / mass) *
      muPerFluence;
    const hx = grid.halfXCm[iz] as number;
    const row: number[] = [];
    for (const x of xs) {
      let e = 0;
      for (let ix = 0; ix < grid.nLateral; ix++) {
        const xc = grid.lateralStartCm + (ix + 0.5) * grid.lateralBinCm;
        if (Math.abs(x - xc) < hx) e += lateral[iz * grid.nLateral + ix] ?? 0;
      }
      row.push(e * factor);
    }
    rows.push(row);
  }
  return { xCm: xs, depthCm: depths, dosePerMuCGy: rows };
}

/**
 * The calibration run's maximum: with the water data's nominal d_max, a fit over bins fixed in
 * advance (no selection bias) whose σ is taken batch by batch; without it (no water data), the
 * run's own fitted maximum.
 */
function calibrationOf(
  refDd: McDepthDose,
  acc: BatchAccumulator,
  nominalDMaxCm: number | undefined,
): { depthCm: number; value: number; sigma: number } {
  if (nominalDMaxCm === undefined) return depthOfMaximum(refDd);
  const fit = calibrationMaximum(refDd, nominalDMaxCm);
  // Dose per fluence is the deposit per history times a per-bin factor: carry the weights over.
  const mean = acc.caxStatistics().mean;
  const onDeposits = fit.weights.map((w, i) => {
    const m = mean[i] as number;
    return w === 0 || !(m > 0) ? 0 : (w * (refDd.dosePerFluenceGyCm2[i] as number)) / m;
  });
  return {
    depthCm: fit.depthCm,
    value: fit.value,
    sigma: acc.caxLinearStatistics(onDeposits).sigma,
  };
}
