// What the page asks of the compute worker because the water data lives there: the record's water
// factor chains (with the plan calculation) and the Monte Carlo calibration (with the run's set-up),
// through comlink (the worker's structured-clone boundary), agreeing with the calculation itself.
import { afterAll, describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { readFileSync } from 'node:fs';
import { computeApi, type ComputeApi } from '../../../src/compute/computeApi';
import { monteCarloCalibration } from '../../../src/compute/monteCarloCalibration';
import { resolveWater } from '../../../src/compute/waterSource';
import { validateCase } from '../../../src/io/caseFile';
import { expectRelClose } from '../../helpers/expectClose';

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

describe("the plan calculation's water chains (computeApi.calculatePlan)", () => {
  it('give at each point the water dose per MU the calculation draws (modelled beam)', async () => {
    const plan = await remote.calculatePlan({
      purpose: 'plan',
      plan: demo,
      water: { kind: 'modelled' },
    });
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    const beam = plan.report.beams[0]!;
    const water = beam.report.methods.find((m) => m.id === 'water');
    expect(Object.keys(beam.waterChains).sort()).toEqual(
      beam.report.points.map((p) => p.id).sort(),
    );
    expect(water?.points.length).toBeGreaterThan(0);
    for (const p of water?.points ?? []) {
      const chain = beam.waterChains[p.id];
      expect(chain?.formula).toMatch(/^D\/MU = /);
      // Same water data, same factor chain: equal to rounding.
      expectRelClose(chain?.dosePerMuCGy ?? NaN, p.dosePerMuCGy ?? NaN, 1e-12);
    }
  });

  it('fall back to the modelled beam for a case without its own table', async () => {
    // The demo lung case carries no measured table.
    expect((validateCase(demo) as { value?: { waterData?: unknown } }).value?.waterData).toBe(
      undefined,
    );
    const chainsOf = async (kind: 'case' | 'modelled') => {
      const r = await remote.calculatePlan({ purpose: 'plan', plan: demo, water: { kind } });
      return r.ok ? r.report.beams[0]!.waterChains : null;
    };
    const fromCase = await chainsOf('case');
    expect(Object.keys(fromCase ?? {}).length).toBeGreaterThan(0);
    expect(fromCase).toEqual(await chainsOf('modelled'));
  });

  it('come back as problems for an invalid case', async () => {
    const r = await remote.calculatePlan({
      purpose: 'plan',
      plan: { format: 'lamina.case', version: 2 },
      water: { kind: 'case' },
    });
    expect(r.ok).toBe(false);
  });
});

describe("the Monte Carlo run's calibration (computeApi.prepareMonteCarlo)", () => {
  it('is what monteCarloCalibration(...) gives in-process', async () => {
    const v = validateCase(demo);
    if (!v.ok) throw new Error('demo case invalid');
    for (const kind of ['case', 'modelled'] as const) {
      const r = await remote.prepareMonteCarlo({
        purpose: 'monte-carlo',
        case: demo,
        water: { kind },
        run: { histories: 1000, seed: 1 },
      });
      const w = resolveWater(v.value, { kind });
      if (!w.ok) throw new Error('water data');
      expect(r.ok && r.calibration).toEqual(monteCarloCalibration(v.value, w.waterData));
    }
  });

  it('comes back as problems for an invalid case', async () => {
    const r = await remote.prepareMonteCarlo({
      purpose: 'monte-carlo',
      case: { format: 'lamina.case' },
      water: { kind: 'modelled' },
      run: { histories: 1000, seed: 1 },
    });
    expect(r.ok).toBe(false);
  });
});
