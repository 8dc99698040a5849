// The page's calculation scheduler, as a plain class (no React, no DOM): tested in Node with fake
// workers, driven by the thin hook src/ui/useCompute.ts.
// Every edit asks the preview worker for the 'preview' purpose (fast methods, coarse grid; drawn
// at once, the slower methods carried over from the last full result and marked as updating) and
// the compute worker for the 'full' purpose; while a boundary is being moved only previews are
// asked for, and the full report once the move ends (a key nudge after NUDGE_SETTLE_MS of quiet).
// Both queues are latest-wins: older answers are dropped and waiting requests replaced, never
// queued. While a boundary is held, the preview worker also prepares the previews of its nearby
// snapped positions; an edit that lands on one is drawn from that in the same call as the edit.
import type { LaminaCase } from '../io/caseSchema';
import { makeLatestOnly, type LatestOnly } from '../state/latestOnly';
import { makeShowGate } from '../state/showGate';
import { makeRecentCache, SPECULATION_RADIUS_CM, speculationStats } from '../state/speculation';
import type { CalcRequest, McRunAttachment } from './calcRequest';
import type { CaseAnswer } from './calculationService';
import { mergePreviewReport } from './previewReport';
import type { WaterChoice } from './waterSource';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import type { CalcReport } from '../contract/reports';

type CaseRequest = Extract<CalcRequest, { purpose: 'preview' | 'full' }>;

/** What the scheduler needs of a worker (the comlink remote, or a fake in tests). */
export interface CaseCalculator {
  calculateCase(req: CaseRequest): Promise<CaseAnswer>;
}

/**
 * The inputs of one calculation: the case as a file, the water source, the dose convention and
 * the current MC run.
 */
export interface CalcSnapshot {
  raw: LaminaCase;
  water: WaterChoice;
  doseTo: DoseQuantity;
  mcRun: McRunAttachment | null;
}

/** What the scheduler hands to the screen (the store's calc slice takes it as a patch). */
export interface CalcPatch {
  status?: 'idle' | 'running' | 'done' | 'invalid' | 'error';
  report?: CalcReport | null;
  problems?: { path: string; message: string }[];
  error?: string | null;
  requestId?: number;
  elapsedMs?: number | null;
  updatingMethodIds?: readonly string[];
}

export interface SchedulerDeps {
  fullWorker: () => CaseCalculator;
  previewWorker: () => CaseCalculator;
  show: (patch: CalcPatch) => void;
  now?: () => number;
  /** Waits for the input's frame to paint before preparing previews (default: a macrotask). */
  yieldToPaint?: () => Promise<void>;
}

/** After a key nudge the full calculation waits this long for another nudge (ms). */
export const NUDGE_SETTLE_MS = 250;

/**
 * Previews kept for instant reuse: about 40 kB of JSON each on the chest preset, so 120 entries
 * (three sweeps of a held boundary) stay under about 10 MB.
 */
export const PREVIEW_CACHE_ENTRIES = 120;

/** The exact input a preview was computed for: the case file, the water data and dose convention. */
export function previewKey(raw: LaminaCase, water: WaterChoice, doseTo: DoseQuantity): string {
  return `${water}|${doseTo}|${JSON.stringify(raw)}`;
}

type Tagged =
  { seq: number; ok: true; answer: CaseAnswer } | { seq: number; ok: false; error: unknown };

interface Asked extends CalcSnapshot {
  seq: number;
}

/** A held boundary's sweep: which boundary, and the candidates around its current position. */
export interface SweepSource {
  /** Depth of boundary k now (cm), or undefined when it no longer exists. */
  boundaryAt(k: number): number | undefined;
  /** The snapshots of boundary k moved to its snapped positions around `aroundCm`, nearest first. */
  candidates(k: number, aroundCm: number): CalcSnapshot[];
}

export class CalcScheduler {
  private seq = 0;
  private readonly gate = makeShowGate();
  private lastFull: CalcReport | null = null;
  private readonly started = new Map<number, number>();
  private readonly cache = makeRecentCache<CalcReport>(PREVIEW_CACHE_ENTRIES);
  private readonly keys = new Map<number, string>();
  private readonly full: LatestOnly<Asked>;
  private readonly preview: LatestOnly<Asked>;
  private settle: ReturnType<typeof setTimeout> | undefined;
  private sweep = 0;
  private sweepAround: { k: number; depthCm: number } | null = null;
  private readonly now: () => number;

  constructor(private readonly deps: SchedulerDeps) {
    this.now = deps.now ?? (() => performance.now());
    this.full = makeLatestOnly(
      this.calcIn('full'),
      (result, id, superseded) => this.deliverFull(result.ok ? result.value : null, id, superseded),
      (id) => {
        this.started.set(id, this.now());
        deps.show({ status: 'running', requestId: id });
        for (const k of this.started.keys()) if (k < id - 1) this.started.delete(k);
      },
    );
    this.preview = makeLatestOnly(this.calcIn('preview'), (result) =>
      this.deliverPreview(result.ok ? result.value : null),
    );
  }

  private calcIn(purpose: 'preview' | 'full'): (input: Asked) => Promise<Tagged> {
    return ({ seq, raw, water, doseTo, mcRun }) =>
      (purpose === 'full' ? this.deps.fullWorker() : this.deps.previewWorker())
        .calculateCase({
          purpose,
          case: raw,
          water: { kind: water },
          options: { doseTo },
          ...(purpose === 'full' && mcRun ? { mcRun } : {}),
        })
        .then(
          (answer): Tagged => ({ seq, ok: true, answer }),
          (error: unknown): Tagged => ({ seq, ok: false, error }),
        );
  }

