// The water-data table being prepared in the Water data view (kept in a store so nothing typed
// or pasted is lost when switching views), and its check into the case's inline water data.
import { create } from 'zustand';
import { buildMeasuredWaterData, type MeasuredTableSummary } from '../engine/beam/measuredTable';
import type { CaseWaterData } from '../io/caseSchema';
import { RANGES, rangeProblem, type NumericRange } from '../engine/inputRanges';

export interface WaterDraft {
  kind: 'tmr' | 'pdd';
  fileName: string;
  csv: string;
  /** Typed text of the optional numbers, kept as typed. */
  ssdText: string;
  dMaxText: string;
  referenceText: string;
  scatterFileName: string;
  scatterCsv: string;
}

export const EMPTY_WATER_DRAFT: WaterDraft = {
  kind: 'tmr',
  fileName: '',
  csv: '',
  ssdText: '100',
  dMaxText: '',
  referenceText: '',
  scatterFileName: '',
  scatterCsv: '',
};

export const useWaterDraft = create<WaterDraft>()(() => ({ ...EMPTY_WATER_DRAFT }));

export function patchWaterDraft(patch: Partial<WaterDraft>): void {
  useWaterDraft.setState(patch);
}

export type WaterCheck =
  | { ok: true; waterData: CaseWaterData; summary: MeasuredTableSummary }
  | { ok: false; problems: string[] };

/** A typed optional number in its shared range (the same range as the case file and the CLI). */
function optionalNumber(
  text: string,
  name: string,
  range: NumericRange,
  problems: string[],
): number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  const v = Number(t.replace(',', '.'));
  if (!Number.isFinite(v)) {
    problems.push(`${name}: "${text}" is not a number`);
    return undefined;
  }
  const problem = rangeProblem(v, range);
  if (problem) problems.push(`${name}: ${problem}`);
  return v;
}

/** Check a draft: the inline water data it would put in the case, or every problem found. */
export function checkWaterDraft(d: WaterDraft): WaterCheck {
  const problems: string[] = [];
  if (d.csv.trim() === '')
    return { ok: false, problems: ['Depth table: load a file or paste CSV text'] };
  const ssdCm =
    d.kind === 'pdd'
      ? optionalNumber(d.ssdText, 'Table SSD (cm)', RANGES.distanceCm, problems)
      : undefined;
  const dMaxCm = optionalNumber(d.dMaxText, 'd_max (cm)', RANGES.dMaxCm, problems);
  const referenceDosePerMuCGy = optionalNumber(
    d.referenceText,
    'Reference dose rate (cGy/MU)',
    RANGES.referenceDosePerMuCGy,
    problems,
  );
  if (problems.length) return { ok: false, problems };
  const waterData: CaseWaterData = {
    kind: d.kind,
    fileName: d.fileName.trim() || 'pasted table',
    csv: d.csv,
  };
  if (ssdCm !== undefined) waterData.ssdCm = ssdCm;
  if (dMaxCm !== undefined) waterData.dMaxCm = dMaxCm;
  if (referenceDosePerMuCGy !== undefined) waterData.referenceDosePerMuCGy = referenceDosePerMuCGy;
  if (d.scatterCsv.trim() !== '') {
    waterData.scatterCsv = d.scatterCsv;
    waterData.scatterFileName = d.scatterFileName.trim() || 'pasted scatter factors';
  }
  const built = buildMeasuredWaterData(waterData);
  if (!built.ok) return { ok: false, problems: built.problems };
  return { ok: true, waterData, summary: built.summary };
}

/** The draft that reproduces a case's inline water data (to edit it again). */
export function draftOf(w: CaseWaterData): WaterDraft {
  return {
    kind: w.kind,
    fileName: w.fileName,
    csv: w.csv,
    ssdText: w.ssdCm === undefined ? '' : String(w.ssdCm),
    dMaxText: w.dMaxCm === undefined ? '' : String(w.dMaxCm),
    referenceText: w.referenceDosePerMuCGy === undefined ? '' : String(w.referenceDosePerMuCGy),
    scatterFileName: w.scatterFileName ?? '',
    scatterCsv: w.scatterCsv ?? '',
  };
}
