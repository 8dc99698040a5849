// Rectilinear density scaling of a water point kernel, with the Jacobian written out:
//   dD(r) = T(r′)·ρ(r′)·[ℓ²·h_w(ℓ, θ)]/|r − r′|² dV′,   ℓ = ∫_{r′→r} ρ dl
// (consistent with the scaling argument of Ahnesjö, Med. Phys. 16, 577 (1989), and with
// O'Connor's density-scaling theorem). In a uniform medium of density ρ, ℓ = ρ|x| and the factor
// becomes ρ³·h_w(ρ|x|, θ), so the dose in the scaled geometry equals the water dose.

/**
 * The density-scaled kernel factor ρ(r′)·ℓ²·h_w(ℓ, θ)/R² at geometric distance R (cm) and
 * radiological distance ℓ (cm), for a water kernel h_w (energy fraction per g of water).
 */
export function densityScaledKernel(
  waterKernel: (radiologicalCm: number, thetaRad: number) => number,
  sourceDensity: number,
  radiologicalCm: number,
  geometricCm: number,
  thetaRad: number,
): number {
  return (
    (sourceDensity * radiologicalCm * radiologicalCm * waterKernel(radiologicalCm, thetaRad)) /
    (geometricCm * geometricCm)
  );
}

/**
 * Mean relative electron density on the straight line between two depths (slabs: exact),
 * ρ̄ = (d′(z) − d′(z′))/(z − z′); `sameLayerDensity` is used when the depths coincide.
 * With it, ℓ = ρ̄·|r − r′| and the lateral coordinates of a source plane scale by ρ̄.
 */
export function meanDensityBetween(
  radiologicalACm: number,
  radiologicalBCm: number,
  depthACm: number,
  depthBCm: number,
  sameLayerDensity: number,
): number {
  const dz = depthACm - depthBCm;
  if (Math.abs(dz) < 1e-9) return sameLayerDensity;
  return (radiologicalACm - radiologicalBCm) / dz;
}