  private deliverFull(t: Tagged | null, id: number, superseded: boolean): void {
    const t0 = this.started.get(id);
    this.started.delete(id);
    const elapsedMs = t0 === undefined ? null : this.now() - t0;
    // calcIn never rejects: failures arrive tagged.
    if (!t) return;
    if (t.ok && t.answer.ok) this.lastFull = t.answer.report;
    // A preview of a newer edit is already on screen: keep it (its full report is coming).
    if (!this.gate.full(t.seq)) return;
    if (!t.ok) {
      const e = t.error;
      // Nothing was calculated: the header must not say "calculated in …".
      this.deps.show({
        status: 'error',
        error: e instanceof Error ? e.message : String(e),
        elapsedMs: null,
        updatingMethodIds: [],
      });
      return;
    }
    const r = t.answer;
    // A superseded result still repaints; the newer one is on its way.
    const status = superseded ? 'running' : 'done';
    if (r.ok)
      this.deps.show({
        status,
        report: r.report,
        problems: [],
        error: null,
        elapsedMs,
        updatingMethodIds: [],
      });
    else
      this.deps.show({
        status: 'invalid',
        problems: r.problems,
        error: null,
        elapsedMs,
        updatingMethodIds: [],
      });
  }

  private deliverPreview(t: Tagged | null): void {
    // Failures and invalid cases are reported by the full calculation.
    if (!t || !t.ok || !t.answer.ok) return;
    const key = this.keys.get(t.seq);
    this.keys.delete(t.seq);
    if (key !== undefined) this.cache.set(key, t.answer.report);
    // Before the first full report there is nothing to carry over: wait for it instead of
    // showing a partial method set.
    if (!this.lastFull || !this.gate.preview(t.seq)) return;
    this.showPreview(t.answer.report, this.lastFull);
  }

  private showPreview(report: CalcReport, full: CalcReport): void {
    const merged = mergePreviewReport(report, full);
    this.deps.show({
      status: 'running',
      report: merged.report,
      problems: [],
      error: null,
      updatingMethodIds: merged.updatingIds,
    });
  }

  /** An edit (or a new water source, dose convention or Monte Carlo result): ask for what it needs. */
  ask(s: CalcSnapshot, wants: { full: boolean; preview: boolean }): void {
    this.clearSettle();
    this.seq += 1;
    const asked: Asked = { ...s, seq: this.seq };
    if (wants.preview) {
      const key = previewKey(s.raw, s.water, s.doseTo);
      const ready = this.lastFull ? this.cache.get(key) : undefined;
      if (ready && this.lastFull && this.gate.preview(this.seq)) {
        speculationStats.hits += 1;
        this.showPreview(ready, this.lastFull);
      } else {
        this.keys.set(this.seq, key);
        for (const old of this.keys.keys()) if (old < this.seq - 8) this.keys.delete(old);
        this.preview.request(asked);
      }
    }
    if (wants.full) this.full.request(asked);
  }

  /** A boundary move ended: a drag asks for the full calculation now, a nudge once keys settle. */
  moveEnded(nudge: boolean, current: () => CalcSnapshot): void {
    this.clearSettle();
    if (nudge)
      this.settle = setTimeout(
        () => this.ask(current(), { full: true, preview: false }),
        NUDGE_SETTLE_MS,
      );
    else this.ask(current(), { full: true, preview: false });
  }

  private clearSettle(): void {
    clearTimeout(this.settle);
    this.settle = undefined;
  }

  /**
   * Prepare the previews of boundary k's nearby positions, one at a time through the preview
   * worker, nearest first; a newer request (another boundary, or the same one re-centred) ends the
   * older sweep; null stops preparing.
   */
  async speculate(k: number | null, source: SweepSource): Promise<void> {
    const id = ++this.sweep;
    if (k === null) {
      // The boundary was let go: stop preparing, and do not follow later edits.
      this.sweepAround = null;
      return;
    }
    // Let the frame of the input that asked for this paint first.
    await (this.deps.yieldToPaint?.() ?? new Promise((resolve) => setTimeout(resolve, 0)));
    const around = source.boundaryAt(k);
    if (id !== this.sweep || around === undefined) return;
    this.sweepAround = { k, depthCm: around };
    for (const candidate of source.candidates(k, around)) {
      if (id !== this.sweep) return;
      const key = previewKey(candidate.raw, candidate.water, candidate.doseTo);
      if (this.cache.has(key)) continue;
      try {
        const answer = await this.deps.previewWorker().calculateCase({
          purpose: 'preview',
          case: candidate.raw,
          water: { kind: candidate.water },
          options: { doseTo: candidate.doseTo },
        });
        if (answer.ok) {
          this.cache.set(key, answer.report);
          speculationStats.prepared += 1;
        }
      } catch {
        // The worker was lost: the live path reports it; preparing stops here.
        return;
      }
    }
  }

  /**
   * After an edit: re-centre the sweep when the held boundary has moved half the prepared radius;
   * start one when a boundary is moved (`held`) with no sweep going.
   */
  followSweep(held: number | null, source: SweepSource): void {
    if (!this.sweepAround) {
      if (held !== null) void this.speculate(held, source);
      return;
    }
    const at = source.boundaryAt(this.sweepAround.k);
    if (at !== undefined && Math.abs(at - this.sweepAround.depthCm) >= SPECULATION_RADIUS_CM / 2)
      void this.speculate(this.sweepAround.k, source);
  }

  /** Previews prepared and ready for reuse (tests). */
  get preparedCount(): number {
    return this.cache.size;
  }

  dispose(): void {
    this.clearSettle();
    this.sweep += 1;
    this.full.cancel();
    this.preview.cancel();
  }
}
