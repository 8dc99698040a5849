// Build-up rules. BUILDUP: the surface build-up region, radiological depth d′ < d_max.
// UNSHIFTED-BATHO: the power-law (Batho) correction without a build-up shift evaluates the
// water table at X_m = d − z_top,m; for X_m < d_max that look-up falls in the build-up region and
// the factor T(X_m)^(ρ_m − ρ_{m−1}) becomes unphysical (undefined closer to an interface than the
// build-up distance; Thomas, Med Phys 18:719, 1991).
import { BATHO_WITHHELD_MIN_DELTA_RHO } from '../corrections/batho';
import { depthAtRadiologicalDepthCm } from './depthBands';
import { qualityText, warningOverBand, type RuleContext } from './ruleContext';
import { fmt, methodScope, ONE_D_METHOD_IDS, type Warning, type WarningSeverity } from './warning';

export function buildupWarnings(ctx: RuleContext): Warning[] {
  const dMax = ctx.quality.dMaxCm;
  const toCm = depthAtRadiologicalDepthCm(ctx.phantom, dMax);
  const w = warningOverBand(
    ctx,
    { fromCm: 0, toCm },
    {
      id: 'BUILDUP',
      code: 'BUILDUP',
      severity: 'note',
      methods: methodScope(
        ['water', ...ONE_D_METHOD_IDS],
        ['pencil-beam', 'superposition', 'monte-carlo'],
      ),
      numbers: `radiological depth d′ < d_max ${fmt(dMax)} cm down to ${fmt(toCm)} cm; ${qualityText(ctx)}`,
      values: { dMaxCm: dMax, toCm },
      explanation:
        'In the surface build-up region the dose rises steeply and depends on electron contamination, so table-based results are only as good as the build-up part of the water data and kernel methods depend on their contamination model.',
      advice:
        'Avoid check points here; if one is needed, compare with measured build-up data rather than any calculated correction.',
    },
  );
  return w ? [w] : [];
}

/** Smallest exponent |ρ_m − ρ_{m−1}| that raises UNSHIFTED-BATHO (smaller factors stay within ~1 %). */
export const UNSHIFTED_BATHO_MIN_DELTA_RHO = 0.01;
/** Severity thresholds on |Δρ_e| (the power in the Batho product). */
export const UNSHIFTED_BATHO_CAUTION_DELTA_RHO = BATHO_WITHHELD_MIN_DELTA_RHO;
export const UNSHIFTED_BATHO_SEVERE_DELTA_RHO = 0.5;

export function unshiftedBathoWarnings(ctx: RuleContext): Warning[] {
  const dMax = ctx.quality.dMaxCm;
  const out: Warning[] = [];
  ctx.phantom.layers.forEach((layer, i) => {
    const upstreamRho = i === 0 ? 1 : (ctx.phantom.layers[i - 1]?.relativeElectronDensity ?? 1);
    const deltaRho = layer.relativeElectronDensity - upstreamRho;
    const absDelta = Math.abs(deltaRho);
    if (absDelta < UNSHIFTED_BATHO_MIN_DELTA_RHO) return;
    const severity: WarningSeverity =
      absDelta >= UNSHIFTED_BATHO_SEVERE_DELTA_RHO
        ? 'severe'
        : absDelta >= UNSHIFTED_BATHO_CAUTION_DELTA_RHO
          ? 'caution'
          : 'note';
    const w = warningOverBand(
      ctx,
      { fromCm: layer.topCm, toCm: layer.topCm + dMax },
      {
        id: `UNSHIFTED-BATHO@layer${i + 1}`,
        code: 'UNSHIFTED-BATHO',
        severity,
        methods: methodScope(['batho']),
        numbers:
          `X = d − ${fmt(layer.topCm)} cm < d_max ${fmt(dMax)} cm below the top of layer ${i + 1}; ` +
          `exponent Δρ_e ${deltaRho.toFixed(3)} (severe ≥ ${UNSHIFTED_BATHO_SEVERE_DELTA_RHO}, caution ≥ ${UNSHIFTED_BATHO_CAUTION_DELTA_RHO}); ${qualityText(ctx)}`,
        values: { interfaceCm: layer.topCm, deltaRho, dMaxCm: dMax },
        explanation:
          severity === 'note'
            ? 'The unshifted power law raises a build-up-region table value to the power Δρ here, which can swing the correction by tens of per cent (a numerical artefact, not physics).'
            : `The unshifted power law would raise a build-up-region table value to the power Δρ here, which swings the correction by tens of per cent (a numerical artefact, not physics), so Batho gives no value here (|Δρ_e| ≥ ${BATHO_WITHHELD_MIN_DELTA_RHO}).`,
        advice:
          'Use the modified (build-up-shifted) Batho, or the superposition or Monte Carlo result, for points this close to the interface.',
      },
    );
    if (w) out.push(w);
  });
  return out;
}
