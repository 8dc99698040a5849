// A density profile to slabs. Runs of similar relative electron density are grown sample by
// sample (a sample joins the run while it lies within the similarity threshold of the run's
// mean), runs thinner than the minimum thickness are merged into the neighbour closest in
// density, then neighbours within the threshold are merged, and finally the closest neighbours
// while there are more slabs than a case may hold. Each boundary is then moved to where the
// profile crosses half-way between the two slabs' levels (their median ρ_e), which puts a
// blurred interface where a sharp one would be; each slab's ρ_e is the profile's mean over its
// extent, so the radiological depth at every boundary equals that of the profile.

export interface SegmentationOptions {
  /** Largest difference of ρ_e within one slab (and between slabs that are merged). */
  similarityRhoE: number;
  /** Slabs thinner than this are merged into a neighbour (cm). */
  minThicknessCm: number;
  /** At most this many slabs. */
  maxSlabs: number;
}

export const DEFAULT_SEGMENTATION: SegmentationOptions = {
  similarityRhoE: 0.05,
  minThicknessCm: 0.5,
  maxSlabs: 50,
};

export interface Run {
  thicknessCm: number;
  /** Mean ρ_e over the slab. */
  rhoE: number;
}

/** A run of profile intervals [start, end). */
interface Span {
  start: number;
  end: number;
  thicknessCm: number;
  rhoE: number;
}

class Profile {
  readonly mass: Float64Array;
  constructor(
    readonly edges: ArrayLike<number>,
    readonly rho: ArrayLike<number>,
  ) {
    this.mass = new Float64Array(rho.length + 1);
    for (let q = 0; q < rho.length; q++)
      this.mass[q + 1] =
        (this.mass[q] as number) +
        (rho[q] as number) * ((edges[q + 1] as number) - (edges[q] as number));
  }
  span(start: number, end: number): Span {
    const t = (this.edges[end] as number) - (this.edges[start] as number);
    const m = (this.mass[end] as number) - (this.mass[start] as number);
    return { start, end, thicknessCm: t, rhoE: t > 0 ? m / t : (this.rho[start] as number) };
  }
  /** ∫₀ˣ ρ_e (cm), x within the profile. */
  massAt(x: number): number {
    const e = this.edges;
    let q = 0;
    while (q + 1 < this.rho.length && (e[q + 1] as number) <= x) q++;
    return (this.mass[q] as number) + (this.rho[q] as number) * (x - (e[q] as number));
  }
  median(s: Span): number {
    const v = Array.from(
      { length: s.end - s.start },
      (_, i) => this.rho[s.start + i] as number,
    ).sort((a, b) => a - b);
    return v[Math.floor(v.length / 2)] as number;
  }
}

function closestPair(spans: Span[]): [number, number] {
  let best = -1;
  let diff = Infinity;
  for (let i = 0; i + 1 < spans.length; i++) {
    const d = Math.abs((spans[i] as Span).rhoE - (spans[i + 1] as Span).rhoE);
    if (d < diff) {
      diff = d;
      best = i;
    }
  }
  return [best, diff];
}

function spansOf(p: Profile, o: SegmentationOptions): Span[] {
  const spans: Span[] = [];
  for (let q = 0; q < p.rho.length; q++) {
    const cur = spans[spans.length - 1];
    if (cur && Math.abs((p.rho[q] as number) - cur.rhoE) <= o.similarityRhoE)
      spans[spans.length - 1] = p.span(cur.start, q + 1);
    else spans.push(p.span(q, q + 1));
  }
  const merge = (i: number) =>
    spans.splice(i, 2, p.span((spans[i] as Span).start, (spans[i + 1] as Span).end));
  // Thin runs into their closest neighbour, thinnest first.
  for (;;) {
    if (spans.length < 2) break;
    let thin = -1;
    spans.forEach((s, i) => {
      if (
        s.thicknessCm < o.minThicknessCm &&
        (thin < 0 || s.thicknessCm < (spans[thin] as Span).thicknessCm)
      )
        thin = i;
    });
    if (thin < 0) break;
    const left = spans[thin - 1];
    const right = spans[thin + 1];
    const v = (spans[thin] as Span).rhoE;
    merge(
      left && (!right || Math.abs(left.rhoE - v) <= Math.abs(right.rhoE - v)) ? thin - 1 : thin,
    );
  }
  // Similar neighbours, closest first; then the closest while there are too many.
  for (;;) {
    const [i, d] = closestPair(spans);
    if (i < 0 || (d > o.similarityRhoE && spans.length <= o.maxSlabs)) break;
    merge(i);
  }
  return spans;
}

/** Depth where the profile crosses `level` between sample centres a and b, nearest to `near`. */
function crossing(
  p: Profile,
  depth: (q: number) => number,
  a: number,
  b: number,
  level: number,
  near: number,
): number | null {
  let best: number | null = null;
  for (let q = a; q < b; q++) {
    const u = (p.rho[q] as number) - level;
    const v = (p.rho[q + 1] as number) - level;
    if (u === 0 || u * v < 0) {
      const x = depth(q) + (u / (u - v)) * (depth(q + 1) - depth(q));
      if (best === null || Math.abs(x - near) < Math.abs(best - near)) best = x;
    }
  }
  return best;
}

export function segmentProfile(
  edgesCm: ArrayLike<number>,
  rhoE: ArrayLike<number>,
  o: SegmentationOptions,
): Run[] {
  if (rhoE.length === 0) return [];
  const p = new Profile(edgesCm, rhoE);
  const spans = spansOf(p, o);
  const centre = (q: number) => ((edgesCm[q] as number) + (edgesCm[q + 1] as number)) / 2;
  const bounds = [
    0,
    ...spans.slice(1).map((s) => edgesCm[s.start] as number),
    edgesCm[rhoE.length] as number,
  ];
  for (let k = 1; k < spans.length; k++) {
    const a = spans[k - 1] as Span;
    const b = spans[k] as Span;
    const level = (p.median(a) + p.median(b)) / 2;
    // Search between the middles of the two slabs, keep the boundary inside its neighbours.
    const from = Math.floor((a.start + a.end - 1) / 2);
    const to = Math.ceil((b.start + b.end - 1) / 2);
    const x = crossing(p, centre, from, to, level, bounds[k] as number);
    const lo = bounds[k - 1] as number;
    const hi = bounds[k + 1] as number;
    if (x !== null && x > lo + 1e-6 && x < hi - 1e-6) bounds[k] = x;
  }
  const runs: Run[] = [];
  for (let k = 0; k < spans.length; k++) {
    const top = bounds[k] as number;
    const bottom = bounds[k + 1] as number;
    const t = bottom - top;
    if (t <= 0) continue;
    runs.push({ thicknessCm: t, rhoE: (p.massAt(bottom) - p.massAt(top)) / t });
  }
  return runs;
}
