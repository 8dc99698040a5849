// Beam geometry for the source: a point source at distance SSD above the surface (z = 0), the
// rectangular field defined at 100 cm from the source, the pencil beam along the central axis,
// and the contaminant electrons launched along it.
import { FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import type { Rng } from './rng';
import { sampleContaminantEnergyMeV, type ContaminantSource } from './contaminantSource';
import type { Transport } from './transport';

/** Entry point on the surface (z = 0) and unit direction of one source ray. */
export interface SourceRay {
  x: number;
  y: number;
  u: number;
  v: number;
  w: number;
}

/**
 * Divergent ray from a point source at (0, 0, −SSD): aim point uniform over the field rectangle
 * at 100 cm from the source (uniform fluence over the field plane), traced to the surface.
 */
export function sampleDivergentRay(
  ssdCm: number,
  fieldXCm: number,
  fieldYCm: number,
  rng: Rng,
  out: SourceRay,
): void {
  const ax = (rng.next() - 0.5) * fieldXCm;
  const ay = (rng.next() - 0.5) * fieldYCm;
  const d = FIELD_DEFINITION_DISTANCE_CM;
  const n = Math.sqrt(ax * ax + ay * ay + d * d);
  out.u = ax / n;
  out.v = ay / n;
  out.w = d / n;
  out.x = (ax * ssdCm) / d;
  out.y = (ay * ssdCm) / d;
}

/** Pencil beam along the central axis, entering at the origin. */
export function pencilRay(out: SourceRay): void {
  out.x = 0;
  out.y = 0;
  out.u = 0;
  out.v = 0;
  out.w = 1;
}

/**
 * After a photon history: the contaminant electrons of the beam (contaminantSource.ts), on
 * average `electronsPerPhoton`, along the central pencil from the origin.
 */
export function launchContaminantElectrons(
  source: ContaminantSource,
  transport: Transport,
  rng: Rng,
): void {
  const whole = Math.floor(source.electronsPerPhoton);
  const n = whole + (rng.next() < source.electronsPerPhoton - whole ? 1 : 0);
  for (let i = 0; i < n; i++)
    transport.runElectron(sampleContaminantEnergyMeV(source, rng), 0, 0, 0, 0, 0, 1, 0, rng);
}
