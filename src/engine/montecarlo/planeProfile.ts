// Lateral dose profile at a depth from the Monte Carlo x–z plane (the row of the depth bin that
// holds the depth; bins are the plane's own, a depth on a bin edge belongs to the upstream bin).
import type { McPlane } from './monteCarloResult';

export function lateralProfileAtDepth(
  plane: McPlane,
  depthCm: number,
): { xCm: number[]; dosePerMuCGy: number[]; binDepthCm: number } {
  const d = plane.depthCm;
  if (d.length === 0) return { xCm: [], dosePerMuCGy: [], binDepthCm: NaN };
  const bin = d.length > 1 ? (d[1] as number) - (d[0] as number) : 2 * (d[0] as number);
  const i = Math.min(d.length - 1, Math.max(0, Math.ceil(depthCm / bin - 1e-9) - 1));
  return {
    xCm: [...plane.xCm],
    dosePerMuCGy: [...(plane.dosePerMuCGy[i] ?? [])],
    binDepthCm: d[i] as number,
  };
}
