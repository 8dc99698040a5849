// Nothing lost in browser storage: every earlier storage version restores, unreadable entries
// (damaged, foreign, from a newer Lamina) are kept under a backup key with a clear message, and
// full or missing storage never touches the case in memory.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCaseText, serializeCase } from '../../../src/io/caseFile';
import {
  AUTOSAVE_BACKUP_PREFIX,
  AUTOSAVE_KEY,
  loadCaseFromStorage,
  restoreAutosave,
  saveCaseToStorage,
  takeRestoreMessage,
  type StorageLike,
} from '../../../src/state/autosave';
import {
  AUTOSAVE_FORMAT,
  AUTOSAVE_STORAGE_VERSION,
  readAutosaveEntry,
  STORAGE_MIGRATIONS,
} from '../../../src/state/autosaveEntry';

const demo = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
if (!demo.ok) throw new Error('demo case must be valid');
const demoCase = demo.value;

/** A Storage stand-in: a quota in characters (keys + values), or a getItem that throws. */
class FakeStorage implements StorageLike {
  readonly map = new Map<string, string>();
  constructor(
    private readonly quotaChars = Infinity,
    private readonly readError: Error | null = null,
  ) {}
  getItem(key: string): string | null {
    if (this.readError) throw this.readError;
    return this.map.get(key) ?? null;
  }
  setItem(key: string, value: string): void {
    let used = key.length + value.length;
    for (const [k, v] of this.map) if (k !== key) used += k.length + v.length;
    if (used > this.quotaChars)
      throw new DOMException(
        "Failed to execute 'setItem' on 'Storage': exceeded the quota.",
        'QuotaExceededError',
      );
    this.map.set(key, value);
  }
  backups(): [string, string][] {
    return [...this.map].filter(([k]) => k.startsWith(AUTOSAVE_BACKUP_PREFIX));
  }
}

const UNREADABLE: [string, string, RegExp][] = [
  ['damaged JSON', '{"format":"lamina.autosave","vers', /not valid JSON/],
  [
    'a newer storage version',
    JSON.stringify({ format: AUTOSAVE_FORMAT, version: 99, case: {} }),
    /newer Lamina.*99/,
  ],
  ['a foreign entry', JSON.stringify({ hello: 'world' }), /unknown format/],
  ['a non-object', '42', /not an object/],
  [
    'a case that no longer validates',
    JSON.stringify({ format: 'lamina.case', version: 1, name: 'x', layers: [] }),
    /case no longer reads/,
  ],
];

