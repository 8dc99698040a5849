// The factor view's two calls through comlink over an in-process MessageChannel (the browser
// worker's structured-clone boundary): the written-out factors and a sweep's typed arrays arrive
// intact and agree with the full calculation through the same channel.
import { afterAll, describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { readFileSync } from 'node:fs';
import { computeApi, type ComputeApi } from '../../../src/compute/computeApi';

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
const water = { kind: 'case' } as const;

describe('computeApi explainPoint and cfSweep over comlink', () => {
  it("explainPoint at P1 gives the full report's CF for Batho with its per-layer terms", async () => {
    const [e, r] = await Promise.all([
      remote.explainPoint({ case: demo, water, depthCm: 15 }),
      remote.calculateCase({ purpose: 'full', case: demo, water }),
    ]);
    if (!e.ok || !r.ok) throw new Error('valid demo');
    const batho = e.explanation.methods.find((m) => m.id === 'batho');
    const reported = r.report.methods.find((m) => m.id === 'batho')?.points[0]?.cf as number;
    expect(Math.abs((batho?.product as number) / reported - 1)).toBeLessThan(1e-9);
    expect(batho?.bathoLayers?.map((l) => l.layerIndex)).toEqual([0, 1, 2]);
  });

  it('cfSweep returns Float64Array series across the channel', async () => {
    const a = await remote.cfSweep({
      case: demo,
      water,
      variable: 'field',
      depthCm: 15,
      from: 5,
      to: 15,
      count: 3,
    });
    if (!a.ok) throw new Error(JSON.stringify(a.problems));
    expect(a.result.x).toBeInstanceOf(Float64Array);
    expect(a.result.series[0]?.cf).toBeInstanceOf(Float64Array);
    expect(Array.from(a.result.x)).toEqual([5, 10, 15]);
  });
});
