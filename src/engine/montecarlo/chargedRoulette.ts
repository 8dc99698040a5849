// Variance reduction where it matters: Russian roulette of electrons and positrons that cannot
// reach a zone of interest (the depth bins a point of interest is read from, or the calibration
// fit's window). Such a particle is transported with probability p and weight ×1/p, else ended;
// the expected score of every bin, in or out of a zone, is unchanged (E[weight] = 1 for each
// particle), so the method stays unbiased everywhere. Inside the zones nothing changes except
// the bremsstrahlung and annihilation photons of rouletted particles; outside them the curve is
// noisier for the same histories, and much of the electron transport is skipped.
// Whether a particle can reach a zone: in slabs every path from depth z to a zone crosses at
// least the mass thickness between them along the axis, and an electron of kinetic energy T
// travels at most its CSDA range R(T) (steps lose energy continuously at S_tot); R is taken as
// the largest of the phantom's media, with a margin for the step discretisation. A wrong call
// would only cost variance, never bias.
import type { SlabPhantom } from '../phantom/slabPhantom';
import { electronGridPosition, electronTablesOf } from './electronTables';
import { atGrid } from './photonCrossSections';

/** A depth interval (cm) whose results are read. */
export interface DepthZone {
  fromCm: number;
  toCm: number;
}

/** What a run asks of the roulette: plain data, sent to workers with each batch. */
export interface ZoneRouletteSpec {
  zonesCm: DepthZone[];
  /** Probability p that a particle that cannot reach a zone is transported (weight ×1/p). */
  survival: number;
}

/** Path the steps may cover beyond R_CSDA (midpoint stopping powers, energy grid): a margin. */
const RANGE_MARGIN = 1.1;

export class ChargedRoulette {
  readonly survival: number;
  /** 1/p: the weight factor of a survivor. */
  readonly weightGain: number;
  private readonly zoneFromG: Float64Array;
  private readonly zoneToG: Float64Array;
  private readonly topCm: Float64Array;
  private readonly topG: Float64Array;
  private readonly density: Float64Array;
  private readonly rangeG: Float64Array;

  constructor(phantom: SlabPhantom, spec: ZoneRouletteSpec) {
    if (!(spec.survival > 0 && spec.survival <= 1))
      throw new RangeError('survival: must be in (0, 1]');
    if (spec.zonesCm.length === 0) throw new RangeError('zonesCm: needs at least one zone');
    this.survival = spec.survival;
    this.weightGain = 1 / spec.survival;
    const layers = phantom.layers;
    this.topCm = Float64Array.from(layers, (l) => l.topCm);
    this.density = Float64Array.from(layers, (l) => l.densityGPerCm3);
    this.topG = new Float64Array(layers.length);
    for (let i = 1; i < layers.length; i++)
      this.topG[i] =
        (this.topG[i - 1] as number) + layers[i - 1]!.thicknessCm * this.density[i - 1]!;
    const massAt = (zCm: number): number => {
      const z = Math.min(Math.max(zCm, 0), phantom.totalThicknessCm);
      let i = layers.length - 1;
      while (i > 0 && (this.topCm[i] as number) > z) i--;
      return (this.topG[i] as number) + (this.density[i] as number) * (z - this.topCm[i]!);
    };
    spec.zonesCm.forEach((zone, k) => {
      if (!(zone.toCm >= zone.fromCm))
        throw new RangeError(`zonesCm[${k}]: toCm must not be above fromCm`);
    });
    this.zoneFromG = Float64Array.from(spec.zonesCm, (zone) => massAt(zone.fromCm));
    this.zoneToG = Float64Array.from(spec.zonesCm, (zone) => massAt(zone.toCm));
    const tables = [...new Set(layers.map((l) => l.materialId))].map(electronTablesOf);
    const n = tables[0]!.csdaRangeGPerCm2.length;
    this.rangeG = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      let r = 0;
      for (const t of tables) r = Math.max(r, t.csdaRangeGPerCm2[k] as number);
      this.rangeG[k] = RANGE_MARGIN * r;
    }
  }

  /** Mass thickness (g/cm²) along the axis from depth z (in `region`) to the nearest zone. */
  massToZoneGPerCm2(z: number, region: number): number {
    const m =
      (this.topG[region] as number) +
      (this.density[region] as number) * (z - (this.topCm[region] as number));
    let best = Infinity;
    for (let k = 0; k < this.zoneFromG.length; k++) {
      const from = this.zoneFromG[k] as number;
      const to = this.zoneToG[k] as number;
      const d = m < from ? from - m : m > to ? m - to : 0;
      if (d < best) best = d;
    }
    return best;
  }

  /** Whether a charged particle of kinetic energy `kineticMeV` at depth z may reach a zone. */
  canReach(z: number, region: number, kineticMeV: number): boolean {
    const range = atGrid(this.rangeG, electronGridPosition(kineticMeV));
    return this.massToZoneGPerCm2(z, region) <= range;
  }
}
