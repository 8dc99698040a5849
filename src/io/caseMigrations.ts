// Migrations between case-file versions. Each entry lifts a document from version n to n + 1;
// validateCase runs them in order before the schema check. Version 1 is the first format, so
// the chain is empty today; the checks on format and version are already in force.
import { CASE_FORMAT, CASE_VERSION } from './caseSchema';
import type { CaseProblem } from './caseFile';

type Migration = (doc: Record<string, unknown>) => Record<string, unknown>;

/** MIGRATIONS[n] turns a version-n document into version n + 1. */
export const MIGRATIONS: Record<number, Migration> = {};

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
    current = { ...step(current), version: v + 1 };
  }
  return { ok: true, value: current };
}
