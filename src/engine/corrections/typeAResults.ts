// Every requested type-A method as a `MethodResult`: CF and dose per MU along the report's depth
// grid and at each point, with the method's variant and the water data's source printed alongside.
import { equivalentSquareCm, fieldAtDepthCm } from '../beam/geometry';
import type { WaterData } from '../beam/waterData';
import {
  beyondWaterDataFlag,
  depthReachEdgeCm,
  watchDepthReach,
  type DepthReachWatch,
} from '../beam/waterDataReach';
import { dosePerMuFactors } from '../check/dosePerMu';
import type { MethodPoint, MethodResult } from '../methodResult';
import type { SlabPhantom } from '../phantom/slabPhantom';
import { collectingRecorder, type CorrectionOptions, type TypeAMethod } from './correctionTypes';
import type { CorrectionExplanation } from './correctionExplanation';

export interface TypeAGeometry {
  phantom: SlabPhantom;
  ssdCm: number;
  /** Field sides at 100 cm from the source (cm). */
  fieldXCm: number;
  fieldYCm: number;
  /** The report's depth grid (cm). */
  depthCm: readonly number[];
  points: readonly { id: string; depthCm: number }[];
}

export interface Evaluation {
  cf: number | null;
  dosePerMuCGy: number | null;
  flags: string[];
  /** True when the value needed TMR beyond the deepest tabulated depth (then withheld). */
  beyondTable: boolean;
  /** The terms the method multiplied into its CF (correctionExplanation.ts). */
  explanation?: CorrectionExplanation | undefined;
  /** Equivalent square of the field at the depth (cm): the s_d the method was given. */
  sideAtDepthCm: number;
}

/** Clamp flags of depth reads: replaced by the beyond-the-table reason when a value is withheld. */
const isDepthClampFlag = (f: string) => f.startsWith('extrapolated: depth ');

function evaluate(
  method: TypeAMethod,
  g: TypeAGeometry,
  watch: DepthReachWatch,
  depthCm: number,
  options: CorrectionOptions,
): Evaluation {
  watch.reset();
  const wd = watch.waterData;
  const side = equivalentSquareCm(
    fieldAtDepthCm(g.fieldXCm, g.ssdCm, depthCm),
    fieldAtDepthCm(g.fieldYCm, g.ssdCm, depthCm),
  );
  const r = method.correct(g.phantom, depthCm, side, wd, options);
  const terms = { explanation: r.explanation, sideAtDepthCm: side };
  const withheld = (flags: string[], deepestCm: number): Evaluation => ({
    cf: null,
    dosePerMuCGy: null,
    flags: [beyondWaterDataFlag(wd, deepestCm), ...flags.filter((f) => !isDepthClampFlag(f))],
    beyondTable: true,
    ...terms,
  });
  const beyondInCf = watch.deepestBeyondCm();
  if (beyondInCf !== null) return withheld(r.flags, beyondInCf);
  if (r.cf === null)
    return { cf: null, dosePerMuCGy: null, flags: r.flags, beyondTable: false, ...terms };
  const { recorder, flags } = collectingRecorder();
  const factors = dosePerMuFactors({
    waterData: wd,
    ssdCm: g.ssdCm,
    depthCm,
    fieldXCm: g.fieldXCm,
    fieldYCm: g.fieldYCm,
    cf: r.cf,
    recorder,
  });
  const all = [...r.flags, ...flags().filter((f) => !r.flags.includes(f))];
  const beyondInChain = watch.deepestBeyondCm();
  if (beyondInChain !== null) return withheld(all, beyondInChain);
  const dose = Number.isFinite(factors.dosePerMuCGy) ? factors.dosePerMuCGy : null;
  return { cf: r.cf, dosePerMuCGy: dose, flags: all, beyondTable: false, ...terms };
}

const withSsd = (options: CorrectionOptions, g: TypeAGeometry): CorrectionOptions => ({
  ...options,
  ssdCm: options.ssdCm ?? g.ssdCm,
});

/**
 * One method at one depth exactly as its curve and points are computed (same options, field side
 * and water data, the same withholding beyond the water data), with the terms it multiplied: the
 * factor view reads this.
 */
export function typeAAtDepth(
  method: TypeAMethod,
  g: TypeAGeometry,
  wd: WaterData,
  depthCm: number,
  options: CorrectionOptions = {},
): Evaluation {
  return evaluate(method, g, watchDepthReach(wd), depthCm, {
    ...withSsd(options, g),
    explain: true,
  });
}

export function typeAMethodResult(
  method: TypeAMethod,
  g: TypeAGeometry,
  wd: WaterData,
  options: CorrectionOptions = {},
): MethodResult {
  const opts = withSsd(options, g);
  const watch = watchDepthReach(wd);
  const cf: (number | null)[] = [];
  const dose: (number | null)[] = [];
  let firstBeyond = -1;
  g.depthCm.forEach((d, i) => {
    const e = evaluate(method, g, watch, d, opts);
    cf.push(e.cf);
    dose.push(e.dosePerMuCGy);
    if (e.beyondTable && firstBeyond < 0) firstBeyond = i;
  });
  const points: MethodPoint[] = g.points.map((p) => {
    const e = evaluate(method, g, watch, p.depthCm, opts);
    return { id: p.id, depthCm: p.depthCm, cf: e.cf, dosePerMuCGy: e.dosePerMuCGy, flags: e.flags };
  });
  // Reads grow with depth, so everything below the first withheld grid depth is withheld too;
  // the edge itself lies between that depth and the one above it.
  const beyondWaterDataFromCm =
    firstBeyond < 0
      ? undefined
      : firstBeyond === 0
        ? (g.depthCm[0] as number)
        : depthReachEdgeCm(
            g.depthCm[firstBeyond - 1] as number,
            g.depthCm[firstBeyond] as number,
            (d) => evaluate(method, g, watch, d, opts).beyondTable,
          );
  return {
    id: method.id,
    label: method.label,
    variant:
      wd.psfApproximation && method.usesPsf?.(opts)
        ? `${method.variant(opts)}; ${wd.psfApproximation}`
        : method.variant(opts),
    methodClass: method.id === 'water' ? 'none' : 'type A',
    waterData: wd.source,
    curve: { depthCm: [...g.depthCm], dosePerMuCGy: dose, cf },
    points,
    ...(beyondWaterDataFromCm === undefined ? {} : { beyondWaterDataFromCm }),
  };
}

export function typeAMethodResults(
  methods: readonly TypeAMethod[],
  g: TypeAGeometry,
  wd: WaterData,
  options: CorrectionOptions = {},
): MethodResult[] {
  return methods.map((m) => typeAMethodResult(m, g, wd, options));
}
