// The command line's threaded Monte Carlo through the one calculation contract: --mc-threads
// changes who runs the batches, never the document; and the page's route (worker-prepared run
// options, the worker pool, the run attached to a purpose 'plan' request) prints the same document.
// A measured table (calibration CF_MC × the table's water dose) and dose to medium (converted in
// the engine) are both exercised.
import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import {
  calculateDocument,
  jsonOf,
  planOptionsOf,
  type CliCalc,
} from '../../../src/cli/checkCommand';
import { mcOptionsOf } from '../../../src/cli/mcArgs';
import { closeMonteCarloThreads } from '../../../src/cli/mcThreads';
import { calculatePlanRequest, prepareMonteCarlo } from '../../../src/compute/calculationService';
import { startMonteCarlo } from '../../../src/compute/mcPool';
import { runBatch } from '../../../src/engine/montecarlo/runBatch';
import { CASE_FORMAT, CASE_VERSION, type LaminaCase } from '../../../src/io/caseSchema';

const table = (name: string) => readFileSync(`public/tables/${name}`, 'utf8');

// Water, lung and water with a point in each medium; the demo 6 MV measured table (derived data).
const CASE: LaminaCase = {
  format: CASE_FORMAT,
  version: CASE_VERSION,
  name: 'threads',
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 8, fieldYCm: 8 },
  layers: [
    { materialId: 'water', thicknessCm: 3 },
    { materialId: 'lung', thicknessCm: 5 },
    { materialId: 'water', thicknessCm: 6 },
  ],
  points: [
    { id: 'P1', depthCm: 5 },
    { id: 'P2', depthCm: 10 },
  ],
  waterData: {
    kind: 'tmr',
    fileName: 'demo-6mv-tmr.csv',
    csv: table('demo-6mv-tmr.csv'),
    referenceDosePerMuCGy: 0.8,
    scatterFileName: 'demo-6mv-scatter.csv',
    scatterCsv: table('demo-6mv-scatter.csv'),
  },
};

const FLAGS: [string, string][] = [
  ['methods', 'water,superposition,monte-carlo'],
  ['mc-histories', '3000'],
  ['seed', '5'],
  ['dose-to', 'medium'],
];

function cliDocument(threads: number): string {
  const flags = new Map<string, string | true>([...FLAGS, ['mc-threads', String(threads)]]);
  const calc: CliCalc = {
    water: { kind: 'case' },
    options: { ...planOptionsOf(flags), ...mcOptionsOf(flags) },
  };
  const answer = calculateDocument({ ok: true, raw: CASE }, calc);
  if (!answer.ok) throw new Error(JSON.stringify(answer.problems));
  return JSON.stringify(jsonOf(answer.report, answer.isPlan));
}

afterAll(() => closeMonteCarloThreads());

describe('--mc-threads through the calculation contract', () => {
  it('1, 2 and 3 threads print the same JSON document for a seed (measured table, dose to medium)', () => {
    const one = cliDocument(1);
    expect(cliDocument(2)).toBe(one);
    expect(cliDocument(3)).toBe(one);
    // The document does carry a calibrated Monte Carlo in dose to medium (not an empty answer).
    expect(one).toMatch(/"id":"monte-carlo"/);
    expect(one).toMatch(/CF × its water dose per MU/);
    expect(one).toMatch(/"quantity":"medium"/);
  });

  it("the page's route (worker-prepared options, worker pool, run attached to the plan request) prints the same document", async () => {
    const setup = prepareMonteCarlo({
      purpose: 'monte-carlo',
      case: CASE,
      water: { kind: 'case' },
      run: { histories: 3000, seed: 5, doseTo: 'medium' },
    });
    if (!setup.ok) throw new Error(JSON.stringify(setup.problems));
    const result = await startMonteCarlo(CASE, setup.options, () => {}, {
      workers: 2,
      depthGridCm: setup.depthGridCm,
      createWorker: () => ({
        runBatch: (task) => new Promise((resolve) => setTimeout(() => resolve(runBatch(task)))),
        dispose: () => {},
      }),
    }).done;
    const { method, pointCf, histories, batchesDone, batches, seed } = result;
    const page = calculatePlanRequest({
      purpose: 'plan',
      plan: CASE,
      water: { kind: 'case' },
      options: planOptionsOf(new Map(FLAGS)),
      mcRun: {
        key: setup.key,
        run: { method, pointCf, histories, batchesDone, batches, seed },
        note: null,
      },
    });
    if (!page.ok) throw new Error(JSON.stringify(page.problems));
    expect(JSON.stringify(jsonOf(page.report, page.isPlan))).toBe(cliDocument(2));
  });
});
