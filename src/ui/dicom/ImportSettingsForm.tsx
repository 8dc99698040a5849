// The settings that turn rays into slabs: body threshold, similarity, minimum slab thickness,
// material tolerance, extra points and the HU → ρe calibration curve (CSV, editable).
import { useState } from 'react';
import { DEFAULT_CALIBRATION_CSV, DEFAULT_CALIBRATION_LABEL } from '../../dicom/calibration';
import { NumInput } from '../check/NumInput';
import { patchDraft, useDicomImportStore } from './dicomImportStore';

export function ImportSettingsForm({ problems }: { problems: readonly string[] }) {
  const d = useDicomImportStore((s) => s.draft);
  const [csv, setCsv] = useState(d.calibrationCsv);
  const isDefault = d.calibrationLabel === DEFAULT_CALIBRATION_LABEL;
  return (
    <fieldset className="check-settings dicom-settings">
      <legend>From rays to slabs</legend>
      <NumInput
        label="Body threshold"
        unit="HU"
        min={-1000}
        value={d.bodyThresholdHu}
        testId="dicom-threshold"
        onCommit={(v) => v !== null && patchDraft({ bodyThresholdHu: v })}
      />
      <NumInput
        label="Similarity (largest ρe spread in a slab)"
        value={d.similarityRhoE}
        testId="dicom-similarity"
        onCommit={(v) => v !== null && patchDraft({ similarityRhoE: v })}
      />
      <NumInput
        label="Minimum slab thickness"
        unit="cm"
        value={d.minThicknessCm}
        testId="dicom-min-thickness"
        onCommit={(v) => v !== null && patchDraft({ minThicknessCm: v })}
      />
      <NumInput
        label="Material tolerance (ρe)"
        value={d.materialToleranceRhoE}
        testId="dicom-material-tolerance"
        onCommit={(v) => v !== null && patchDraft({ materialToleranceRhoE: v })}
      />
      <label className="extra-points">
        Extra points (cm past the isocentre, e.g. -3, 2)
        <input
          type="text"
          value={d.extraPoints}
          data-testid="dicom-extra-points"
          onChange={(e) => patchDraft({ extraPoints: e.target.value })}
        />
      </label>
      <div className="calibration">
        <label htmlFor="dicom-calibration">
          HU → relative electron density (CSV: HU, ρe) — <strong>{d.calibrationLabel}</strong>
        </label>
        {isDefault ? (
          <p className="caution-line" data-testid="dicom-calibration-caution">
            This default curve is generic and from memory: replace it with your scanner&apos;s
            calibration before relying on any number.
          </p>
        ) : null}
        <textarea
          id="dicom-calibration"
          rows={6}
          value={csv}
          spellCheck={false}
          data-testid="dicom-calibration"
          onChange={(e) => {
            setCsv(e.target.value);
            patchDraft({ calibrationCsv: e.target.value, calibrationLabel: 'edited in the page' });
          }}
        />
        <div>
          <label className="file-button">
            Load a calibration CSV…
            <input
              type="file"
              accept=".csv,.txt,text/csv"
              data-testid="dicom-calibration-file"
              onChange={(e) => {
                const f = e.target.files?.[0];
                e.target.value = '';
                if (!f) return;
                void f.text().then((t) => {
                  setCsv(t);
                  patchDraft({ calibrationCsv: t, calibrationLabel: `file ${f.name}` });
                });
              }}
            />
          </label>{' '}
          <button
            type="button"
            onClick={() => {
              setCsv(DEFAULT_CALIBRATION_CSV);
              patchDraft({
                calibrationCsv: DEFAULT_CALIBRATION_CSV,
                calibrationLabel: DEFAULT_CALIBRATION_LABEL,
              });
            }}
          >
            Generic curve
          </button>
        </div>
      </div>
      {problems.length > 0 ? (
        <ul className="dicom-problems" role="alert" data-testid="dicom-settings-problems">
          {problems.map((p, i) => (
            <li key={i}>{p}</li>
          ))}
        </ul>
      ) : null}
      <p className="help">
        Changing a setting derives every beam&apos;s slabs again (slab edits are dropped).
      </p>
    </fieldset>
  );
}
