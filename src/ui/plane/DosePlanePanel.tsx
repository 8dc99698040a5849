// The "Dose plane" tab: the x–z dose of each method that gives one as a colour map with isodose
// lines under the slab strip (same depth axis), lateral profiles of every method at a chosen depth,
// and the difference between two methods in % of the reference method's central-axis maximum.
import { useMemo, useState } from 'react';
import { interpolateViridis } from 'd3-scale-chromatic';
import { toCaseFile, boundariesCm, totalThicknessCm } from '../../state/editorCase';
import { useAppStore } from '../../state/store';
import { useMonteCarloStore } from '../../state/monteCarloStore';
import { seriesStyles } from '../../plots/palette';
import { centralAxisMax, rowAtDepth } from '../../plots/planeGrid';
import { SlabStrip } from '../SlabStrip';
import { useElementWidth } from '../useElementWidth';
import { DifferenceSection } from './DifferenceSection';
import { MethodSelect } from './MethodSelect';
import { PlaneMap } from './PlaneMap';
import { ProfileChart } from './ProfileChart';
import { planeKeyOf, planeSources, runMatchesCase, type PlaneMethodId } from './planeSources';
import { usePlanes } from './usePlanes';
import './plane.css';

const ISODOSE_PERCENTS = [20, 50, 80, 90, 95, 100] as const;

type Unit = 'percent' | 'dose';

function halfWidthOf(grids: readonly { xCm: readonly number[] }[]): number {
  let h = 1;
  for (const g of grids)
    h = Math.max(h, Math.abs(g.xCm[0] ?? 0), Math.abs(g.xCm[g.xCm.length - 1] ?? 0));
  return h;
}

