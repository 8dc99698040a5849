// One imported beam: its geometry and the planning system's values, the density profile along
// its central ray with the slabs over it, and the slab table; or why it cannot be checked.
import type { Slab } from '../../dicom/analyseBeam';
import type { ImportedBeam } from '../../dicom/importDicom';
import type { AnalysedBeam } from '../../dicom/importPipeline';
import { ISO_POINT_ID } from '../../dicom/assemblePlan';
import { BEAM_ENERGY_LABELS } from '../../engine/beam/energies';
import { DensityProfileChart } from './DensityProfileChart';
import { SlabTable } from './SlabTable';

const f = (v: number, d = 1) => Number(v.toFixed(d)).toString();

function Geometry({ b }: { b: ImportedBeam }) {
  return (
    <p className="beam-geometry">
      Gantry {f(b.gantryDeg)}°, couch {f(b.couchDeg)}°, collimator {f(b.collimatorDeg)}° (IEC
      61217), {b.patientPosition ?? '—'};{' '}
      {b.energy ? BEAM_ENERGY_LABELS[b.energy] : `${b.nominalEnergyMV ?? '?'} MV`}; SAD{' '}
      {f(b.sadMm / 10)} cm
      {b.field ? `; field ${f(b.field.xAtIsoCm)} × ${f(b.field.yAtIsoCm)} cm at the isocentre` : ''}
      ; planning {b.meterset !== null ? `${f(b.meterset)} MU` : 'MU —'},{' '}
      {b.doseGy !== null ? `${f(b.doseGy * 100)} cGy` : 'dose —'}
    </p>
  );
}

export function BeamCard(props: {
  item: AnalysedBeam;
  slabs: readonly Slab[] | null;
  edited: boolean;
  extraOffsetsCm: readonly number[];
  width: number;
  onSlabs: (slabs: Slab[] | null) => void;
}) {
  const { beam: b, analysis: a, problem } = props.item;
  return (
    <section
      className={`dicom-beam${problem ? ' refused' : ''}`}
      data-testid={`dicom-beam-${b.id}`}
    >
      <h3>
        {b.id} — {b.name}
      </h3>
      <Geometry b={b} />
      {problem ? (
        <p className="dicom-refusal" role="note" data-testid={`dicom-refusal-${b.id}`}>
          Not checked: {problem}
        </p>
      ) : null}
      {a && props.slabs ? (
        <>
          <p className="beam-depths">
            SSD <strong data-testid={`dicom-ssd-${b.id}`}>{a.ssdCm.toFixed(2)}</strong> cm
            {b.plannedSsdMm !== null
              ? ` (planning system ${(b.plannedSsdMm / 10).toFixed(2)} cm)`
              : ''}
            , isocentre depth{' '}
            <strong data-testid={`dicom-isodepth-${b.id}`}>{a.isoDepthCm.toFixed(2)}</strong> cm
            along the ray, {a.pathCm.toFixed(1)} cm of body on the ray.
          </p>
          <DensityProfileChart
            title={`Relative electron density along the central ray of ${b.name}, with the slabs`}
            testId={`dicom-profile-${b.id}`}
            depthCm={a.profile.depthCm}
            rhoE={a.profile.rhoE}
            slabs={props.slabs}
            markers={[
              { id: ISO_POINT_ID, depthCm: a.isoDepthCm },
              ...props.extraOffsetsCm.map((o) => ({
                id: `${o >= 0 ? '+' : ''}${o}`,
                depthCm: a.isoDepthCm + o,
              })),
            ]}
            width={props.width}
          />
          <SlabTable
            beamId={b.id}
            slabs={props.slabs}
            edited={props.edited}
            onChange={props.onSlabs}
          />
        </>
      ) : null}
      {[...b.notes, ...(a?.notes ?? [])].length > 0 ? (
        <ul className="beam-notes">
          {[...b.notes, ...(a?.notes ?? [])].map((n, i) => (
            <li key={i}>{n}</li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
