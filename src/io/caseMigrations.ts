// Migrations between case-file versions. Each entry lifts a document from version n to n + 1;
// validateCase runs them in order before the schema check. A migration either carries every
// value over or refuses with problems naming the fields: it never drops or picks a value silently.
import { CASE_FORMAT, CASE_VERSION } from './caseSchema';
import type { CaseProblem } from './caseFile';

type Migration = (
  doc: Record<string, unknown>,
) => { ok: true; doc: Record<string, unknown> } | { ok: false; problems: CaseProblem[] };

/**
 * Version 1 → 2: the planning MU moves from the points (points[i].planningMu) to the beam
 * (beam.planningMu), since a beam delivers one number of MU whatever point is looked at. Equal
 * values on the points become the beam's. Different values are refused, naming each field: they
 * cannot all be the beam's MU, and keeping one would change the comparison the file records, so
 * the user decides which is the planning system's value.
 */
export function planningMuToBeam(doc: Record<string, unknown>): ReturnType<Migration> {
  const points = Array.isArray(doc.points) ? (doc.points as unknown[]) : null;
  if (!points) return { ok: true, doc };
  const found: { index: number; value: unknown }[] = [];
  points.forEach((p, index) => {
    if (typeof p === 'object' && p !== null && 'planningMu' in p)
      found.push({ index, value: (p as Record<string, unknown>).planningMu });
  });
  if (found.length === 0) return { ok: true, doc };
  const first = found[0]?.value;
  const same = found.every(
    (f) =>
      f.value === first ||
      (typeof f.value === 'number' &&
        typeof first === 'number' &&
        Math.abs(f.value - first) <= 1e-9 * Math.max(Math.abs(f.value), Math.abs(first))),
  );
  if (!same)
    return {
      ok: false,
      problems: [
        {
          path: found.map((f) => `points[${f.index}].planningMu`).join(', '),
          message: `planning MU differ between points (${found.map((f) => JSON.stringify(f.value)).join(', ')}); a beam has one planning MU since case version 2: write the planning system's MU for this beam as beam.planningMu, remove planningMu from the points and open the file again (nothing was changed)`,
        },
      ],
    };
  const beam =
    typeof doc.beam === 'object' && doc.beam !== null && !Array.isArray(doc.beam)
      ? (doc.beam as Record<string, unknown>)
      : null;
  if (!beam) return { ok: true, doc };
  return {
    ok: true,
    doc: {
      ...doc,
      beam: { ...beam, planningMu: first },
      points: points.map((p) => {
        if (typeof p !== 'object' || p === null || !('planningMu' in p)) return p;
        const rest = { ...(p as Record<string, unknown>) };
        delete rest.planningMu;
        return rest;
      }),
    },
  };
}

/** MIGRATIONS[n] turns a version-n document into version n + 1. */
export const MIGRATIONS: Record<number, Migration> = { 1: planningMuToBeam };

export type MigrationResult = { ok: true; value: unknown } | { ok: false; problems: CaseProblem[] };

/** A found value for a message: short JSON for plain values, a word for the rest. */
function foundText(v: unknown): string {
  if (v === undefined) return 'none';
  if (Array.isArray(v)) return 'a list';
  if (typeof v === 'object' && v !== null) return 'an object';
  const t = JSON.stringify(v);
  return t.length > 40 ? `${t.slice(0, 37)}…` : t;
}

export function migrateCase(raw: unknown): MigrationResult {
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw))
    return {
      ok: false,
      problems: [{ path: '(file)', message: 'a case file must be a JSON object' }],
    };
  const doc = raw as Record<string, unknown>;
  if (doc.format !== CASE_FORMAT)
    return {
      ok: false,
      problems: [
        {
          path: 'format',
          message: `format must be "${CASE_FORMAT}" (found ${foundText(doc.format)})`,
        },
      ],
    };
  const version = doc.version;
  if (
    typeof version !== 'number' ||
    !Number.isInteger(version) ||
    version < 1 ||
    version > CASE_VERSION
  )
    return {
      ok: false,
      problems: [
        {
          path: 'version',
          message: `${version === undefined ? 'version missing' : `unknown version ${foundText(version)}`} (this Lamina reads versions 1–${CASE_VERSION})`,
        },
      ],
    };
  let current = doc;
  for (let v = version; v < CASE_VERSION; v++) {
    const step = MIGRATIONS[v];
    if (!step)
      return {
        ok: false,
        problems: [{ path: 'version', message: `no migration from version ${v}` }],
      };
    const next = step(current);
    if (!next.ok) return next;
    current = { ...next.doc, version: v + 1 };
  }
  return { ok: true, value: current };
}
