// The worker API's water-table entry points through comlink over a MessageChannel: the table
// crosses the boundary as CSV text and is rebuilt into WaterData inside the worker.
import * as Comlink from 'comlink';
import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import { computeApi, type ComputeApi } from '../../../src/compute/computeApi';

const { port1, port2 } = new MessageChannel();
Comlink.expose(computeApi, port1);
const remote = Comlink.wrap<ComputeApi>(port2);

afterAll(() => {
  remote[Comlink.releaseProxy]();
  port1.close();
  port2.close();
});

const demo: unknown = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
const TMR_CSV = readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8');
const SCATTER_CSV = readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8');

describe('computeApi water tables over comlink', () => {
  it('parseWaterTable returns a summary with the TMR grid for plotting', async () => {
    const r = await remote.parseWaterTable({
      kind: 'tmr',
      fileName: 'demo-6mv-tmr.csv',
      csv: TMR_CSV,
      scatterCsv: SCATTER_CSV,
      scatterFileName: 'demo-6mv-scatter.csv',
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.summary.dMaxCm).toBe(1.5);
    expect(r.summary.tmrGrid.sidesCm[0]).toBe(3);
    expect(r.summary.tmrGrid.tmr.length).toBe(r.summary.tmrGrid.depthsCm.length);
    expect(r.summary.scatter?.psf?.length).toBe(r.summary.scatter?.sidesCm.length);
  });

  it('parseWaterTable returns row/column problems for a malformed table', async () => {
    const r = await remote.parseWaterTable({
      kind: 'tmr',
      fileName: 'x.csv',
      csv: 'd,5,10\n0,1\n',
    });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.problems).toContain(
      'x.csv: row 2: has 2 cells, the header has 3 (ragged row)',
    );
  });

  it('calculateCase rebuilds the water data from CSV text and returns type-A methods', async () => {
    const r = await remote.calculateCase({
      purpose: 'full',
      case: demo,
      water: {
        kind: 'table',
        table: { kind: 'tmr', fileName: 'demo-6mv-tmr.csv', csv: TMR_CSV, dMaxCm: 1.5 },
      },
      options: { methods: ['rtmr', 'etar'], typeA: { etarRhoTilde: 0.5 } },
    });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.report.methods.map((m) => m.id)).toEqual(['rtmr', 'etar']);
    expect(r.report.methods[1]?.variant).toMatch(/ρ̃ = 0\.5 \(entered\)/);
  });

  it('calculateCase reports an invalid water table as problems on "waterTable"', async () => {
    const r = await remote.calculateCase({
      purpose: 'full',
      case: demo,
      water: { kind: 'table', table: { kind: 'pdd', fileName: 'p.csv', csv: TMR_CSV } },
    });
    expect(r.ok).toBe(false);
    expect(!r.ok && r.problems[0]).toEqual({
      path: 'waterTable',
      message: 'p.csv: a PDD table needs its SSD (cm)',
    });
  });
});
