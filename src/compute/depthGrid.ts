// The depth grid every curve of a report shares (also used by the page for the Monte Carlo run,
// without loading the engine).

/** Depth grid from 0 to the phantom's bottom with the given step, always including the bottom. */
export function depthGridCm(totalCm: number, stepCm: number): number[] {
  const n = Math.max(1, Math.round(totalCm / stepCm));
  const out: number[] = [];
  for (let i = 0; i <= n; i++) out.push((totalCm * i) / n);
  return out;
}
