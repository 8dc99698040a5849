// Generalized Batho power law (Batho 1964; Sontag & Cunningham 1977; multi-layer form as in Webb &
// Fox 1980; all from memory):
//   CF = Π_{m=1..N} T(X_m + shift, s_d)^(ρ_m − ρ_{m−1})   (dose to water; the published
// form's factor (μ_en/ρ)_N/(μ_en/ρ)_w for dose to medium is applied by dose/doseConversion.ts,
// the same for every type-A method),
// X_m = d − z_top,m, ρ = relative electron density (exponents by ρ_e, for Compton-dominated beams
// μ_m/μ_w ≈ ρ_e,m), with the convention μ₀ ≡ μ_w (ρ₀ = 1) so homogeneous water gives CF = 1.
import type { LookupRecorder, WaterData } from '../beam/waterData';
import { layerIndexAtDepth, type SlabLayer, type SlabPhantom } from '../phantom/slabPhantom';
import {
  checkedCf,
  collectingRecorder,
  type CorrectionResult,
  type TypeAMethod,
} from './correctionTypes';
import {
  type BathoLayerTerm,
  type CorrectionExplanation,
  type ExplainFactor,
} from './correctionExplanation';

/** Symbol and label of layer m's factor, built once per layer (the curves call this per depth). */
const factorNames: { symbol: string; label: string }[][] = [[], []];
function layerFactorNames(m: number, shifted: boolean): { symbol: string; label: string } {
  const list = factorNames[shifted ? 1 : 0] as { symbol: string; label: string }[];
  let names = list[m];
  if (!names) {
    names = {
      symbol: `T(X_${m + 1}${shifted ? ' + z_bu' : ''})^(ρ_${m + 1} − ρ_${m})`,
      label: `layer ${m + 1}`,
    };
    list[m] = names;
  }
  return names;
}

/** The per-layer terms of a Batho product, filled when an explanation is asked for. */
export interface BathoTerms {
  layers: BathoLayerTerm[];
  /** The non-trivial factors, in the order they were multiplied. */
  factors: ExplainFactor[];
}

/**
 * Product of the power-law factors; `depthFunction` is T(x) at the point's field. With `terms`
 * the loop also records each layer's terms and each factor it multiplied (same values, same
 * order, so their product is `product`).
 */
export function bathoPowerLawProduct(
  phantom: SlabPhantom,
  pointDepthCm: number,
  shiftCm: number,
  depthFunction: (xCm: number) => number,
  terms?: BathoTerms,
): { product: number; smallestDistanceCm: number } {
  const n = layerIndexAtDepth(phantom, pointDepthCm);
  let product = 1;
  let previousRho = 1;
  let smallest = Infinity;
  for (let m = 0; m <= n; m++) {
    const layer = phantom.layers[m] as SlabLayer;
    const exponent = layer.relativeElectronDensity - previousRho;
    const xCm = pointDepthCm - layer.topCm;
    const term: BathoLayerTerm | null = terms
      ? {
          layerIndex: m,
          previousRho,
          rho: layer.relativeElectronDensity,
          exponent,
          distanceCm: xCm,
          readAtCm: xCm + shiftCm,
          depthFunction: null,
          factor: 1,
        }
      : null;
    if (term) terms?.layers.push(term);
    previousRho = layer.relativeElectronDensity;
    if (exponent === 0) continue;
    smallest = Math.min(smallest, xCm);
    const t = depthFunction(xCm + shiftCm);
    const factor = Math.pow(t, exponent);
    product *= factor;
    if (term) {
      term.depthFunction = t;
      term.factor = factor;
      terms?.factors.push({ ...layerFactorNames(m, shiftCm !== 0), value: factor });
    }
  }
  return { product, smallestDistanceCm: smallest };
}

/** The written-out terms of a Batho product (with T's name and the shift used). */
export function bathoExplanation(
  pointDepthCm: number,
  sideAtDepthCm: number,
  shiftCm: number,
  table: 'TMR' | 'TAR',
  p: BathoTerms,
): CorrectionExplanation {
  return {
    quantities: [
      { symbol: 'd', label: 'depth of the point', value: pointDepthCm, unit: 'cm' },
      { symbol: 's_d', label: 'field side at the depth', value: sideAtDepthCm, unit: 'cm' },
      {
        symbol: 'z_bu',
        label: `shift of every distance (T = ${table})`,
        value: shiftCm,
        unit: 'cm',
      },
    ],
    factors: p.factors,
    bathoLayers: p.layers,
  };
}

