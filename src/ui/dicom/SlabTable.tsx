// The slabs of one beam, editable before use: thickness, material and density (blank = the
// material's default; a new material starts at its default). Each edit replaces the beam's slab list; "Back to the CT slabs" drops it.
import type { Slab } from '../../dicom/analyseBeam';
import { rhoEOfMaterial } from '../../dicom/materialMapping';
import { allMaterials, type MaterialId } from '../../engine/materials/materialLibrary';
import { NumInput } from '../check/NumInput';

export function SlabTable(props: {
  beamId: string;
  slabs: readonly Slab[];
  edited: boolean;
  onChange: (slabs: Slab[] | null) => void;
}) {
  const { slabs, beamId } = props;
  const patch = (i: number, p: Partial<Slab>) =>
    props.onChange(
      slabs.map((s, k) => {
        if (k !== i) return s;
        const next = { ...s, ...p };
        return { ...next, rhoE: rhoEOfMaterial(next.materialId, next.densityGPerCm3) };
      }),
    );
  const tops = slabs.map((_, i) => slabs.slice(0, i).reduce((t, s) => t + s.thicknessCm, 0));
  return (
    <table className="check-table slab-table" data-testid={`dicom-slabs-${beamId}`}>
      <caption>
        Slabs from the skin {props.edited ? '(edited)' : '(from the CT)'}{' '}
        {props.edited ? (
          <button
            type="button"
            onClick={() => props.onChange(null)}
            data-testid={`dicom-reset-${beamId}`}
          >
            Back to the CT slabs
          </button>
        ) : null}
      </caption>
      <thead>
        <tr>
          <th>#</th>
          <th>top (cm)</th>
          <th>thickness (cm)</th>
          <th>material</th>
          <th>density (g/cm³)</th>
          <th>ρe</th>
        </tr>
      </thead>
      <tbody>
        {slabs.map((s, i) => {
          return (
            <tr key={i}>
              <td>{i + 1}</td>
              <td>{(tops[i] ?? 0).toFixed(2)}</td>
              <td>
                <NumInput
                  label={`Slab ${i + 1} thickness`}
                  hideLabel
                  value={Number(s.thicknessCm.toFixed(3))}
                  testId={`dicom-slab-${beamId}-${i}-thickness`}
                  onCommit={(v) => v !== null && patch(i, { thicknessCm: v })}
                />
              </td>
              <td>
                <select
                  aria-label={`Slab ${i + 1} material`}
                  value={s.materialId}
                  data-testid={`dicom-slab-${beamId}-${i}-material`}
                  onChange={(e) =>
                    // A new material starts at its own default density.
                    patch(i, {
                      materialId: e.target.value as MaterialId,
                      densityGPerCm3: undefined,
                    })
                  }
                >
                  {allMaterials().map((m) => (
                    <option key={m.id} value={m.id}>
                      {m.label}
                    </option>
                  ))}
                </select>
              </td>
              <td>
                <NumInput
                  label={`Slab ${i + 1} density`}
                  hideLabel
                  allowEmpty
                  value={s.densityGPerCm3}
                  testId={`dicom-slab-${beamId}-${i}-density`}
                  onCommit={(v) => patch(i, { densityGPerCm3: v ?? undefined })}
                />
              </td>
              <td>{s.rhoE.toFixed(3)}</td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
