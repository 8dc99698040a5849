// Batch mode: `npm run calc -- --batch a.json b.json …` (or several files) prints one summary
// row per case or plan; exit code 1 when any check verdict fails or is uncertain (a Monte Carlo
// difference within the tolerance ± 2σ: not shown within tolerance), 2 when a file cannot be
// read or is invalid (problems printed to stderr), else 0.
import { summarizeCheck } from '../engine/check/checkSummary';
import type { Verdict } from '../engine/check/tolerance';
import { describeProblems } from '../io/caseFile';
import { calculateDocument, jsonOf, loadDocument, type CliCalc } from './checkCommand';
import { flagProblemsForDocument } from './flagRules';
import { readTextFileNoting } from './readTextFile';
import { table } from './formatReport';

export interface BatchRow {
  file: string;
  name: string;
  beams: number;
  method: string | null;
  largestDiffPercent: number | null;
  comparisons: number;
  verdict: Verdict | 'invalid';
}

export function batchRows(files: readonly string[], calc: CliCalc): BatchRow[] {
  return files.map((file): BatchRow => {
    const invalid = (message: string): BatchRow => {
      console.error(`${file}: ${message}`);
      return {
        file,
        name: '',
        beams: 0,
        method: null,
        largestDiffPercent: null,
        comparisons: 0,
        verdict: 'invalid',
      };
    };
    const read = readTextFileNoting(file);
    if (!read.ok) return invalid(read.problem);
    const doc = loadDocument(read.text);
    const misfit = flagProblemsForDocument(doc, calc.options.prescription);
    if (misfit.length > 0) return invalid(misfit.join('\n'));
    const answer = calculateDocument(doc, calc);
    if (!answer.ok) return invalid(`invalid file\n${describeProblems(answer.problems)}`);
    const result = answer.report;
    const s = summarizeCheck(result.check);
    return {
      file,
      name: result.planName,
      beams: result.beams.length,
      method: s.methodId,
      largestDiffPercent: s.largestDiffPercent,
      comparisons: s.comparisons,
      verdict: s.verdict,
    };
  });
}

export function batchExitCode(rows: readonly BatchRow[]): number {
  if (rows.some((r) => r.verdict === 'invalid')) return 2;
  return rows.some((r) => r.verdict === 'fail' || r.verdict === 'uncertain') ? 1 : 0;
}

export function formatBatch(rows: readonly BatchRow[]): string {
  const body = table(
    ['file', 'name', 'beams', 'method', 'largest diff %', 'comparisons', 'verdict'],
    rows.map((r) => [
      r.file,
      r.name,
      String(r.beams),
      r.method ?? '—',
      r.largestDiffPercent === null
        ? '—'
        : `${r.largestDiffPercent > 0 ? '+' : ''}${r.largestDiffPercent.toFixed(2)}`,
      String(r.comparisons),
      r.verdict,
    ]),
  );
  const fails = rows.filter((r) => r.verdict === 'fail').length;
  const invalid = rows.filter((r) => r.verdict === 'invalid').length;
  const uncertain = rows.filter((r) => r.verdict === 'uncertain').length;
  return `${body}\n\n${rows.length} file(s): ${fails} outside tolerance, ${uncertain > 0 ? `${uncertain} uncertain (Monte Carlo: run longer), ` : ''}${invalid} invalid`;
}

export function runBatch(files: readonly string[], calc: CliCalc, json: boolean): number {
  const rows = batchRows(files, calc);
  process.stdout.write(json ? `${JSON.stringify(rows, null, 2)}\n` : `${formatBatch(rows)}\n`);
  return batchExitCode(rows);
}

/**
 * `--jsonl`: every file's full JSON document (as `--json` prints it for one file) on one line each,
 * `{"file", "document"}`, or `{"file", "problems"}` for a file that cannot be read or is invalid;
 * one process for many files. Exit code 2 when any file is invalid, else 0.
 */
export function runJsonLines(files: readonly string[], calc: CliCalc): number {
  let invalid = 0;
  for (const file of files) {
    let line: unknown;
    const read = readTextFileNoting(file);
    if (!read.ok) line = { file, problems: [{ path: '(file)', message: read.problem }] };
    else {
      const doc = loadDocument(read.text);
      const misfit = flagProblemsForDocument(doc, calc.options.prescription);
      const answer = misfit.length > 0 ? null : calculateDocument(doc, calc);
      line = !answer
        ? { file, problems: misfit.map((message) => ({ path: '--prescribe', message })) }
        : answer.ok
          ? { file, document: jsonOf(answer.report, answer.isPlan) }
          : { file, problems: answer.problems };
    }
    if ((line as { problems?: unknown }).problems) invalid += 1;
    process.stdout.write(`${JSON.stringify(line)}\n`);
  }
  return invalid > 0 ? 2 : 0;
}
