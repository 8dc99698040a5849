import { afterAll, describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { readFileSync } from 'node:fs';
import { computeApi, type ComputeApi } from '../../../src/compute/computeApi';

// The worker API through comlink over an in-process MessageChannel: the same structured-clone
// boundary as the browser worker.
const { port1, port2 } = new MessageChannel();
Comlink.expose(computeApi, port1);
const remote = Comlink.wrap<ComputeApi>(port2);

afterAll(() => {
  remote[Comlink.releaseProxy]();
  port1.close();
  port2.close();
});

const demo: unknown = JSON.parse(
  readFileSync(new URL('../../../public/cases/lung-slab-6mv.json', import.meta.url), 'utf8'),
);

describe('computeApi over comlink', () => {
  it('radiologicalDepthCurve returns the water-equivalent depth of a lung stack', async () => {
    const c = await remote.radiologicalDepthCurve(
      [
        { materialId: 'custom', thicknessCm: 5, densityGPerCm3: 1 },
        { materialId: 'custom', thicknessCm: 10, densityGPerCm3: 0.25 },
      ],
      0.5,
    );
    expect(c.depthCm.length).toBe(31);
    expect(c.radiologicalDepthCm.at(-1)).toBeCloseTo(7.5, 12);
  });

  it('calculateCase validates and reports radiological depths at the points', async () => {
    const r = await remote.calculateCase({ purpose: 'full', case: demo, water: { kind: 'case' } });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const p1 = r.report.points.find((p) => p.id === 'P1');
    // 3 cm soft tissue (ρ_e 1.0502) + 8 cm lung (ρ_e 0.2578) + 4 cm soft tissue: Σ ρ_e·t
    expect(p1?.radiologicalDepthCm).toBeCloseTo(7 * 1.05016 + 8 * 0.257838, 3);
  });

  it('calculateCase returns problems, not a throw, for an invalid case', async () => {
    const r = await remote.calculateCase({
      purpose: 'full',
      case: { format: 'lamina.case', version: 1 },
      water: { kind: 'case' },
    });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.length).toBeGreaterThan(0);
  });
});
