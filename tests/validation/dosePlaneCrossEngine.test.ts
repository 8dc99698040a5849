import { describe, expect, it } from 'vitest';
import { computeApi } from '../../src/compute/computeApi';
import { centralAxisMax, planeDifferencePercent } from '../../src/plots/planeGrid';
import { PRESETS } from '../../src/state/presets';
import { gridOfTypeB } from '../../src/ui/plane/planeSources';

function planes(presetId: string) {
  const c = PRESETS.find((p) => p.id === presetId)!.make();
  const sup = computeApi.dosePlane(c, { method: 'superposition', profileDepthsCm: [] });
  const pb = computeApi.dosePlane(c, { method: 'pencil-beam', profileDepthsCm: [] });
  if (!sup.ok || !pb.ok) throw new Error(`${presetId} did not calculate`);
  return { sup: gridOfTypeB(sup.plane), pb: gridOfTypeB(pb.plane) };
}

describe('dose planes across the two kernel engines', () => {
  it('planeDifferencePercent(superposition, pencil beam) stays within 1 % in the field core of a water phantom', () => {
    // Derived: the pencil kernel is the point kernel integrated along depth, so in homogeneous
    // water both engines describe the same dose; 1 % allows for the two discretisations
    // (pencil-kernel depth table, superposition grid). Core: |x| < 3 cm (field 10 × 10 at
    // 100 cm), beyond 2 cm depth (past d_max, where the two discretisations differ most).
    const { sup, pb } = planes('water');
    const d = planeDifferencePercent(sup, pb, centralAxisMax(pb));
    let worst = 0;
    let n = 0;
    d.depthCm.forEach((z, iz) =>
      d.xCm.forEach((x, ix) => {
        if (Math.abs(x) >= 3 || z <= 2) return;
        worst = Math.max(worst, Math.abs(d.values[iz]?.[ix] ?? Infinity));
        n++;
      }),
    );
    expect(n).toBeGreaterThan(500);
    expect(worst).toBeLessThan(1);
  });
});
