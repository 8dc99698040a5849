// The page's calculation scheduler with fake workers, in Node: what is asked of the preview and
// compute workers for each edit, what reaches the screen and in which order.
import { afterEach, describe, expect, it, vi } from 'vitest';
import {
  CalcScheduler,
  NUDGE_SETTLE_MS,
  type CalcPatch,
  type CalcSnapshot,
  type CaseCalculator,
} from '../../../src/compute/calcScheduler';
import type { CaseAnswer } from '../../../src/compute/calculationService';
import type { CalcReport } from '../../../src/contract/reports';
import { CASE_FORMAT, CASE_VERSION, type LaminaCase } from '../../../src/io/caseSchema';

type Req = Parameters<CaseCalculator['calculateCase']>[0];

/** A worker whose answers the test releases one by one. */
function fakeWorker() {
  const pending: { req: Req; resolve: (a: CaseAnswer) => void; reject: (e: unknown) => void }[] =
    [];
  const worker: CaseCalculator = {
    calculateCase: (req) =>
      new Promise<CaseAnswer>((resolve, reject) => pending.push({ req, resolve, reject })),
  };
  return {
    worker,
    pending,
    /** Answer the oldest request with a report named after its case. */
    answer() {
      const p = pending.shift()!;
      p.resolve({ ok: true, report: reportOf(p.req) });
    },
  };
}

/** A stand-in report: the case name and the purpose tell which request it answers. */
function reportOf(req: Req): CalcReport {
  const c = req.case as LaminaCase;
  return {
    caseName: `${c.name}:${req.purpose}`,
    methods: [],
    points: [],
    depthCm: [0, 1],
  } as unknown as CalcReport;
}

const caseNamed = (name: string): LaminaCase => ({
  format: CASE_FORMAT,
  version: CASE_VERSION,
  name,
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [{ materialId: 'water', thicknessCm: 10 }],
  points: [],
});
const snap = (name: string): CalcSnapshot => ({
  raw: caseNamed(name),
  water: 'case',
  doseTo: 'water',
  mcRun: null,
});
const flush = () => new Promise((r) => setTimeout(r, 0));

function setup() {
  const full = fakeWorker();
  const preview = fakeWorker();
  const shown: CalcPatch[] = [];
  const scheduler = new CalcScheduler({
    fullWorker: () => full.worker,
    previewWorker: () => preview.worker,
    show: (p) => shown.push(p),
    now: () => 0,
    yieldToPaint: () => Promise.resolve(),
  });
  const shownNames = () => shown.filter((p) => p.report).map((p) => p.report!.caseName);
  return { full, preview, shown, shownNames, scheduler };
}

afterEach(() => vi.useRealTimers());

describe('CalcScheduler', () => {
  it('ask(...) sends purpose full and preview to their workers, with the water source', () => {
    const { full, preview, scheduler } = setup();
    scheduler.ask(snap('a'), { full: true, preview: true });
    expect(full.pending.map((p) => [p.req.purpose, p.req.water])).toEqual([
      ['full', { kind: 'case' }],
    ]);
    expect(preview.pending.map((p) => p.req.purpose)).toEqual(['preview']);
  });

  it('shows no preview before the first full report, then previews merged with it, and the full report last', async () => {
    const { full, preview, shownNames, scheduler } = setup();
    scheduler.ask(snap('a'), { full: true, preview: true });
    preview.answer();
    await flush();
    expect(shownNames()).toEqual([]);
    full.answer();
    await flush();
    expect(shownNames()).toEqual(['a:full']);
    scheduler.ask(snap('b'), { full: true, preview: true });
    preview.answer();
    await flush();
    expect(shownNames()).toEqual(['a:full', 'b:preview']);
    full.answer();
    await flush();
    expect(shownNames()).toEqual(['a:full', 'b:preview', 'b:full']);
  });

  it('is latest-wins: edits made while a calculation runs replace the waiting one', async () => {
    const { full, scheduler } = setup();
    scheduler.ask(snap('a'), { full: true, preview: false });
    scheduler.ask(snap('b'), { full: true, preview: false });
    scheduler.ask(snap('c'), { full: true, preview: false });
    expect(full.pending).toHaveLength(1);
    full.answer();
    await flush();
    // b was replaced by c before it started.
    expect(full.pending.map((p) => (p.req.case as LaminaCase).name)).toEqual(['c']);
  });

  it('an edit that lands on a prepared preview is drawn at once, without a worker call', async () => {
    const { full, preview, shownNames, scheduler } = setup();
    scheduler.ask(snap('a'), { full: true, preview: false });
    full.answer();
    await flush();
    const sweep = scheduler.speculate(0, {
      boundaryAt: () => 3,
      candidates: () => [snap('near-1'), snap('near-2')],
    });
    await flush();
    preview.answer();
    await flush();
    preview.answer();
    await sweep;
    expect(scheduler.preparedCount).toBe(2);
    scheduler.ask(snap('near-2'), { full: false, preview: true });
    expect(preview.pending).toHaveLength(0);
    expect(shownNames().at(-1)).toBe('near-2:preview');
  });

  it('moveEnded(nudge) asks for the full report once the keys have settled', async () => {
    vi.useFakeTimers();
    const { full, scheduler } = setup();
    scheduler.moveEnded(true, () => snap('n'));
    expect(full.pending).toHaveLength(0);
    vi.advanceTimersByTime(NUDGE_SETTLE_MS - 1);
    expect(full.pending).toHaveLength(0);
    vi.advanceTimersByTime(1);
    expect(full.pending).toHaveLength(1);
    // A drag asks at once (it waits behind the running one, latest-wins).
    scheduler.moveEnded(false, () => snap('d'));
    vi.useRealTimers();
    full.answer();
    await flush();
    expect(full.pending.map((p) => (p.req.case as LaminaCase).name)).toEqual(['d']);
  });

  it('a lost worker is shown as an error with no elapsed time', async () => {
    const { full, shown, scheduler } = setup();
    scheduler.ask(snap('a'), { full: true, preview: false });
    full.pending.shift()!.reject(new Error('worker lost'));
    await flush();
    expect(shown.at(-1)).toMatchObject({ status: 'error', error: 'worker lost', elapsedMs: null });
  });

  it('dispose() drops answers still on their way', async () => {
    const { full, shownNames, scheduler } = setup();
    scheduler.ask(snap('a'), { full: true, preview: false });
    scheduler.dispose();
    full.answer();
    await flush();
    expect(shownNames()).toEqual([]);
  });
});
