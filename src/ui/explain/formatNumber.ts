// Numbers on the factor view: significant digits, exponent for tiny values, a dash (never NaN).
export function num(v: number | null | undefined, digits = 5): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  if (v !== 0 && Math.abs(v) < 1e-3) return v.toExponential(digits - 1);
  return v.toPrecision(digits);
}
