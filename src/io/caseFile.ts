// Reading and writing case files: JSON text → migrated → validated case, or a list of problems
// each naming its field path. Nothing is coerced: a value that breaks a rule is reported.
import { CASE_FORMAT, CASE_VERSION, caseSchema, type LaminaCase } from './caseSchema';
import { migrateCase } from './caseMigrations';
import { issueText } from './issueText';

export interface CaseProblem {
  /** Field path, e.g. "layers[2].thicknessCm" ("(file)" for the document as a whole). */
  path: string;
  message: string;
}

export type CaseParseResult =
  { ok: true; value: LaminaCase } | { ok: false; problems: CaseProblem[] };

export function formatPath(path: readonly PropertyKey[]): string {
  if (path.length === 0) return '(file)';
  return path
    .map((p, i) => (typeof p === 'number' ? `[${p}]` : `${i === 0 ? '' : '.'}${String(p)}`))
    .join('');
}

/** Validate an already-parsed JSON value as a case (after migrating older versions). */
export function validateCase(raw: unknown): CaseParseResult {
  const migrated = migrateCase(raw);
  if (!migrated.ok) return migrated;
  const r = caseSchema.safeParse(migrated.value, { error: issueText });
  if (r.success) return { ok: true, value: r.data };
  return {
    ok: false,
    problems: r.error.issues.map((issue) => ({
      path: formatPath(issue.path),
      message: issue.message,
    })),
  };
}

/** Parse case-file text. */
export function parseCaseText(text: string): CaseParseResult {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    return {
      ok: false,
      problems: [{ path: '(file)', message: `not valid JSON: ${(e as Error).message}` }],
    };
  }
  return validateCase(raw);
}

export function serializeCase(c: LaminaCase): string {
  return `${JSON.stringify({ ...c, format: CASE_FORMAT, version: CASE_VERSION }, null, 2)}\n`;
}

export function describeProblems(problems: readonly CaseProblem[]): string {
  return problems.map((p) => `${p.path}: ${p.message}`).join('\n');
}
