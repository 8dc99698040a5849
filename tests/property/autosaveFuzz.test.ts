// Browser-storage restore under generated entries: whatever text sits under the autosave key
// (current or version-1 entries, damaged, foreign, from a newer Lamina, random), restoring never
// throws, gives a case that validates (or the editor's lenient reading of one) or nothing, and
// an entry it cannot read, or reads only in part, is kept byte for byte under the backup key its
// message names (with what was left out).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { serializeCase, validateCase } from '../../src/io/caseFile';
import {
  AUTOSAVE_BACKUP_PREFIX,
  AUTOSAVE_KEY,
  restoreAutosave,
  saveCaseToStorage,
  type StorageLike,
} from '../../src/state/autosave';
import { AUTOSAVE_FORMAT, readAutosaveEntry } from '../../src/state/autosaveEntry';
import { malformedCase, validCase } from './generators/caseArbitraries';

function memoryStorage(): StorageLike & { map: Map<string, string> } {
  const map = new Map<string, string>();
  return { map, getItem: (k) => map.get(k) ?? null, setItem: (k, v) => void map.set(k, v) };
}

const entryText = fc.oneof(
  // storage version 1: the bare case document
  validCase.map((c) => JSON.stringify(c)),
  malformedCase.map((c) => JSON.stringify(c) ?? 'null'),
  // envelopes of any version around valid or broken cases
  fc
    .tuple(
      fc.oneof(fc.integer({ min: -1, max: 4 }), fc.jsonValue()),
      fc.oneof(validCase, malformedCase),
    )
    .map(([version, c]) =>
      JSON.stringify({ format: AUTOSAVE_FORMAT, version, savedAt: null, case: c }),
    ),
  // cut short, or random
  validCase.chain((c) => fc.nat({ max: 400 }).map((n) => serializeCase(c as never).slice(0, n))),
  fc.string({ maxLength: 60 }),
  fc.jsonValue().map((v) => JSON.stringify(v) ?? ''),
);

describe('autosave restore under generated entries', () => {
  it('restores a valid case, or keeps the entry under a named backup key (10 000 entries)', () => {
    const seen = { restored: 0, backedUp: 0, lenientWithDrops: 0 };
    fc.assert(
      fc.property(entryText, (text) => {
        const s = memoryStorage();
        s.setItem(AUTOSAVE_KEY, text);
        const r = restoreAutosave(s);
        const backups = [...s.map].filter(([k]) => k.startsWith(AUTOSAVE_BACKUP_PREFIX));
        if (r.value) {
          seen.restored++;
          const read = readAutosaveEntry(text);
          if (read.status !== 'ok') throw new Error('restored an unreadable entry');
          if (read.dropped) {
            // Restored leniently with parts left out: the message lists each, and the entry is
            // kept byte for byte under the backup key it names.
            seen.lenientWithDrops++;
            if (backups.length !== 1)
              throw new Error(`expected one backup, found ${backups.length}`);
            const [key, kept] = backups[0] as [string, string];
            if (kept !== text) throw new Error('backup differs from the entry');
            if (!r.message?.includes(`"${key}"`)) throw new Error(`message does not name ${key}`);
            for (const d of read.dropped)
              if (!r.message.includes(d)) throw new Error(`message does not say it left out ${d}`);
          } else if (r.message !== null || backups.length > 0)
            throw new Error('restored in full with a message or a backup');
          // Strictly valid, or lenient (layers, beam and points each valid on their own).
          const strict = validateCase(r.value);
          if (!strict.ok && r.value.layers.length === 0)
            throw new Error('lenient case with no layers');
          // And it saves and restores to the same case.
          saveCaseToStorage(s, r.value);
          expect(restoreAutosave(s).value).toEqual(r.value);
          return;
        }
        if (text === '') {
          if (r.message !== null) throw new Error('message for an empty entry');
          return;
        }
        seen.backedUp++;
        if (backups.length !== 1) throw new Error(`expected one backup, found ${backups.length}`);
        const [key, kept] = backups[0] as [string, string];
        if (kept !== text) throw new Error('backup differs from the entry');
        if (!r.message?.includes(`"${key}"`)) throw new Error(`message does not name ${key}`);
        if (readAutosaveEntry(text).status !== 'unreadable')
          throw new Error('readable entry backed up');
      }),
      { numRuns: 10_000, seed: 20261207 },
    );
    expect(seen.restored).toBeGreaterThan(1000);
    expect(seen.backedUp).toBeGreaterThan(3000);
    expect(seen.lenientWithDrops).toBeGreaterThan(10);
  });
});
