// The slab stack drawn to scale along the depth axis (beam from the left), aligned with the
// charts below. Boundaries drag with the pointer or move with the arrow keys (±0.1 cm, Shift
// ±1 cm); a click on the ruler places a point of interest.
import { useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { getMaterial, relativeElectronDensity } from '../engine/materials/materialLibrary';
import { depthTicks } from '../plots/depthAxis';
import { slabLayout } from '../plots/slabLayout';
import { boundariesCm } from '../state/editorCase';
import { moveBoundary } from '../state/layerOps';
import { requestSpeculation } from '../state/speculation';
import { editCase, endGesture, useAppStore } from '../state/store';
import { SIDE_MARGIN } from './frame';
import { addPoint } from './pointOps';

const BAND_TOP = 6;
const BAND_H = 50;
const RULER_H = 30;
const HEIGHT = BAND_TOP + BAND_H + RULER_H;

export function SlabStrip({ width }: { width: number }) {
  const layers = useAppStore((s) => s.history.present.layers);
  const points = useAppStore((s) => s.history.present.points);
  const setup = useAppStore((s) => s.history.present.beam.setup);
  const svgRef = useRef<SVGSVGElement>(null);
  // While a boundary is dragged the axis keeps (at least) its starting depth.
  const [frozenDepthCm, setFrozenDepthCm] = useState(0);
  const frame = { width, height: HEIGHT, margin: { ...SIDE_MARGIN, top: 0, bottom: 0 } };
  const layout = slabLayout(
    layers.map((l) => {
      const m = getMaterial(l.materialId);
      const rho = l.densityGPerCm3 ?? m.defaultDensityGPerCm3;
      return {
        key: l.key,
        label: l.label ?? m.label.replace(/ \(.*\)$/, ''),
        thicknessCm: l.thicknessCm,
        relativeElectronDensity: relativeElectronDensity(l.materialId, rho),
      };
    }),
    frame,
    frozenDepthCm,
  );
  const depthAt = (clientX: number) => {
    const box = svgRef.current?.getBoundingClientRect();
    return layout.x.invert(clientX - (box?.left ?? 0));
  };
  const onHandleDown = (k: number) => (e: PointerEvent<SVGRectElement>) => {
    e.preventDefault();
    e.currentTarget.setPointerCapture(e.pointerId);
    setFrozenDepthCm(layout.totalCm);
    requestSpeculation(k);
  };
  const onHandleMove = (k: number) => (e: PointerEvent<SVGRectElement>) => {
    if (!e.currentTarget.hasPointerCapture(e.pointerId)) return;
    const z = depthAt(e.clientX);
    editCase((c) => moveBoundary(c, k, z), `drag-${k}`);
  };
  const onHandleUp = (e: PointerEvent<SVGRectElement>) => {
    if (e.currentTarget.hasPointerCapture(e.pointerId))
      e.currentTarget.releasePointerCapture(e.pointerId);
    setFrozenDepthCm(0);
    endGesture();
    requestSpeculation(null);
  };
  const onHandleKey = (k: number) => (e: KeyboardEvent<SVGGElement>) => {
    const step = e.shiftKey ? 1 : 0.1;
    let delta = 0;
    if (e.key === 'ArrowRight' || e.key === 'ArrowDown') delta = step;
    else if (e.key === 'ArrowLeft' || e.key === 'ArrowUp') delta = -step;
    else return;
    e.preventDefault();
    // One gesture while the key is held (auto-repeat): one undo step, previews while it lasts
    // and the full calculation once the keys settle.
    editCase((c) => moveBoundary(c, k, (boundariesCm(c)[k] ?? 0) + delta), `nudge-${k}`);
  };
  const ticks = depthTicks(layout.x);
  const rulerY = BAND_TOP + BAND_H;
  return (
    <svg
      ref={svgRef}
      className="slab-strip"
      width={width}
      height={HEIGHT}
      role="group"
      aria-label="Slab stack to scale along depth; drag a boundary or use arrow keys"
      data-testid="slab-strip"
    >
      {layout.rects.map((r) => (
        <g key={r.key} data-testid={`slab-${r.index + 1}`}>
          <rect
            x={r.x}
            y={BAND_TOP}
            width={r.width}
            height={BAND_H}
            fill={r.fill}
            className="slab"
          />
          {r.showLabel ? (
            <text
              x={r.x + r.width / 2}
              y={BAND_TOP + BAND_H / 2 + 4}
              textAnchor="middle"
              className={r.dark ? 'slab-label on-dark' : 'slab-label'}
            >
              {r.label}
            </text>
          ) : null}
          <title>{`Layer ${r.index + 1}: ${r.label}`}</title>
        </g>
      ))}
      <text
        x={SIDE_MARGIN.left - 8}
        y={BAND_TOP + BAND_H / 2 + 4}
        textAnchor="end"
        className="axis-note"
      >
        beam →
      </text>
      <g
        className="ruler"
        onClick={(e) =>
          editCase((c) => addPoint(c, Math.max(0, Math.min(layout.totalCm, depthAt(e.clientX)))))
        }
      >
        <rect
          x={SIDE_MARGIN.left}
          y={rulerY}
          width={Math.max(0, layout.x.range()[1]! - SIDE_MARGIN.left)}
          height={RULER_H}
          className="ruler-hit"
          data-testid="depth-ruler"
        >
          <title>Click to place a point of interest at this depth</title>
        </rect>
        <line
          x1={SIDE_MARGIN.left}
          x2={layout.x.range()[1]}
          y1={rulerY}
          y2={rulerY}
          className="axis-line"
        />
        {ticks.map((t) => (
          <g key={t.value}>
            <line x1={t.px} x2={t.px} y1={rulerY} y2={rulerY + 5} className="axis-line" />
            <text x={t.px} y={rulerY + 17} textAnchor="middle" className="tick-label">
              {t.label}
            </text>
          </g>
        ))}
        <text x={SIDE_MARGIN.left - 8} y={rulerY + 17} textAnchor="end" className="axis-note">
          cm
        </text>
      </g>
      {points.map((p) => {
        const px = layout.x(Math.min(p.depthCm, layout.totalCm));
        return (
          <g key={p.key} className="point-marker" pointerEvents="none">
            <path d={`M${px},${rulerY - 1} l-5,-8 h10 z`} />
          </g>
        );
      })}
      {setup.kind === 'SAD' && setup.isocentreDepthCm <= layout.totalCm ? (
        <g
          className="iso-marker"
          pointerEvents="none"
          transform={`translate(${layout.x(setup.isocentreDepthCm)} ${BAND_TOP + BAND_H - 10})`}
          data-testid="isocentre"
        >
          <circle r={5} />
          <path d="M-7,0H7M0,-7V7" />
          <title>{`Isocentre at ${setup.isocentreDepthCm} cm (SAD ${setup.sadCm} cm)`}</title>
        </g>
      ) : null}
      {layout.handles.map((h) => (
        <g
          key={h.k}
          className="handle"
          tabIndex={0}
          role="slider"
          aria-label={`Boundary ${h.k} (bottom of layer ${h.k})`}
          aria-valuenow={h.depthCm}
          aria-valuetext={`${h.depthCm.toFixed(1)} cm`}
          aria-valuemin={0}
          aria-valuemax={100}
          aria-orientation="horizontal"
          data-testid={`boundary-${h.k}`}
          onKeyDown={onHandleKey(h.k)}
          onFocus={() => requestSpeculation(h.k)}
          onKeyUp={endGesture}
          onBlur={() => {
            endGesture();
            requestSpeculation(null);
          }}
        >
          <line
            x1={h.x}
            x2={h.x}
            y1={BAND_TOP - 4}
            y2={BAND_TOP + BAND_H + 4}
            className="handle-line"
          />
          <rect
            x={h.x - 3}
            y={BAND_TOP + BAND_H / 2 - 9}
            width={6}
            height={18}
            rx={2}
            className="handle-grip"
          />
          <rect
            x={h.x - 7}
            y={BAND_TOP - 4}
            width={14}
            height={BAND_H + 8}
            className="handle-hit"
            onPointerDown={onHandleDown(h.k)}
            onPointerMove={onHandleMove(h.k)}
            onPointerUp={onHandleUp}
            onPointerCancel={onHandleUp}
          >
            <title>{`Boundary at ${h.depthCm.toFixed(1)} cm: drag, or focus and use arrow keys`}</title>
          </rect>
        </g>
      ))}
    </svg>
  );
}