describe('versioned autosave entries', () => {
  it('has a migration for every storage version below the current one', () => {
    for (let v = 1; v < AUTOSAVE_STORAGE_VERSION; v++)
      expect(typeof STORAGE_MIGRATIONS[v], `migration ${v} → ${v + 1}`).toBe('function');
  });

  it('restores a storage-version-1 entry (the bare case document) unchanged', () => {
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, serializeCase(demoCase));
    const read = readAutosaveEntry(s.getItem(AUTOSAVE_KEY));
    expect(read).toMatchObject({ status: 'ok', fromVersion: 1, savedAt: null });
    expect(restoreAutosave(s)).toEqual({ value: demoCase, message: null });
  });

  it('writes the current envelope with its save time and reads it back', () => {
    const s = new FakeStorage();
    const when = new Date('2026-12-01T10:20:30.000Z');
    expect(saveCaseToStorage(s, demoCase, when)).toEqual({ ok: true });
    const stored = JSON.parse(s.getItem(AUTOSAVE_KEY) as string) as Record<string, unknown>;
    expect(stored).toMatchObject({
      format: AUTOSAVE_FORMAT,
      version: AUTOSAVE_STORAGE_VERSION,
      savedAt: '2026-12-01T10:20:30.000Z',
    });
    expect(readAutosaveEntry(s.getItem(AUTOSAVE_KEY))).toEqual({
      status: 'ok',
      value: demoCase,
      fromVersion: AUTOSAVE_STORAGE_VERSION,
      savedAt: '2026-12-01T10:20:30.000Z',
    });
  });

  it("keeps the check's settings (the case's check block) through a save and a restore", () => {
    const s = new FakeStorage();
    const withCheck = {
      ...demoCase,
      check: {
        prescription: { pointId: demoCase.points[0]!.id, doseCGy: 180 },
        tolerances: { homogeneousPercent: 3, heterogeneousPercent: 4 },
        checkMethodId: 'batho-modified' as const,
        doseTo: 'medium' as const,
      },
    };
    expect(saveCaseToStorage(s, withCheck)).toEqual({ ok: true });
    expect(restoreAutosave(s)).toEqual({ value: withCheck, message: null });
    // A case mid-edit (point below the phantom) restores leniently with its settings.
    const midEdit = {
      ...withCheck,
      points: [...withCheck.points, { id: 'deep', depthCm: 500 }],
    };
    expect(saveCaseToStorage(s, midEdit)).toEqual({ ok: true });
    expect(restoreAutosave(s).value?.check).toEqual(withCheck.check);
    // An entry written before the settings were saved restores without them (defaults).
    expect(saveCaseToStorage(s, demoCase)).toEqual({ ok: true });
    expect(restoreAutosave(s).value?.check).toBeUndefined();
  });

  it('saving over a version-1 entry upgrades it in place (a readable entry needs no backup)', () => {
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, serializeCase(demoCase));
    expect(saveCaseToStorage(s, { ...demoCase, name: 'edited' })).toEqual({ ok: true });
    expect(s.backups()).toEqual([]);
    expect(restoreAutosave(s).value?.name).toBe('edited');
  });

  it.each(UNREADABLE)('keeps %s under a backup key and says where', (_what, text, reason) => {
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, text);
    const r = restoreAutosave(s);
    expect(r.value).toBeNull();
    expect(r.message).toMatch(reason);
    const backups = s.backups();
    expect(backups).toHaveLength(1);
    const [key, kept] = backups[0] as [string, string];
    expect(kept).toBe(text);
    expect(r.message).toContain(`"${key}"`);
    // Restoring again (another reload) makes no second copy.
    restoreAutosave(s);
    expect(s.backups()).toHaveLength(1);
    // The next autosave may now replace the main entry; the backup stays.
    expect(saveCaseToStorage(s, demoCase)).toEqual({ ok: true });
    expect(s.getItem(key)).toBe(text);
    expect(restoreAutosave(s).value).toEqual(demoCase);
  });

  it('never overwrites an unreadable entry it could not back up (storage full)', () => {
    const damaged = '{"format":"lamina.autosave","version":2,"case":';
    const s = new FakeStorage(AUTOSAVE_KEY.length + damaged.length + 10);
    s.setItem(AUTOSAVE_KEY, damaged);
    const r = restoreAutosave(s);
    expect(r.message).toMatch(/could not be backed up \(storage is full\).*will not overwrite/);
    const before = structuredClone(demoCase);
    const saved = saveCaseToStorage(s, demoCase);
    expect(saved.ok).toBe(false);
    expect(!saved.ok && saved.message).toMatch(/Autosave paused.*save it to a file/);
    expect(s.getItem(AUTOSAVE_KEY)).toBe(damaged);
    expect(demoCase).toEqual(before);
  });
});

describe('full or unavailable storage', () => {
  it('a QuotaExceededError gives a clear message and leaves the case in memory as it was', () => {
    const s = new FakeStorage(50);
    const before = structuredClone(demoCase);
    const r = saveCaseToStorage(s, demoCase);
    expect(r).toEqual({
      ok: false,
      message:
        'Autosave failed: local storage is full. Your case is still here; save it to a file.',
    });
    expect(demoCase).toEqual(before);
    expect(s.map.size).toBe(0);
  });

  it('a full storage keeps the last good autosave readable', () => {
    const s = new FakeStorage(4000);
    expect(saveCaseToStorage(s, demoCase)).toEqual({ ok: true });
    const bigger = { ...demoCase, name: 'x'.repeat(5000) };
    expect(saveCaseToStorage(s, bigger).ok).toBe(false);
    expect(restoreAutosave(s).value).toEqual(demoCase);
  });

  it('no storage at all: restore and save both say autosave is off', () => {
    expect(restoreAutosave(null)).toEqual({
      value: null,
      message: expect.stringMatching(/Autosave is off.*Save the case to a file/) as string,
    });
    const r = saveCaseToStorage(null, demoCase);
    expect(!r.ok && r.message).toMatch(/Autosave is off/);
  });

  it('storage that throws on read (blocked) is reported, not fatal', () => {
    const s = new FakeStorage(Infinity, new DOMException('access denied', 'SecurityError'));
    expect(restoreAutosave(s)).toEqual({
      value: null,
      message: expect.stringMatching(/cannot be read \(access denied\)/) as string,
    });
  });

  it('loadCaseFromStorage(...) leaves its message for the page exactly once', () => {
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, 'not json');
    expect(loadCaseFromStorage(s)).toBeNull();
    expect(takeRestoreMessage()).toMatch(/could not be opened/);
    expect(takeRestoreMessage()).toBeNull();
  });
});

