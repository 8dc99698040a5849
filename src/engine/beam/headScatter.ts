// Collimator (head) scatter factor model of the modelled beams. The kernels describe the phantom
// only, so the change of in-air output with field size is a separate, documented model:
//   S_c(s) = [1 + A·(1 − e^(−s/λ))] / [1 + A·(1 − e^(−10/λ))],  A = 0.146, λ = 10.5 cm,
// s = equivalent square of the field at 100 cm. A and λ are a least-squares fit (ours) to typical
// 6 MV values S_c ≈ 0.95 (3×3), 0.97 (5×5), 1.03 (20×20), 1.05 (40×40) (from memory); the same
// curve is used for every energy, so it is a stand-in until measured S_c is entered.
export const HEAD_SCATTER_MODEL = {
  amplitude: 0.146,
  lengthCm: 10.5,
  description:
    'S_c(s) = [1 + 0.146(1 − e^(−s/10.5))]/[1 + 0.146(1 − e^(−10/10.5))], fitted to typical 6 MV values (from memory), all energies',
} as const;

function unnormalised(sideCm: number): number {
  return 1 + HEAD_SCATTER_MODEL.amplitude * (1 - Math.exp(-sideCm / HEAD_SCATTER_MODEL.lengthCm));
}

/** Modelled collimator-scatter factor for a square field of side `sideAt100Cm`, 1 at 10 × 10. */
export function modelledHeadScatter(sideAt100Cm: number): number {
  return unnormalised(sideAt100Cm) / unnormalised(10);
}
