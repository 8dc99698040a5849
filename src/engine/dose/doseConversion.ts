// The one place a dose changes convention. Each engine computes one quantity natively:
//  - type A (ratio of TMR, EPL with PDD, Batho forms, ETAR) and the water method start from water
//    data measured (or modelled) in water and correct the photon fluence: dose to water;
//  - the pencil beam and the superposition deposit water-kernel energy scaled by the relative
//    electron density and divide by the layer's mass density (the factor ρ_e/ρ in
//    slabSuperposition.ts and pencilBeam.ts): energy per gram of the medium with water's
//    interactions per electron — dose to medium in the electron-density (Compton) approximation;
//  - the Monte Carlo scores energy per gram of the medium it transports in: dose to medium.
// Conversions, per layer holding the depth (a point on an interface belongs to the upstream
// layer):
//  - type A, water → medium: × (μ_en/ρ)_m/(μ_en/ρ)_w, spectrum-weighted (muEnRatio.ts): the same
//    photon fluence under charged-particle equilibrium;
//  - superposition, pencil beam and Monte Carlo, medium → water: × s_w,m, the unrestricted
//    water/medium collision stopping-power ratio over the Compton electrons' slowing-down
//    spectrum (stoppingPowerRatio.ts): a small water cavity in the medium's electron fluence.
// The water method (a water phantom throughout) is the same in both conventions. Curves, points,
// CF and the Monte Carlo's σ scale with the factor.
import type { BeamEnergy } from '../beam/energies';
import { beamSpectrum, type Spectrum } from '../kernels/spectrum';
import type { MaterialId } from '../materials/materialLibrary';
import type { MethodResult } from '../methodResult';
import { NATIVE_MEDIUM_METHOD_IDS, WATER_PHANTOM_METHOD_IDS } from '../methodRegistry';
import { layerIndexAtDepth, type SlabPhantom } from '../phantom/slabPhantom';
import { doseQuantityLabel, type DoseQuantity } from './doseQuantity';
import { muEnRatioToWater } from './muEnRatio';
import { meanElectronStartMeV, stoppingPowerRatioWaterToMedium } from './stoppingPowerRatio';

export type ConversionKind = 'mu-en' | 'stopping-power' | 'none';

/** Method ids whose native dose is dose to medium (registry; the rest are dose to water). */
const NATIVE_MEDIUM = new Set<string>(NATIVE_MEDIUM_METHOD_IDS);
/** Methods computed in water throughout: the same number in both conventions. */
const WATER_PHANTOM = new Set<string>(WATER_PHANTOM_METHOD_IDS);

export function nativeDoseQuantity(methodId: string): DoseQuantity {
  return NATIVE_MEDIUM.has(methodId) ? 'medium' : 'water';
}

function conversionKind(methodId: string): ConversionKind {
  if (WATER_PHANTOM.has(methodId)) return 'none';
  return NATIVE_MEDIUM.has(methodId) ? 'stopping-power' : 'mu-en';
}

/** What a result's dose is and how it got there, printed with the result. */
export interface DoseNote {
  quantity: DoseQuantity;
  native: DoseQuantity;
  /** How the native dose was converted, or "native". */
  conversion: string;
}

/**
 * Factor from the method's native dose to `to` for a material: 1 when no conversion is needed.
 * mu-en: D_m/D_w = (μ_en/ρ) ratio; stopping-power: D_w/D_m = s_w,m.
 */
export function conversionFactor(
  methodId: string,
  to: DoseQuantity,
  materialId: MaterialId,
  spectrum: Spectrum,
): number {
  const kind = conversionKind(methodId);
  if (kind === 'none' || to === nativeDoseQuantity(methodId) || materialId === 'water') return 1;
  return kind === 'mu-en'
    ? muEnRatioToWater(materialId, spectrum)
    : stoppingPowerRatioWaterToMedium(materialId, spectrum);
}