describe('lenient restore says what it left out and keeps the entry', () => {
  // A case saved mid-edit: P1 at 15 cm below a phantom thinned to 11 cm (not valid as a whole).
  const midEdit = () => {
    const c = structuredClone(demoCase) as typeof demoCase & Record<string, unknown>;
    c.layers = c.layers.slice(0, 2);
    return c;
  };
  const entryOf = (c: unknown) =>
    JSON.stringify({ format: AUTOSAVE_FORMAT, version: 2, savedAt: null, case: c });

  it('keeps the notes of a case restored leniently (they used to be dropped silently)', () => {
    const c = { ...midEdit(), notes: 'measured on 3 March' };
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, entryOf(c));
    const r = restoreAutosave(s);
    expect(r.value?.notes).toBe('measured on 3 March');
    expect(r.value?.points.map((p) => p.id)).toEqual(['P1', 'in-lung']);
    expect(r.message).toBeNull();
    expect(s.backups()).toEqual([]);
  });

  it('names a broken water table it leaves out, and keeps the entry under a backup key', () => {
    const c = {
      ...midEdit(),
      waterData: { kind: 'tmr', fileName: 'bad.csv', csv: 'depth,10\n0,abc\n' },
    };
    const text = entryOf(c);
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, text);
    const r = restoreAutosave(s);
    expect(r.value?.waterData).toBeUndefined();
    expect(r.message).toMatch(
      /^The autosaved case was restored without the measured water table \(bad\.csv: .+\)\. The entry as it was is kept unchanged in this browser's storage under "lamina\.autosave\.backup\.[0-9a-f]{8}"\.$/,
    );
    const [[key, kept]] = s.backups() as [[string, string]];
    expect(kept).toBe(text);
    expect(r.message).toContain(`"${key}"`);
    // The next autosave replaces the main entry; the backup stays, and a reload restores cleanly.
    expect(saveCaseToStorage(s, r.value!)).toEqual({ ok: true });
    expect(s.getItem(key)).toBe(text);
    expect(restoreAutosave(s).message).toBeNull();
  });

  it('names over-long notes and unknown fields it leaves out', () => {
    const c = { ...midEdit(), notes: 'x'.repeat(6000), colour: 'red' };
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, entryOf(c));
    const r = restoreAutosave(s);
    expect(r.value?.notes).toBeUndefined();
    expect(r.message).toMatch(
      /without the notes \(notes must be at most 5000 characters\); unknown field "colour"\./,
    );
  });

  it('names a check block it leaves out (an unknown deciding method) and keeps the rest', () => {
    const c = {
      ...midEdit(),
      check: { checkMethodId: 'no-such-method', doseTo: 'medium' },
    };
    const s = new FakeStorage();
    s.setItem(AUTOSAVE_KEY, entryOf(c));
    const r = restoreAutosave(s);
    expect(r.value?.check).toBeUndefined();
    expect(r.value?.points.map((p) => p.id)).toEqual(['P1', 'in-lung']);
    expect(r.message).toMatch(
      /without the check settings \(unknown method \(expected one of water, /,
    );
    expect(s.backups()).toHaveLength(1);
  });

  it('never overwrites an entry read only in part that it could not back up', () => {
    const c = { ...midEdit(), waterData: { kind: 'tmr', fileName: 'b.csv', csv: 'x' } };
    const text = entryOf(c);
    const s = new FakeStorage(AUTOSAVE_KEY.length + text.length + 10);
    s.setItem(AUTOSAVE_KEY, text);
    const r = restoreAutosave(s);
    expect(r.value).not.toBeNull();
    expect(r.message).toMatch(/could not be backed up \(storage is full\).*will not overwrite/);
    const saved = saveCaseToStorage(s, r.value!);
    expect(saved.ok).toBe(false);
    expect(s.getItem(AUTOSAVE_KEY)).toBe(text);
  });
});
