// A measured water-data table imported by the user, turned into the engine's `WaterData`:
// a TMR or PDD matrix (PDD converted to TMR once, on import), optional scatter factors, d_max and
// the reference dose rate. Its `source` names the file and the first 12 hex digits of its SHA-256.
import { RANGES, rangeProblem, type NumericRange } from '../inputRanges';
import { bracketIndex, lerp } from '../units';
import { sha256Hex } from '../util/sha256';
import { tmrFromPdd } from './depthDoseConversions';
import {
  parseDepthFieldCsv,
  parseScatterCsv,
  type DepthFieldMatrix,
  type DepthTableKind,
  type ScatterFactorTable,
} from './measuredTableCsv';
import { makeFactorLookup, makeTmrLookup, type TmrGrid } from './tmrTable';
import type { LookupRecorder, WaterData } from './waterData';

export interface MeasuredTableInput {
  kind: DepthTableKind;
  fileName: string;
  csv: string;
  /** SSD of a PDD table (cm); required for kind "pdd". */
  ssdCm?: number | undefined;
  /** Depth of maximum dose (cm); when absent, the depth of the largest value in the column nearest 10 cm. */
  dMaxCm?: number | undefined;
  scatterFileName?: string | undefined;
  scatterCsv?: string | undefined;
  /** cGy/MU at d_max, 10 × 10 cm² at SSD 100; 1 when absent (doses then read as relative). */
  referenceDosePerMuCGy?: number | undefined;
}

export interface MeasuredTableSummary {
  source: string;
  kind: DepthTableKind;
  fileName: string;
  sha256: string;
  dMaxCm: number;
  dMaxInferred: boolean;
  depthRangeCm: [number, number];
  fieldRangeCm: [number, number];
  notes: string[];
  /** TMR(20, 10)/TMR(10, 10) when the table covers those depths and the 10 cm field. */
  tpr2010?: number;
  /** The TMR grid the engine uses (after PDD conversion), for plotting. */
  tmrGrid: { depthsCm: number[]; sidesCm: number[]; tmr: number[][] };
  /** The file's own values, as read. */
  table: DepthFieldMatrix;
  scatter?: ScatterFactorTable;
}

/** PSF without a PSF column: S_p(s) = PSF(s)/PSF(10) with PSF(10) = 1 (exact in PSF ratios). */
export const PSF_APPROXIMATION = 'PSF not supplied: PSF(s) ≈ S_p(s), PSF(10 × 10) taken as 1';

export type MeasuredTableResult =
  | { ok: true; waterData: WaterData; summary: MeasuredTableSummary }
  | { ok: false; problems: string[] };

/** Typical TPR20,10 from Co-60 (≈ 0.57) to 18 MV (≈ 0.78), with a margin (typical values, from memory). */
export const TYPICAL_TPR2010: readonly [number, number] = [0.52, 0.84];

function tpr2010Of(
  tmr: (d: number, s: number) => number,
  depthRangeCm: readonly [number, number],
  fieldRangeCm: readonly [number, number],
): number | undefined {
  const covers =
    depthRangeCm[0] <= 10 &&
    depthRangeCm[1] >= 20 &&
    fieldRangeCm[0] <= 10 &&
    fieldRangeCm[1] >= 10;
  return covers ? tmr(20, 10) / tmr(10, 10) : undefined;
}

/** Depth of the largest value in the column whose field is nearest 10 cm. */
export function inferDMaxCm(m: DepthFieldMatrix): number {
  let j = 0;
  m.sidesCm.forEach((s, k) => {
    if (Math.abs(s - 10) < Math.abs((m.sidesCm[j] as number) - 10)) j = k;
  });
  let best = 0;
  m.values.forEach((row, i) => {
    if ((row[j] as number) > ((m.values[best] as number[])[j] as number)) best = i;
  });
  return m.depthsCm[best] as number;
}

