// The page's Monte Carlo run helpers: typed histories and seed, the case key that ties a run to
// its case, and the wording of progress and uncertainty.
import { describe, expect, it } from 'vitest';
import { monteCarloRunKey } from '../../../src/compute/monteCarloRunKey';
import {
  HISTORY_LIMITS,
  HISTORY_PRESETS,
  formatDoseSigma,
  formatElapsed,
  fractionDone,
  groupDigits,
  isRunCurrent,
  parseHistories,
  parseSeed,
  projectedRelativeSigma,
  remainingMs,
} from '../../../src/ui/montecarlo/mcRunModel';
import { expectRelClose } from '../../helpers/expectClose';
import { fromCaseFile, toCaseFile, type EditorCase } from '../../../src/state/editorCase';
import { PRESETS } from '../../../src/state/presets';

const chest = () => fromCaseFile(PRESETS[0]!.make());
/** The run key of an editor case (src/compute/monteCarloRunKey), as the page computes it. */
const monteCarloCaseKey = (
  c: EditorCase,
  water: 'case' | 'modelled',
  doseTo: 'water' | 'medium' = 'water',
) => monteCarloRunKey(toCaseFile(c), { kind: water }, doseTo);

describe('parseHistories', () => {
  it('parseHistories(...) reads plain, grouped and exponent forms', () => {
    expect(parseHistories('200000')).toEqual({ ok: true, value: 200_000 });
    expect(parseHistories(' 1 000 000 ')).toEqual({ ok: true, value: 1_000_000 });
    expect(parseHistories('1_000_000')).toEqual({ ok: true, value: 1_000_000 });
    expect(parseHistories('2e5')).toEqual({ ok: true, value: 200_000 });
    expect(parseHistories('5E6')).toEqual({ ok: true, value: 5_000_000 });
  });

  it('parseHistories(...) refuses text, fractions and values outside the limits with a message', () => {
    const bad = (t: string) => {
      const r = parseHistories(t);
      return r.ok ? null : r.message;
    };
    expect(bad('')).toMatch(/^Histories: "" is not a number/);
    expect(bad('12abc')).toBe('Histories: "12abc" is not a number');
    expect(bad('1e999')).toMatch(/is not a number/);
    expect(bad('2500.5')).toBe('Histories: must be a whole number');
    expect(bad(String(HISTORY_LIMITS.min - 1))).toBe(
      'Histories: must be between 1 000 and 50 000 000',
    );
    expect(bad(String(HISTORY_LIMITS.max + 1))).toMatch(/must be between/);
    expect(bad('-5000')).toMatch(/must be between/);
  });

  it('every preset passes the typed-value check', () => {
    for (const p of HISTORY_PRESETS) expect(parseHistories(String(p.histories)).ok).toBe(true);
  });
});

describe('parseSeed', () => {
  it('parseSeed(...) takes whole numbers 0 … 2³² − 1 and refuses the rest', () => {
    expect(parseSeed('0')).toEqual({ ok: true, value: 0 });
    expect(parseSeed('4294967295')).toEqual({ ok: true, value: 4294967295 });
    expect(parseSeed('4294967296').ok).toBe(false);
    expect(parseSeed('-1').ok).toBe(false);
    expect(parseSeed('1.5').ok).toBe(false);
    expect(parseSeed('x')).toEqual({ ok: false, message: 'Seed: "x" is not a whole number' });
  });
});

describe('formatting', () => {
  it('groupDigits(...) groups by three with spaces', () => {
    expect(groupDigits(0)).toBe('0');
    expect(groupDigits(999)).toBe('999');
    expect(groupDigits(1000)).toBe('1 000');
    expect(groupDigits(5_000_000)).toBe('5 000 000');
  });

  it('formatDoseSigma(...) gives the 1σ absolute and in per cent', () => {
    // 0.004 / 0.8 = 0.5 %
    expect(formatDoseSigma(0.8, 0.004)).toEqual({
      absolute: '0.800 ± 0.004 cGy/MU',
      relative: '0.50 %',
    });
    // 0.15 / 1.2 = 12.5 %: one decimal once the uncertainty is ≥ 10 %
    expect(formatDoseSigma(1.2, 0.15).relative).toBe('12.5 %');
  });

  it('formatDoseSigma(...) shows a dash, never NaN, without a positive dose', () => {
    for (const d of [null, 0, Number.NaN, -1])
      expect(formatDoseSigma(d, 0.01)).toEqual({ absolute: '—', relative: '—' });
  });

  it('formatElapsed(...) uses seconds under a minute, then minutes and seconds', () => {
    expect(formatElapsed(4200)).toBe('4.2 s');
    expect(formatElapsed(65_400)).toBe('1 min 05 s');
    expect(formatElapsed(Number.NaN)).toBe('—');
  });

  it('fractionDone(...) stays within 0–1 and is 0 with nothing planned', () => {
    expect(fractionDone(3, 12)).toBe(0.25);
    expect(fractionDone(0, 0)).toBe(0);
    expect(fractionDone(13, 12)).toBe(1);
  });
});

