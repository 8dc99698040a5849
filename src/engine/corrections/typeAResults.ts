// Every requested type-A method as a `MethodResult`: CF and dose per MU along the report's depth
// grid and at each point, with the method's variant and the water data's source printed alongside.
import { equivalentSquareCm, fieldAtDepthCm } from '../beam/geometry';
import type { WaterData } from '../beam/waterData';
import { dosePerMuFactors } from '../check/dosePerMu';
import type { MethodPoint, MethodResult } from '../methodResult';
import type { SlabPhantom } from '../phantom/slabPhantom';
import { collectingRecorder, type CorrectionOptions, type TypeAMethod } from './correctionTypes';

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

interface Evaluation {
  cf: number | null;
  dosePerMuCGy: number | null;
  flags: string[];
}

function evaluate(
  method: TypeAMethod,
  g: TypeAGeometry,
  wd: WaterData,
  depthCm: number,
  options: CorrectionOptions,
): Evaluation {
  const side = equivalentSquareCm(
    fieldAtDepthCm(g.fieldXCm, g.ssdCm, depthCm),
    fieldAtDepthCm(g.fieldYCm, g.ssdCm, depthCm),
  );
  const r = method.correct(g.phantom, depthCm, side, wd, options);
  if (r.cf === null) return { cf: null, dosePerMuCGy: null, flags: r.flags };
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
  const dose = Number.isFinite(factors.dosePerMuCGy) ? factors.dosePerMuCGy : null;
  const all = [...r.flags, ...flags().filter((f) => !r.flags.includes(f))];
  return { cf: r.cf, dosePerMuCGy: dose, flags: all };
}

export function typeAMethodResult(
  method: TypeAMethod,
  g: TypeAGeometry,
  wd: WaterData,
  options: CorrectionOptions = {},
): MethodResult {
  const opts: CorrectionOptions = { ...options, ssdCm: options.ssdCm ?? g.ssdCm };
  const cf: (number | null)[] = [];
  const dose: (number | null)[] = [];
  for (const d of g.depthCm) {
    const e = evaluate(method, g, wd, d, opts);
    cf.push(e.cf);
    dose.push(e.dosePerMuCGy);
  }
  const points: MethodPoint[] = g.points.map((p) => {
    const e = evaluate(method, g, wd, p.depthCm, opts);
    return { id: p.id, depthCm: p.depthCm, cf: e.cf, dosePerMuCGy: e.dosePerMuCGy, flags: e.flags };
  });
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