/** Value of a matrix row at a field side, linear in side (linear extrapolation outside). */
function rowAtSide(sidesCm: readonly number[], row: readonly number[], sideCm: number): number {
  const j = bracketIndex(sidesCm, sideCm);
  return lerp(
    sideCm,
    sidesCm[j] as number,
    sidesCm[j + 1] as number,
    row[j] as number,
    row[j + 1] as number,
  );
}

/**
 * Convert a PDD matrix (header = field side at the surface, SSD f) to TMR on the same depths with
 * the header sides read as sides at depth: for each (d, s_d) the surface side s = s_d·f/(f + d)
 * is interpolated (linearly extrapolated below the smallest header field, reported in a note).
 */
export function tmrGridFromPdd(
  m: DepthFieldMatrix,
  ssdCm: number,
  dMaxCm: number,
  sp: (sideCm: number) => number,
  notes: string[],
): number[][] {
  const s0 = m.sidesCm[0] as number;
  let extrapolatedBelowCm = Infinity;
  const tmr = m.depthsCm.map((d, i) =>
    m.sidesCm.map((sd) => {
      const s = (sd * ssdCm) / (ssdCm + d);
      if (s < s0 - 1e-9) extrapolatedBelowCm = Math.min(extrapolatedBelowCm, d);
      const pdd = rowAtSide(m.sidesCm, m.values[i] as number[], s);
      const sdm = (s * (ssdCm + dMaxCm)) / ssdCm;
      return tmrFromPdd(pdd, ssdCm, d, dMaxCm, sp(sdm) / sp(sd));
    }),
  );
  notes.push(
    `PDD at SSD ${ssdCm} cm converted to TMR (PDD→TMR with the inverse-square and S_p ratios)`,
  );
  if (Number.isFinite(extrapolatedBelowCm))
    notes.push(
      `TMR for the ${s0} cm field at depths ≥ ${extrapolatedBelowCm} cm needed PDD below the smallest tabulated field: extrapolated linearly in field side`,
    );
  return tmr;
}

function prefixed(fileName: string, problems: string[]): string[] {
  return problems.map((p) => `${fileName}: ${p}`);
}

/**
 * The table's numbers against the shared ranges (src/engine/inputRanges): the SSD a PDD table was
 * measured at, d_max and the reference dose rate, each message naming the number and its value.
 */
export function measuredTableNumberProblems(
  input: Pick<
    MeasuredTableInput,
    'kind' | 'fileName' | 'ssdCm' | 'dMaxCm' | 'referenceDosePerMuCGy'
  >,
): string[] {
  const out: string[] = [];
  const check = (what: string, v: number | undefined, range: NumericRange) => {
    const p = v === undefined ? null : rangeProblem(v, range);
    const shown =
      v !== undefined && Number.isFinite(v) ? ` ${v}${range.unit ? ` ${range.unit}` : ''}` : '';
    if (p) out.push(`${input.fileName}: ${what}${shown}: ${p}`);
  };
  if (input.kind === 'pdd' && input.ssdCm === undefined)
    out.push(`${input.fileName}: a PDD table needs its SSD (cm)`);
  if (input.kind === 'pdd') check('table SSD', input.ssdCm, RANGES.distanceCm);
  check('d_max', input.dMaxCm, RANGES.dMaxCm);
  check('reference dose rate', input.referenceDosePerMuCGy, RANGES.referenceDosePerMuCGy);
  return out;
}