describe('monteCarloCaseKey', () => {
  it('an edit of the beam, a layer or a point changes the key; name and labels do not', () => {
    const c = chest();
    const key = monteCarloCaseKey(c, 'modelled');
    expect(monteCarloCaseKey({ ...c, name: 'renamed', notes: 'x' }, 'modelled')).toBe(key);
    const relabelled = { ...c, layers: c.layers.map((l) => ({ ...l, label: 'z' })) };
    expect(monteCarloCaseKey(relabelled, 'modelled')).toBe(key);
    const thicker = { ...c, layers: c.layers.map((l, i) => (i ? l : { ...l, thicknessCm: 4 })) };
    expect(monteCarloCaseKey(thicker, 'modelled')).not.toBe(key);
    const denser = {
      ...c,
      layers: c.layers.map((l, i) => (i ? l : { ...l, densityGPerCm3: 1.2 })),
    };
    expect(monteCarloCaseKey(denser, 'modelled')).not.toBe(key);
    const wider = { ...c, beam: { ...c.beam, fieldXCm: 12 } };
    expect(monteCarloCaseKey(wider, 'modelled')).not.toBe(key);
    const moved = { ...c, points: c.points.map((p) => ({ ...p, depthCm: p.depthCm + 1 })) };
    expect(monteCarloCaseKey(moved, 'modelled')).not.toBe(key);
    // The same case with its own measured table: 'case' reads the table, so the key differs.
    const table = fromCaseFile({
      ...PRESETS[0]!.make(),
      waterData: { kind: 'tmr', fileName: 't.csv', csv: 'd,10\n1.5,1\n10,0.8\n' },
    });
    expect(monteCarloCaseKey(table, 'case')).not.toBe(monteCarloCaseKey(table, 'modelled'));
  });

  it('the planning values leave the key alone; the dose convention changes it', () => {
    const c = chest();
    const key = monteCarloCaseKey(c, 'modelled');
    // A planning MU or dose typed in the check is a value to compare with, not physics.
    const planned = {
      ...c,
      beam: { ...c.beam, planningMu: 123.4 },
      points: c.points.map((p) => ({ ...p, planningDoseCGy: 150 })),
    };
    expect(toCaseFile(planned).beam.planningMu).toBe(123.4);
    expect(monteCarloCaseKey(planned, 'modelled')).toBe(key);
    // A run reports one convention: a run in the other one is stale.
    expect(monteCarloCaseKey(c, 'modelled', 'medium')).not.toBe(key);
    expect(monteCarloCaseKey(c, 'modelled', 'water')).toBe(key);
  });

  it('a fresh copy of the same case (new editor keys) has the same key', () => {
    expect(monteCarloCaseKey(chest(), 'modelled')).toBe(monteCarloCaseKey(chest(), 'modelled'));
  });

  it('isRunCurrent(...) is false before any run and when the keys differ', () => {
    expect(isRunCurrent(null, 'k')).toBe(false);
    expect(isRunCurrent('a', 'b')).toBe(false);
    expect(isRunCurrent('k', 'k')).toBe(true);
  });
});

describe('run outlook', () => {
  it('remainingMs(...) extrapolates the time so far and is null before any batch', () => {
    // A quarter done in 10 s: three quarters left at the same rate, 30 s.
    expect(remainingMs(10_000, 0.25)).toBe(30_000);
    expect(remainingMs(10_000, 1)).toBe(0);
    expect(remainingMs(10_000, 0)).toBeNull();
  });

  it('projectedRelativeSigma(...) scales the 1σ by √(N_now / N_planned)', () => {
    // 2 % after 1/4 of the histories → 1 % at the end (σ ∝ 1/√N).
    expectRelClose(projectedRelativeSigma(0.02, 250_000, 1_000_000)!, 0.01, 1e-12);
    expect(projectedRelativeSigma(0.02, 1_000_000, 1_000_000)).toBe(0.02);
    expect(projectedRelativeSigma(0.02, 0, 1_000_000)).toBeNull();
  });
});