/** Factors by method kind, convention, beam energy and material (they never change). */
const factorCache = new Map<string, number>();

/** Factor per layer of the phantom. */
export function layerConversionFactors(
  methodId: string,
  to: DoseQuantity,
  phantom: SlabPhantom,
  energy: BeamEnergy,
): number[] {
  const kind = conversionKind(methodId);
  return phantom.layers.map((l) => {
    const key = `${kind}|${nativeDoseQuantity(methodId)}|${to}|${energy}|${l.materialId}`;
    let f = factorCache.get(key);
    if (f === undefined) {
      f = conversionFactor(methodId, to, l.materialId, beamSpectrum(energy));
      factorCache.set(key, f);
    }
    return f;
  });
}

export function doseNoteOf(methodId: string, to: DoseQuantity, energy: BeamEnergy): DoseNote {
  const native = nativeDoseQuantity(methodId);
  const kind = conversionKind(methodId);
  if (kind === 'none')
    return { quantity: to, native: to, conversion: 'water phantom: the same in both conventions' };
  if (to === native) return { quantity: to, native, conversion: 'native' };
  const conversion =
    kind === 'mu-en'
      ? `${doseQuantityLabel(native)} × (μ_en/ρ)_medium/(μ_en/ρ)_water of the layer, weighted by the ${energy} primary energy fluence (NIST)`
      : `${doseQuantityLabel(native)} × s_water,medium of the layer: unrestricted collision stopping-power ratio (ESTAR) over the slowing-down spectrum of Compton electrons from the ${energy} primary spectrum (mean start ${meanElectronStartMeV(beamSpectrum(energy)).toFixed(2)} MeV)`;
  return { quantity: to, native, conversion };
}

const scaled = (v: number | null, f: number): number | null => (v === null ? null : v * f);

/** A method's result in the chosen convention: every dose, CF and σ times its layer's factor. */
export function convertMethodDose(
  method: MethodResult,
  to: DoseQuantity,
  phantom: SlabPhantom,
  energy: BeamEnergy,
): MethodResult {
  const factors = layerConversionFactors(method.id, to, phantom, energy);
  const dose = doseNoteOf(method.id, to, energy);
  if (factors.every((f) => f === 1)) return { ...method, dose };
  const at = (depthCm: number) => factors[layerIndexAtDepth(phantom, depthCm)] ?? 1;
  const c = method.curve;
  const f = c.depthCm.map(at);
  const curve = {
    ...c,
    dosePerMuCGy: c.dosePerMuCGy.map((v, i) => scaled(v, f[i] as number)),
    cf: c.cf.map((v, i) => scaled(v, f[i] as number)),
    ...(c.sigmaDosePerMuCGy
      ? { sigmaDosePerMuCGy: c.sigmaDosePerMuCGy.map((v, i) => v * (f[i] as number)) }
      : {}),
    ...(c.sigmaCf ? { sigmaCf: c.sigmaCf.map((v, i) => v * (f[i] as number)) } : {}),
  };
  const points = method.points.map((p) => {
    const k = at(p.depthCm);
    return {
      ...p,
      cf: scaled(p.cf, k),
      dosePerMuCGy: scaled(p.dosePerMuCGy, k),
      ...(p.sigmaDosePerMuCGy !== undefined ? { sigmaDosePerMuCGy: p.sigmaDosePerMuCGy * k } : {}),
    };
  });
  return { ...method, curve, points, dose };
}

/** The factor at each depth of a grid (for planes and tallies given per depth). */
export function depthConversionFactors(
  methodId: string,
  to: DoseQuantity,
  phantom: SlabPhantom,
  energy: BeamEnergy,
  depthCm: readonly number[],
): number[] {
  const factors = layerConversionFactors(methodId, to, phantom, energy);
  return depthCm.map((d) => factors[layerIndexAtDepth(phantom, d)] ?? 1);
}
