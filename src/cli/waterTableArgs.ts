// Water-data options of the command line: --tmr FILE | --pdd FILE --ssd CM, --scatter FILE,
// --dmax CM, --ref-dose CGY_PER_MU. Reads the files and builds the measured-table WaterData.
import { readTextFileNoting } from './readTextFile';
import { basename } from 'node:path';
import {
  buildMeasuredWaterData,
  type MeasuredTableInput,
  type MeasuredTableResult,
} from '../engine/beam/measuredTable';
import { RANGES, rangeProblem, type NumericRange } from '../engine/inputRanges';

export const WATER_TABLE_USAGE = `  --tmr FILE.csv   measured TMR table (header row: field sides at depth, cm; first column: depth, cm)
  --pdd FILE.csv   measured PDD table (header row: field sides at the surface, cm), with --ssd CM
  --scatter FILE   scatter factors: field cm, S_c, S_p[, PSF]
  --dmax CM        depth of maximum dose (default: inferred from the table)
  --ref-dose X     reference dose rate, cGy/MU at d_max, 10 × 10, SSD 100 (default 1)
  Without --tmr/--pdd the case file's inline water data are used, else the modelled beam.`;

/** The water-data flags (for the command line's list of known flags). */
export const WATER_TABLE_FLAGS = ['tmr', 'pdd', 'scatter', 'ssd', 'dmax', 'ref-dose'] as const;

/** The shared range (src/engine/inputRanges) each numeric water-data flag must lie in. */
const FLAG_RANGES: Record<string, NumericRange> = {
  ssd: RANGES.distanceCm,
  dmax: RANGES.dMaxCm,
  'ref-dose': RANGES.referenceDosePerMuCGy,
};

function numberFlag(
  flags: Map<string, string | true>,
  name: string,
  problems: string[],
): number | undefined {
  const v = flags.get(name);
  if (v === undefined) return undefined;
  const text = typeof v === 'string' ? v.trim() : '';
  const n = text === '' ? NaN : Number(text);
  if (!Number.isFinite(n)) {
    problems.push(`--${name}: "${String(v)}" is not a number`);
    return n;
  }
  const range = FLAG_RANGES[name];
  const problem = range ? rangeProblem(n, range) : null;
  if (problem) problems.push(`--${name} ${text}: ${problem}`);
  return n;
}

function readText(path: string, problems: string[]): string {
  const r = readTextFileNoting(path);
  if (r.ok) return r.text;
  problems.push(`${path}: ${r.problem}`);
  return '';
}

/** The water data asked for on the command line: none, or a built table / its problems. */
export function waterTableFromFlags(
  flags: Map<string, string | true>,
): (MeasuredTableResult & { input?: MeasuredTableInput }) | undefined {
  const tmr = flags.get('tmr');
  const pdd = flags.get('pdd');
  if (tmr === undefined && pdd === undefined) {
    const orphan = ['scatter', 'ssd', 'dmax', 'ref-dose'].filter((f) => flags.has(f));
    return orphan.length > 0
      ? {
          ok: false,
          problems: [
            `${orphan.map((f) => `--${f}`).join(', ')} ${orphan.length > 1 ? 'need' : 'needs'} --tmr or --pdd`,
          ],
        }
      : undefined;
  }
  const problems: string[] = [];
  if (tmr !== undefined && pdd !== undefined) problems.push('give either --tmr or --pdd, not both');
  else if (tmr !== undefined && flags.has('ssd'))
    problems.push('--ssd: only a PDD table (--pdd) has an SSD; a TMR table does not depend on it');
  const path = String(tmr ?? pdd);
  const csv = readText(path, problems);
  const scatterPath = flags.get('scatter');
  const scatterCsv = typeof scatterPath === 'string' ? readText(scatterPath, problems) : undefined;
  const input: MeasuredTableInput = {
    kind: tmr !== undefined ? 'tmr' : 'pdd',
    fileName: basename(path),
    csv,
    ssdCm: numberFlag(flags, 'ssd', problems),
    dMaxCm: numberFlag(flags, 'dmax', problems),
    scatterFileName: typeof scatterPath === 'string' ? basename(scatterPath) : undefined,
    scatterCsv,
    referenceDosePerMuCGy: numberFlag(flags, 'ref-dose', problems),
  };
  if (problems.length > 0) return { ok: false, problems };
  const built = buildMeasuredWaterData(input);
  return built.ok ? { ...built, input } : built;
}

/**
 * The notes the page shows under a checked table (d_max inferred, PDD converted, TPR20,10 outside
 * the typical range, …), one line each, for the command line's standard error.
 */
export function tableNoteLines(table: MeasuredTableResult | undefined): string[] {
  if (!table?.ok) return [];
  return table.summary.notes.map((n) => `note: ${table.summary.fileName}: ${n}`);
}
