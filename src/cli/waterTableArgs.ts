// Water-data options of the command line: --tmr FILE | --pdd FILE --ssd CM, --scatter FILE,
// --dmax CM, --ref-dose CGY_PER_MU. Reads the files and builds the measured-table WaterData.
import { readFileSync } from 'node:fs';
import { basename } from 'node:path';
import {
  buildMeasuredWaterData,
  type MeasuredTableInput,
  type MeasuredTableResult,
} from '../engine/beam/measuredTable';

export const WATER_TABLE_USAGE = `  --tmr FILE.csv   measured TMR table (header row: field sides at depth, cm; first column: depth, cm)
  --pdd FILE.csv   measured PDD table (header row: field sides at the surface, cm), with --ssd CM
  --scatter FILE   scatter factors: field cm, S_c, S_p[, PSF]
  --dmax CM        depth of maximum dose (default: inferred from the table)
  --ref-dose X     reference dose rate, cGy/MU at d_max, 10 × 10, SSD 100 (default 1)
  Without --tmr/--pdd the case file's inline water data are used, else the modelled beam.`;

function numberFlag(
  flags: Map<string, string | true>,
  name: string,
  problems: string[],
): number | undefined {
  const v = flags.get(name);
  if (v === undefined) return undefined;
  const n = typeof v === 'string' ? Number(v) : NaN;
  if (!Number.isFinite(n)) problems.push(`--${name}: "${String(v)}" is not a number`);
  return n;
}

function readText(path: string, problems: string[]): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (e) {
    problems.push(`${path}: cannot read (${(e as Error).message})`);
    return '';
  }
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
