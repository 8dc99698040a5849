// One beam's ray to its slab path: skin entry and exit from the body threshold, SSD and
// isocentre depth along the ray, the density profile through the calibration, and the slabs
// (segmentation, then the nearest library material or a custom density).
import { findBodyCrossing } from './bodyOutline';
import { densityProfileOf, type DensityProfile } from './densityProfile';
import type { ImportedBeam } from './importDicom';
import type { ImportSettings } from './importSettings';
import { materialForRhoE } from './materialMapping';
import { segmentProfile } from './segmentation';
import type { MaterialId } from '../engine/materials/materialLibrary';
import { LIMITS } from '../io/caseSchema';

export interface Slab {
  thicknessCm: number;
  /** Mean relative electron density of the run (from the CT), for display. */
  rhoE: number;
  materialId: MaterialId;
  /** Mass density (g/cm³); undefined = the material's default. */
  densityGPerCm3?: number | undefined;
}

export interface BeamAnalysis {
  /** Source to skin along the central ray (cm). */
  ssdCm: number;
  /** Skin to isocentre along the central ray (cm). */
  isoDepthCm: number;
  /** Skin entry to the last exit from the body (cm), before any cut at the case limit. */
  pathCm: number;
  profile: DensityProfile;
  slabs: Slab[];
  notes: string[];
}

export type BeamAnalysisResult = { ok: true; value: BeamAnalysis } | { ok: false; message: string };

/** Slabs cut to at most `maxCm` in total (the last slab shortened, later ones dropped). */
function cutAt(slabs: Slab[], maxCm: number): Slab[] {
  const out: Slab[] = [];
  let top = 0;
  for (const s of slabs) {
    if (top >= maxCm - 1e-9) break;
    const t = Math.min(s.thicknessCm, maxCm - top);
    out.push({ ...s, thicknessCm: t });
    top += t;
  }
  return out;
}

export function analyseBeam(beam: ImportedBeam, s: ImportSettings): BeamAnalysisResult {
  if (beam.refusal) return { ok: false, message: beam.refusal };
  if (!beam.ray) return { ok: false, message: 'no ray was traced for this beam' };
  const body = findBodyCrossing(beam.ray, s.bodyThresholdHu);
  if (!body.ok) return { ok: false, message: body.message };
  const { entryMm, exitMm, exitAtVolumeEdge } = body.value;
  const ssdCm = entryMm / 10;
  const isoDepthCm = (beam.sadMm - entryMm) / 10;
  const pathCm = (exitMm - entryMm) / 10;
  if (isoDepthCm < 0)
    return {
      ok: false,
      message: `the isocentre lies ${(-isoDepthCm).toFixed(2)} cm in front of the skin, in air`,
    };
  if (isoDepthCm > pathCm + 1e-6)
    return {
      ok: false,
      message: `the isocentre lies ${(isoDepthCm - pathCm).toFixed(2)} cm beyond the body's exit along the ray (${pathCm.toFixed(2)} cm of tissue)`,
    };
  const notes: string[] = [];
  const profile = densityProfileOf(beam.ray, body.value, s.calibration);
  if (profile.rhoE.length === 0)
    return { ok: false, message: 'no CT sample lies inside the body along the ray' };
  if (exitAtVolumeEdge)
    notes.push(
      'the body continues past the edge of the scanned volume: the slab path ends at the CT edge',
    );
  if (profile.aboveCurveCm > 0)
    notes.push(
      `${profile.aboveCurveCm.toFixed(2)} cm of the path lies above the calibration's highest HU (metal or contrast?): held at its last ρ_e`,
    );
  const runs = segmentProfile(profile.edgesCm, profile.rhoE, s.segmentation);
  let slabs: Slab[] = runs.map((r) => {
    const m = materialForRhoE(r.rhoE, s.materialToleranceRhoE);
    if (m.clamped)
      notes.push(`a slab of ρ_e ${r.rhoE.toFixed(3)} is held at the case's density limits`);
    return {
      thicknessCm: r.thicknessCm,
      rhoE: r.rhoE,
      materialId: m.materialId,
      densityGPerCm3: m.densityGPerCm3,
    };
  });
  const limit = LIMITS.maxPhantomThicknessCm;
  if (pathCm > limit) {
    slabs = cutAt(slabs, limit);
    notes.push(
      `the path through the body (${pathCm.toFixed(1)} cm) is cut at ${limit} cm, the longest slab stack a case holds`,
    );
  }
  return { ok: true, value: { ssdCm, isoDepthCm, pathCm, profile, slabs, notes } };
}
