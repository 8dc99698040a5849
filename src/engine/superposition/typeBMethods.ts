// The two type-B engines as MethodResults (central-axis curve, points, CF against the same
// geometry filled with water) and the x–z dose plane with lateral profiles for the page.
import type { BeamEnergy } from '../beam/energies';
import type { MethodResult } from '../methodResult';
import { radiologicalDepthCm, waterPhantom, type SlabPhantom } from '../phantom/slabPhantom';
import { kernelFormatDate, typeBModel } from './beamModel';
import { typeBDosePerMu, referencePoint, type TypeBEngine } from './typeBDose';
import type { SlabBeam } from './slabSuperposition';
import { depthConversionFactors, nativeDoseQuantity } from '../dose/doseConversion';
import type { DoseQuantity } from '../dose/doseQuantity';

export interface TypeBInput {
  energy: BeamEnergy;
  phantom: SlabPhantom;
  beam: SlabBeam;
  depthCm: readonly number[];
  points: readonly { id: string; depthCm: number }[];
}

const LABELS: Record<TypeBEngine, string> = {
  superposition: 'Superposition (point kernel, 3-D density scaling)',
  'pencil-beam': 'Pencil beam (1-D density scaling)',
};

const VARIANTS: Record<TypeBEngine, string> = {
  superposition:
    'Monte Carlo point kernel tilted along the rays and hardened with depth, rectilinear density scaling, TERMA per energy bin; contaminant electrons (fitted surface doses); 1 cGy/MU at d_max, 10 × 10, SSD 100',
  'pencil-beam':
    'Pencil kernel from the Monte Carlo point kernel (hardened with depth), read at radiological depth, lateral spread unscaled; contaminant electrons (fitted surface doses); 1 cGy/MU at d_max, 10 × 10, SSD 100',
};

/** The water-data string printed with type-B results. */
export function modelledBeamSource(energy: BeamEnergy): string {
  return `modelled beam (${energy}, generated ${kernelFormatDate()})`;
}

function pointFlags(engine: TypeBEngine, input: TypeBInput, depthCm: number, dMaxCm: number) {
  const flags: string[] = [];
  if (depthCm < dMaxCm) flags.push('build-up region (fitted contaminant-electron model)');
  if (engine === 'pencil-beam') {
    const depths = typeBModel(input.energy).pencil.depthsCm;
    if (radiologicalDepthCm(input.phantom, depthCm) > (depths[depths.length - 1] as number))
      flags.push('beyond the pencil-kernel depth table (clamped)');
  }
  return flags;
}

export function typeBMethodResult(engine: TypeBEngine, input: TypeBInput): MethodResult {
  const depths = [...input.depthCm, ...input.points.map((p) => p.depthCm)];
  const het = typeBDosePerMu(engine, input.energy, input.phantom, input.beam, depths, [0]);
  const water = typeBDosePerMu(
    engine,
    input.energy,
    waterPhantom(input.phantom.totalThicknessCm),
    input.beam,
    depths,
    [0],
  );
  const n = input.depthCm.length;
  const dMax = referencePoint(engine, input.energy).dMaxCm;
  const cfAt = (i: number) => (het[i] as number) / (water[i] as number);
  return {
    id: engine,
    label: LABELS[engine],
    variant: VARIANTS[engine],
    methodClass: 'type B',
    waterData: modelledBeamSource(input.energy),
    curve: {
      depthCm: [...input.depthCm],
      dosePerMuCGy: Array.from(het.subarray(0, n)),
      cf: Array.from({ length: n }, (_, i) => cfAt(i)),
    },
    points: input.points.map((p, k) => ({
      id: p.id,
      depthCm: p.depthCm,
      cf: cfAt(n + k),
      dosePerMuCGy: het[n + k] as number,
      flags: pointFlags(engine, input, p.depthCm, dMax),
    })),
  };
}

export interface DosePlane {
  method: TypeBEngine;
  depthCm: number[];
  lateralCm: number[];
  /** Dose per MU (cGy/MU), one row per depth. */
  dosePerMuCGy: number[][];
  /** Lateral profiles at the requested depths (cGy/MU over lateralCm). */
  profiles: { depthCm: number; dosePerMuCGy: number[] }[];
}

export interface DosePlaneOptions {
  method?: TypeBEngine;
  /** Grid step in depth and across (cm); default 0.25. */
  stepCm?: number;
  /** Half-width of the plane (cm); default 0.75 × the widest field at the deepest point + 3. */
  halfWidthCm?: number;
  /** Depths of the lateral profiles (cm). */
  profileDepthsCm?: readonly number[];
  /** Dose to medium (native) or dose to water (dose/doseConversion.ts), per depth row. */
  doseTo?: DoseQuantity;
}

function grid(from: number, to: number, step: number): number[] {
  const n = Math.max(1, Math.round((to - from) / step));
  return Array.from({ length: n + 1 }, (_, i) => from + ((to - from) * i) / n);
}

/** The x–z dose plane (y = 0) and lateral profiles from one type-B engine. */
export function typeBDosePlane(
  energy: BeamEnergy,
  phantom: SlabPhantom,
  beam: SlabBeam,
  options: DosePlaneOptions = {},
): DosePlane {
  const method = options.method ?? 'superposition';
  const step = options.stepCm ?? 0.25;
  const total = phantom.totalThicknessCm;
  const spread = Number.isFinite(beam.ssdCm) ? (beam.ssdCm + total) / 100 : 1;
  const half = options.halfWidthCm ?? 0.75 * beam.fieldXCm * spread + 3;
  const depthCm = grid(0, total, step);
  const halfSteps = Math.max(1, Math.ceil(half / step));
  const lateralCm = Array.from({ length: 2 * halfSteps + 1 }, (_, k) => (k - halfSteps) * step);
  // The beam and slabs are symmetric about the axis: compute x ≥ 0 and mirror.
  const right = lateralCm.slice(halfSteps);
  const nr = right.length;
  const dose = typeBDosePerMu(method, energy, phantom, beam, depthCm, right);
  const nx = lateralCm.length;
  const rows = depthCm.map((_, iz) =>
    lateralCm.map((_, ix) => dose[iz * nr + Math.abs(ix - halfSteps)] as number),
  );
  const profileDepths = (options.profileDepthsCm ?? []).filter((d) => d >= 0 && d <= total);
  const profileDose =
    profileDepths.length > 0
      ? typeBDosePerMu(method, energy, phantom, beam, profileDepths, lateralCm)
      : new Float64Array(0);
  const to = options.doseTo ?? nativeDoseQuantity(method);
  const rowFactor = depthConversionFactors(method, to, phantom, energy, depthCm);
  const profileFactor = depthConversionFactors(method, to, phantom, energy, profileDepths);
  return {
    method,
    depthCm,
    lateralCm,
    dosePerMuCGy: rows.map((row, iz) => row.map((v) => v * (rowFactor[iz] ?? 1))),
    profiles: profileDepths.map((d, k) => ({
      depthCm: d,
      dosePerMuCGy: Array.from(
        profileDose.subarray(k * nx, (k + 1) * nx),
        (v) => v * (profileFactor[k] ?? 1),
      ),
    })),
  };
}