/** Build `WaterData` from a measured table (and optional scatter factors), or list the problems. */
export function buildMeasuredWaterData(input: MeasuredTableInput): MeasuredTableResult {
  const parsed = parseDepthFieldCsv(input.csv, input.kind);
  const problems: string[] = parsed.ok ? [] : prefixed(input.fileName, parsed.problems);
  let scatter: ScatterFactorTable | undefined;
  if (input.scatterCsv !== undefined) {
    const s = parseScatterCsv(input.scatterCsv);
    if (s.ok) scatter = s.value;
    else problems.push(...prefixed(input.scatterFileName ?? 'scatter factors', s.problems));
  }
  problems.push(...measuredTableNumberProblems(input));
  const ref = input.referenceDosePerMuCGy;
  if (!parsed.ok || problems.length > 0) return { ok: false, problems };

  const m = parsed.value;
  const notes: string[] = [];
  const dMaxInferred = input.dMaxCm === undefined;
  const dMaxCm = input.dMaxCm ?? inferDMaxCm(m);
  if (dMaxInferred)
    notes.push(`d_max not supplied: taken as ${dMaxCm} cm (largest value, field nearest 10 cm)`);

  const one = () => 1;
  const sp = scatter
    ? makeFactorLookup(Float64Array.from(scatter.sidesCm), Float64Array.from(scatter.sp))
    : one;
  const sc = scatter
    ? makeFactorLookup(Float64Array.from(scatter.sidesCm), Float64Array.from(scatter.sc))
    : one;
  const psfTable = scatter?.psf;
  const psf = psfTable
    ? makeFactorLookup(
        Float64Array.from((scatter as ScatterFactorTable).sidesCm),
        Float64Array.from(psfTable),
      )
    : sp;

  const tmr =
    m.kind === 'tmr'
      ? m.values
      : tmrGridFromPdd(m, input.ssdCm as number, dMaxCm, (s) => sp(s), notes);
  const grid: TmrGrid = {
    depthsCm: Float64Array.from(m.depthsCm),
    sidesCm: Float64Array.from(m.sidesCm),
    values: Float64Array.from(tmr.flat()),
    dMaxCm,
  };
  const hash = sha256Hex(input.csv);
  const sourceParts = [`measured table: ${input.fileName} (sha-256 ${hash.slice(0, 12)})`];
  if (scatter)
    sourceParts.push(
      `scatter factors: ${input.scatterFileName ?? 'scatter factors'} (sha-256 ${sha256Hex(input.scatterCsv as string).slice(0, 12)})`,
    );
  else sourceParts.push('S_p not supplied: taken as 1', 'S_c not supplied: taken as 1');
  if (!psfTable) sourceParts.push(PSF_APPROXIMATION);
  if (ref === undefined) sourceParts.push('reference dose rate not supplied: 1 cGy/MU');
  const source = sourceParts.join('; ');

  const depthRangeCm: [number, number] = [
    m.depthsCm[0] as number,
    m.depthsCm[m.depthsCm.length - 1] as number,
  ];
  const fieldRangeCm: [number, number] = [
    m.sidesCm[0] as number,
    m.sidesCm[m.sidesCm.length - 1] as number,
  ];
  const lookup = makeTmrLookup(grid);
  const tpr2010 = tpr2010Of(lookup, depthRangeCm, fieldRangeCm);
  if (tpr2010 !== undefined && !(tpr2010 >= TYPICAL_TPR2010[0] && tpr2010 <= TYPICAL_TPR2010[1]))
    notes.push(
      `TPR20,10 ${tpr2010.toFixed(3)} lies outside ${TYPICAL_TPR2010[0]}–${TYPICAL_TPR2010[1]} (Co-60 to 18 MV): check the table`,
    );
  const waterData: WaterData = {
    source,
    dMaxCm,
    depthRangeCm,
    fieldRangeCm,
    tmr: lookup,
    sp: (s: number, r?: LookupRecorder) => sp(s, r),
    sc: (s: number, r?: LookupRecorder) => sc(s, r),
    psf: (s: number, r?: LookupRecorder) => psf(s, r),
    ...(psfTable ? {} : { psfApproximation: PSF_APPROXIMATION }),
    referenceDosePerMuCGy: ref ?? 1,
  };
  const summary: MeasuredTableSummary = {
    source,
    kind: m.kind,
    fileName: input.fileName,
    sha256: hash,
    dMaxCm,
    dMaxInferred,
    depthRangeCm,
    fieldRangeCm,
    notes,
    ...(tpr2010 !== undefined ? { tpr2010 } : {}),
    tmrGrid: { depthsCm: m.depthsCm, sidesCm: m.sidesCm, tmr },
    table: m,
    ...(scatter ? { scatter } : {}),
  };
  return { ok: true, waterData, summary };
}
