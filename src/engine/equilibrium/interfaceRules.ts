// INTERFACE-DOWNSTREAM: just downstream of an interface where the density changes by
// |Δρ_e| ≥ 0.1, the electron fluence has not yet adapted to the new medium: the dose builds down
// on entering a lower density and builds up again on re-entering a higher one, over about one
// build-up distance d_max of water-equivalent depth. One-dimensional methods jump straight to the
// new equilibrium value.
import { depthAfterWaterEquivalentCm } from './depthBands';
import { qualityText, warningOverBand, type RuleContext } from './ruleContext';
import { fmt, methodScope, ONE_D_METHOD_IDS, type Warning, type WarningSeverity } from './warning';

/** Smallest density step that counts as an interface. */
export const INTERFACE_MIN_DELTA_RHO = 0.1;
/** Severity: caution from this step on (lung ↔ water ≈ 0.74); severe from the next one. */
export const INTERFACE_CAUTION_DELTA_RHO = 0.5;
/** Severe: cavity-like steps, or caution-size steps at high energy (TPR20,10 ≥ 0.75). */
export const INTERFACE_SEVERE_DELTA_RHO = 0.9;
export const INTERFACE_HIGH_ENERGY_TPR = 0.75;

export function interfaceWarnings(ctx: RuleContext): Warning[] {
  const { phantom } = ctx;
  const dMax = ctx.quality.dMaxCm;
  const layers = phantom.layers;
  const significant: number[] = [];
  for (let i = 1; i < layers.length; i++) {
    const delta =
      (layers[i]?.relativeElectronDensity ?? 1) - (layers[i - 1]?.relativeElectronDensity ?? 1);
    if (Math.abs(delta) >= INTERFACE_MIN_DELTA_RHO) significant.push(i);
  }
  const out: Warning[] = [];
  significant.forEach((i, k) => {
    const below = layers[i];
    const above = layers[i - 1];
    if (!below || !above) return;
    const deltaRho = below.relativeElectronDensity - above.relativeElectronDensity;
    const absDelta = Math.abs(deltaRho);
    const nextInterfaceCm =
      k + 1 < significant.length
        ? (layers[significant[k + 1] as number]?.topCm ?? phantom.totalThicknessCm)
        : phantom.totalThicknessCm;
    const reachCm = depthAfterWaterEquivalentCm(phantom, below.topCm, dMax);
    const toCm = Math.min(reachCm, nextInterfaceCm);
    const highEnergy = ctx.quality.tpr2010 >= INTERFACE_HIGH_ENERGY_TPR;
    const severity: WarningSeverity =
      absDelta >= INTERFACE_SEVERE_DELTA_RHO ||
      (highEnergy && absDelta >= INTERFACE_CAUTION_DELTA_RHO)
        ? 'severe'
        : absDelta >= INTERFACE_CAUTION_DELTA_RHO
          ? 'caution'
          : 'note';
    const buildDown = deltaRho < 0;
    const w = warningOverBand(
      ctx,
      { fromCm: below.topCm, toCm },
      {
        id: `INTERFACE-DOWNSTREAM@layer${i + 1}`,
        code: 'INTERFACE-DOWNSTREAM',
        severity,
        methods: methodScope(ONE_D_METHOD_IDS, ['pencil-beam', 'superposition']),
        numbers:
          `${buildDown ? 'build-down' : 're-build-up'} over d_max ${fmt(dMax)} cm water-equivalent ` +
          `(${fmt(toCm - below.topCm)} cm in ρ_e ${below.relativeElectronDensity.toFixed(3)}) below the interface at ${fmt(below.topCm)} cm; ` +
          `Δρ_e ${deltaRho.toFixed(3)} (severe ≥ ${INTERFACE_SEVERE_DELTA_RHO}, or ≥ ${INTERFACE_CAUTION_DELTA_RHO} when TPR20,10 ≥ ${INTERFACE_HIGH_ENERGY_TPR}; caution ≥ ${INTERFACE_CAUTION_DELTA_RHO}); ${qualityText(ctx)}`,
        values: { interfaceCm: below.topCm, deltaRho, dMaxCm: dMax, toCm },
        explanation: buildDown
          ? 'Entering the lower density, the dose falls gradually (build-down) as fewer electrons are set in motion; one-dimensional methods switch to the new level at once.'
          : 'Entering the higher density, the dose rebuilds towards the new equilibrium over about one build-up distance; one-dimensional methods ignore this (just beyond lung they overestimate the dose).',
        advice:
          'Prefer the Monte Carlo result here (superposition approximately); do not place a check point within this band.',
      },
    );
    if (w) out.push(w);
  });
  return out;
}
