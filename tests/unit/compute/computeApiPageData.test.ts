// What the page asks of the compute worker because the water data lives there: the record's water
// factor chains and the Monte Carlo calibration, through comlink (the worker's structured-clone
// boundary), agreeing with the calculation itself.
import { afterAll, describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { readFileSync } from 'node:fs';
import { computeApi, type ComputeApi } from '../../../src/compute/computeApi';
import { monteCarloCalibration } from '../../../src/compute/monteCarloCalibration';
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

describe('computeApi.waterChains', () => {
  it('gives at each point the water dose per MU the calculation draws (modelled beam)', async () => {
    const chains = await remote.waterChains(demo, { waterSource: 'modelled' });
    const calc = await remote.calculate(demo, { waterSource: 'modelled' });
    expect(chains.ok && calc.ok).toBe(true);
    if (!chains.ok || !calc.ok) return;
    const water = calc.report.methods.find((m) => m.id === 'water');
    expect(Object.keys(chains.chains).sort()).toEqual(calc.report.points.map((p) => p.id).sort());
    for (const p of water?.points ?? []) {
      const chain = chains.chains[p.id];
      expect(chain?.formula).toMatch(/^D\/MU = /);
      // Same water data, same factor chain: equal to rounding.
      expectRelClose(chain?.dosePerMuCGy ?? NaN, p.dosePerMuCGy ?? NaN, 1e-12);
    }
  });

  it('falls back to the modelled beam for a case without its own table', async () => {
    // The demo lung case carries no measured table.
    expect((validateCase(demo) as { value?: { waterData?: unknown } }).value?.waterData).toBe(
      undefined,
    );
    const fromCase = await remote.waterChains(demo, { waterSource: 'case' });
    const modelled = await remote.waterChains(demo, { waterSource: 'modelled' });
    expect(fromCase.ok && Object.keys(fromCase.chains).length).toBeGreaterThan(0);
    expect(fromCase).toEqual(modelled);
  });

  it('returns problems for an invalid case', async () => {
    const r = await remote.waterChains({ format: 'lamina.case', version: 1 });
    expect(r.ok).toBe(false);
  });
});

describe('computeApi.monteCarloCalibration', () => {
  it('answers what monteCarloCalibration(...) gives in-process', async () => {
    const v = validateCase(demo);
    if (!v.ok) throw new Error('demo case invalid');
    for (const source of ['modelled', 'table']) {
      const r = await remote.monteCarloCalibration(demo, source);
      expect(r).toEqual({ ok: true, calibration: monteCarloCalibration(v.value, source) });
    }
  });

  it('returns problems for an invalid case', async () => {
    const r = await remote.monteCarloCalibration({ format: 'lamina.case' }, 'modelled');
    expect(r.ok).toBe(false);
  });
});
