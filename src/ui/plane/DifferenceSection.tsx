// The difference between two methods' dose planes, (A − B) in % of B's central-axis maximum, on
// B's grid (A resampled bilinearly when the grids differ), as a diverging colour map.
import { useMemo, useState } from 'react';
import { scaleLinear } from 'd3-scale';
import { interpolateRdBu } from 'd3-scale-chromatic';
import { centralAxisMax, planeDifferencePercent, type PlaneGrid } from '../../plots/planeGrid';
import { MethodSelect } from './MethodSelect';
import { PlaneMap } from './PlaneMap';
import type { PlaneMethodId, PlaneSource } from './planeSources';

// Red where A is higher, blue where lower (ColorBrewer RdBu, colour-blind safe).
const diverging = (t: number) => interpolateRdBu(1 - t);

function sameNodes(a: PlaneGrid, b: PlaneGrid): boolean {
  const eq = (u: readonly number[], v: readonly number[]) =>
    u.length === v.length && u.every((x, i) => Math.abs(x - (v[i] ?? NaN)) < 1e-9);
  return eq(a.xCm, b.xCm) && eq(a.depthCm, b.depthCm);
}

export function DifferenceSection(props: {
  sources: readonly PlaneSource[];
  initialB: PlaneMethodId;
  width: number;
  height: number;
  maxDepthCm: number;
  halfWidthCm: number;
  interfacesCm: readonly number[];
  depthCm: number;
  onPickDepth: (depthCm: number) => void;
  points: readonly { id: string; depthCm: number }[];
}) {
  const [diffA, setDiffA] = useState<PlaneMethodId>('superposition');
  const [diffB, setDiffB] = useState<PlaneMethodId>(props.initialB);
  const a = props.sources.find((s) => s.id === diffA)!;
  const b = props.sources.find((s) => s.id === diffB)!;
  const diff = useMemo(() => {
    if (!a.grid || !b.grid || diffA === diffB) return null;
    const g = planeDifferencePercent(a.grid, b.grid, centralAxisMax(b.grid));
    if (g.xCm.length < 2 || g.depthCm.length < 2) return null;
    let m = 0;
    for (const r of g.values)
      for (const v of r) if (Number.isFinite(v)) m = Math.max(m, Math.abs(v));
    const lim = scaleLinear()
      .domain([0, Math.max(1, m)])
      .nice()
      .domain()[1] as number;
    return { grid: g, maxAbs: m, lim };
  }, [a.grid, b.grid, diffA, diffB]);
  const diffMessage =
    diffA === diffB
      ? 'Pick two different methods.'
      : !a.grid
        ? `No plane for ${a.label}: ${a.reason ?? ''}`
        : !b.grid
          ? `No plane for ${b.label}: ${b.reason ?? ''}`
          : diff === null
            ? 'The two planes do not overlap.'
            : null;

  return (
    <section className="plane-section" aria-label="Difference between two methods">
      <div className="chart-controls">
        <MethodSelect
          id="diff-a"
          label="Difference"
          value={diffA}
          onChange={setDiffA}
          sources={props.sources}
        />
        <MethodSelect
          id="diff-b"
          label="minus"
          value={diffB}
          onChange={setDiffB}
          sources={props.sources}
        />
      </div>
      {diff && !diffMessage ? (
        <>
          <PlaneMap
            title={`${a.label} minus ${b.label} in % of the ${b.label} central-axis maximum`}
            testId="plane-diff"
            grid={diff.grid}
            width={props.width}
            height={props.height}
            maxDepthCm={props.maxDepthCm}
            halfWidthCm={props.halfWidthCm}
            interfacesCm={props.interfacesCm}
            interpolate={diverging}
            domain={[-diff.lim, diff.lim]}
            bar={{ domain: [-diff.lim, diff.lim], label: `% of ${b.label} CAX max` }}
            markerDepthCm={props.depthCm}
            onPickDepth={props.onPickDepth}
            points={props.points}
            formatValue={(v) => `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(1)} %`}
          />
          <p className="plane-note" data-testid="plane-diff-note">
            {a.label} − {b.label}: largest difference {diff.maxAbs.toFixed(1)} % of the {b.label}{' '}
            central-axis maximum (red: {a.label} higher; blue: lower).{' '}
            {a.grid && b.grid && !sameNodes(a.grid, b.grid)
              ? `${a.label} resampled (bilinear) onto the ${b.label} grid.`
              : ''}
          </p>
        </>
      ) : (
        <p className="notice info" data-testid="plane-diff-missing">
          {diffMessage}
        </p>
      )}
    </section>
  );
}