export function DosePlanePanel() {
  const present = useAppStore((s) => s.history.present);
  const raw = useMemo(() => toCaseFile(present), [present]);
  const doseTo = useAppStore((s) => s.check.doseTo);
  const key = planeKeyOf(raw, doseTo);
  const [retry, setRetry] = useState(0);
  const { planes, updating, error } = usePlanes(raw, key, retry);
  const mcPlane = useMonteCarloStore((s) => s.result?.plane ?? null);
  const mcKey = useMonteCarloStore((s) => s.caseKey);
  const mcRunning = useMonteCarloStore((s) => s.status === 'running');
  const sources = useMemo(
    () =>
      planeSources({
        typeB: planes,
        pending: updating,
        mc: { plane: mcPlane, matches: runMatchesCase(mcKey, raw, doseTo), running: mcRunning },
      }),
    // raw changes with every edit; the plane only with the key
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [planes, updating, mcPlane, mcKey, mcRunning, key],
  );
  const [rootRef, width] = useElementWidth<HTMLDivElement>();
  const [mapId, setMapId] = useState<PlaneMethodId>('superposition');
  const [unit, setUnit] = useState<Unit>('percent');
  const totalCm = totalThicknessCm(present);
  const interfacesCm = boundariesCm(present).slice(1, -1);
  const [depthText, setDepthText] = useState<string | null>(null);
  const [profileDepthCm, setProfileDepthCm] = useState<number>(() =>
    Math.min(totalCm, present.points[0]?.depthCm ?? totalCm / 2),
  );
  const depthCm = Math.max(0, Math.min(totalCm, profileDepthCm));
  const pickDepth = (d: number) => {
    setProfileDepthCm(Math.round(d * 10) / 10);
    setDepthText(null);
  };

  const available = sources.filter((s) => s.grid !== null);
  const halfWidthCm = halfWidthOf(available.map((s) => s.grid!));
  const norm = new Map(available.map((s) => [s.id, centralAxisMax(s.grid!)]));
  const styles = seriesStyles(sources.map((s) => s.id));
  const mapSource = sources.find((s) => s.id === mapId)!;
  const mapHeight = Math.round(Math.max(220, Math.min(380, (width - 88) * 0.55))) + 92;
  const unitLabel = unit === 'percent' ? '% of CAX max' : 'cGy/MU';
  const isodose = useMemo(
    () =>
      mapSource.grid ? { normDose: norm.get(mapId) ?? NaN, percents: ISODOSE_PERCENTS } : undefined,
    // norm follows the grid
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [mapSource.grid, mapId],
  );

  const profileSeries = available.map((s) => {
    const n = norm.get(s.id) ?? NaN;
    const row = rowAtDepth(s.grid!, depthCm);
    const st = styles.get(s.id)!;
    return {
      id: s.id,
      label: s.label,
      color: st.color,
      dash: st.dash,
      xCm: s.grid!.xCm,
      values: unit === 'percent' ? row.map((v) => (100 * v) / n) : row,
    };
  });

  return (
    <div className="dose-plane" ref={rootRef} data-testid="dose-plane">
      <div className="plane-head">
        <h2>Dose plane (x–z through the central axis, y = 0)</h2>
        <span className="plane-status" aria-live="polite" data-testid="plane-status">
          {updating ? 'updating…' : 'up to date'}
        </span>
      </div>
      {error ? (
        <div className="notice error" role="alert" data-testid="plane-error">
          {error}{' '}
          <button type="button" onClick={() => setRetry((r) => r + 1)}>
            Retry
          </button>
        </div>
      ) : null}
      <section className="plane-section" aria-label="Dose map">
        <div className="chart-controls">
          <MethodSelect
            id="plane-method"
            label="Map"
            value={mapId}
            onChange={setMapId}
            sources={sources}
          />
          <label className="inline">
            <span>Colour scale</span>
            <select
              data-testid="plane-unit"
              value={unit}
              onChange={(e) => setUnit(e.target.value as Unit)}
            >
              <option value="percent">% of central-axis maximum</option>
              <option value="dose">cGy/MU</option>
            </select>
          </label>
        </div>
        <SlabStrip width={width} />
        {mapSource.grid ? (
          <>
            <PlaneMap
              title={`${mapSource.label}: dose in the x–z plane with isodose lines`}
              testId="plane-map"
              grid={mapSource.grid}
              width={width}
              height={mapHeight}
              maxDepthCm={totalCm}
              halfWidthCm={halfWidthCm}
              interfacesCm={interfacesCm}
              interpolate={interpolateViridis}
              domain={[0, (norm.get(mapId) ?? 1) * 1.1]}
              bar={{
                domain: unit === 'percent' ? [0, 110] : [0, (norm.get(mapId) ?? 1) * 1.1],
                label: unitLabel,
              }}
              isodose={isodose}
              markerDepthCm={depthCm}
              onPickDepth={pickDepth}
              points={present.points}
              formatValue={(v) => {
                const n = norm.get(mapId) ?? NaN;
                return `${v.toFixed(3)} cGy/MU (${((100 * v) / n).toFixed(1)} % of CAX max)`;
              }}
            />
            <p className="plane-note" data-testid="plane-isodose-note">
              Isodose lines at {ISODOSE_PERCENTS.join(', ')} % of the central-axis maximum of{' '}
              {mapSource.label} ({(norm.get(mapId) ?? NaN).toFixed(3)} cGy/MU). Click the map to set
              the profile depth.
            </p>
          </>
        ) : (
          <p className="notice info" data-testid="plane-map-missing">
            No plane for {mapSource.label}: {mapSource.reason}
          </p>
        )}
      </section>
      <section className="plane-section" aria-label="Lateral profile">
        <div className="chart-controls">
          <label className="inline">
            <span>Profile depth (cm)</span>
            <input
              type="range"
              min={0}
              max={totalCm}
              step={0.1}
              value={depthCm}
              data-testid="profile-depth-slider"
              onChange={(e) => pickDepth(Number(e.target.value))}
            />
            <input
              type="number"
              min={0}
              max={totalCm}
              step={0.1}
              className="num-input"
              value={depthText ?? String(depthCm)}
              data-testid="profile-depth"
              onChange={(e) => {
                setDepthText(e.target.value);
                const v = Number(e.target.value);
                if (e.target.value.trim() !== '' && Number.isFinite(v)) setProfileDepthCm(v);
              }}
              onBlur={() => setDepthText(null)}
            />
          </label>
        </div>
        {profileSeries.length > 0 ? (
          <ProfileChart
            title={`Lateral dose profiles at ${depthCm.toFixed(1)} cm depth`}
            series={profileSeries}
            halfWidthCm={halfWidthCm}
            width={width}
            height={260}
            yLabel={unit === 'percent' ? 'Dose (% of own CAX max)' : 'Dose per MU (cGy/MU)'}
            digits={unit === 'percent' ? 1 : 3}
          />
        ) : null}
        <p className="plane-note" data-testid="profile-note">
          {profileSeries.length > 0
            ? `Profiles at ${depthCm.toFixed(1)} cm depth.`
            : 'No profiles.'}
          {sources
            .filter((s) => !s.grid)
            .map((s) => ` No plane for ${s.label}: ${s.reason}`)
            .join('')}
        </p>
      </section>
      <DifferenceSection
        sources={sources}
        initialB={mcPlane ? 'monte-carlo' : 'pencil-beam'}
        width={width}
        height={mapHeight}
        maxDepthCm={totalCm}
        halfWidthCm={halfWidthCm}
        interfacesCm={interfacesCm}
        depthCm={depthCm}
        onPickDepth={pickDepth}
        points={present.points}
      />
    </div>
  );
}
