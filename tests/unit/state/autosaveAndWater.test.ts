import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  AUTOSAVE_KEY,
  loadCaseFromStorage,
  saveCaseToStorage,
  type StorageLike,
} from '../../../src/state/autosave';
import { presetById } from '../../../src/state/presets';
import { checkWaterDraft, draftOf, EMPTY_WATER_DRAFT } from '../../../src/state/waterDraft';

function memoryStorage(limitChars = Infinity): StorageLike & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return {
    map,
    getItem: (k) => map.get(k) ?? null,
    setItem: (k, v) => {
      if (v.length > limitChars) throw new DOMException('exceeded the quota', 'QuotaExceededError');
      map.set(k, v);
    },
  };
}

describe('autosave', () => {
  it('saveCaseToStorage(...) then loadCaseFromStorage(...) gives the same case back', () => {
    const s = memoryStorage();
    const c = presetById('rib')!.make();
    expect(saveCaseToStorage(s, c)).toEqual({ ok: true });
    expect(loadCaseFromStorage(s)).toEqual(c);
  });

  it('saveCaseToStorage(...) on full storage says so and suggests saving to a file', () => {
    const r = saveCaseToStorage(memoryStorage(10), presetById('rib')!.make());
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toMatch(/full.*save it to a file/);
  });

  it('saveCaseToStorage(null, ...) explains that autosave is off', () => {
    const r = saveCaseToStorage(null, presetById('rib')!.make());
    expect(!r.ok && r.message).toMatch(/does not allow local storage/);
  });

  it('loadCaseFromStorage(...) restores a case whose point lies below the phantom (edit in progress)', () => {
    const s = memoryStorage();
    const c = presetById('chest')!.make();
    c.layers = c.layers.slice(0, 2); // 11 cm deep; point P1 stays at 15 cm
    saveCaseToStorage(s, c);
    expect(loadCaseFromStorage(s)).toEqual(c);
  });

  it('loadCaseFromStorage(...) ignores text that is not a valid case', () => {
    const s = memoryStorage();
    s.setItem(AUTOSAVE_KEY, '{"format":"lamina.case","version":1}');
    expect(loadCaseFromStorage(s)).toBeNull();
  });
});

describe('checkWaterDraft(...)', () => {
  const tmr = readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8');
  const scatter = readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8');

  it('turns the demo TMR and scatter tables into inline water data, and draftOf(...) reverses it', () => {
    const draft = {
      ...EMPTY_WATER_DRAFT,
      fileName: 'demo-6mv-tmr.csv',
      csv: tmr,
      scatterFileName: 'demo-6mv-scatter.csv',
      scatterCsv: scatter,
    };
    const r = checkWaterDraft(draft);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.waterData).toEqual({
      kind: 'tmr',
      fileName: 'demo-6mv-tmr.csv',
      csv: tmr,
      scatterFileName: 'demo-6mv-scatter.csv',
      scatterCsv: scatter,
    });
    expect(r.summary.fieldRangeCm).toEqual([3, 40]);
    expect(checkWaterDraft(draftOf(r.waterData))).toEqual(r);
  });

  it('names the field of a typed number that does not parse', () => {
    const r = checkWaterDraft({ ...EMPTY_WATER_DRAFT, csv: tmr, dMaxText: '1,5cm' });
    expect(r).toEqual({ ok: false, problems: ['d_max (cm): "1,5cm" is not a number'] });
  });

  it('asks for a table when none is given', () => {
    const r = checkWaterDraft(EMPTY_WATER_DRAFT);
    expect(!r.ok && r.problems[0]).toMatch(/load a file or paste/);
  });
});