function depthFunctionOf(
  wd: WaterData,
  sideAtDepthCm: number,
  table: 'tmr' | 'tar',
  recorder: LookupRecorder,
): (xCm: number) => number {
  const psf = table === 'tar' ? wd.psf(sideAtDepthCm, recorder) : 1;
  return (xCm) => wd.tmr(xCm, sideAtDepthCm, recorder) * psf;
}

/**
 * Smallest exponent |ρ_m − ρ_{m−1}| for which the unshifted power law is withheld within d_max
 * below the top of layer m. There the factor T(X_m)^Δρ reads the build-up part of the table and
 * swings the result by tens of per cent (a 0.1 cm air gap gave CF 6.2, water just below dense bone
 * CF 22): undefined, as the method is (Thomas 1991). Smaller exponents (soft tissue, muscle, fat
 * against water) change the factor by a few per cent and keep the value with its flag.
 */
export const BATHO_WITHHELD_MIN_DELTA_RHO = 0.1;

/**
 * The interface that leaves the unshifted power law undefined at a depth: the nearest layer top
 * less than d_max above the point whose exponent |Δρ_e| ≥ BATHO_WITHHELD_MIN_DELTA_RHO (the
 * surface counts, against μ₀ ≡ water); null when there is none.
 */
export function unshiftedBathoUndefinedAt(
  phantom: SlabPhantom,
  pointDepthCm: number,
  dMaxCm: number,
): { interfaceCm: number; deltaRho: number } | null {
  const n = layerIndexAtDepth(phantom, pointDepthCm);
  let previousRho = 1;
  let found: { interfaceCm: number; deltaRho: number } | null = null;
  for (let m = 0; m <= n; m++) {
    const layer = phantom.layers[m] as SlabLayer;
    const deltaRho = layer.relativeElectronDensity - previousRho;
    previousRho = layer.relativeElectronDensity;
    if (Math.abs(deltaRho) < BATHO_WITHHELD_MIN_DELTA_RHO) continue;
    // 1e-9 cm: a point d_max below an interface, as summed layer tops round, is not within it.
    if (pointDepthCm - layer.topCm < dMaxCm - 1e-9) found = { interfaceCm: layer.topCm, deltaRho };
  }
  return found;
}

export const bathoMethod: TypeAMethod = {
  id: 'batho',
  label: 'Batho power law (generalized)',
  variant: (o) =>
    `${(o.bathoTable ?? 'tmr').toUpperCase()}, no shift, μ₀ ≡ water, exponents by ρ_e`,
  usesPsf: (o) => o.bathoTable === 'tar',
  correct(phantom, pointDepthCm, sideAtDepthCm, wd, options): CorrectionResult {
    const undefinedAt = unshiftedBathoUndefinedAt(phantom, pointDepthCm, wd.dMaxCm);
    if (undefinedAt)
      return {
        cf: null,
        flags: [
          `undefined: unshifted Batho ${(pointDepthCm - undefinedAt.interfaceCm).toFixed(2)} cm below the interface at ${undefinedAt.interfaceCm.toFixed(2)} cm (Δρ_e ${undefinedAt.deltaRho.toFixed(2)}), within d_max ${wd.dMaxCm.toFixed(2)} cm: the power law would read the build-up region (use batho-modified)`,
        ],
      };
    const { recorder, flags } = collectingRecorder();
    const t = depthFunctionOf(wd, sideAtDepthCm, options.bathoTable ?? 'tmr', recorder);
    const table = options.bathoTable ?? 'tmr';
    const terms: BathoTerms | undefined = options.explain ? { layers: [], factors: [] } : undefined;
    const { product, smallestDistanceCm } = bathoPowerLawProduct(
      phantom,
      pointDepthCm,
      0,
      t,
      terms,
    );
    const out = flags();
    if (smallestDistanceCm < wd.dMaxCm)
      out.push(
        `unshifted Batho: ${smallestDistanceCm.toFixed(2)} cm from an interface < d_max (power law in the build-up region)`,
      );
    if (!terms) return checkedCf(product, out);
    const explanation = bathoExplanation(
      pointDepthCm,
      sideAtDepthCm,
      0,
      table === 'tar' ? 'TAR' : 'TMR',
      terms,
    );
    return checkedCf(product, out, explanation);
  },
};
