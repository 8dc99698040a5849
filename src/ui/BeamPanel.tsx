// Beam set-up: energy, SSD or SAD geometry, field size at 100 cm.
import { BEAM_ENERGIES, BEAM_ENERGY_LABELS, isBeamEnergy } from '../engine/beam/energies';
import { NEEDS_WATER_DATA } from '../contract/reports';
import { editCase, setTab, useAppStore } from '../state/store';
import type { EditorCase } from '../state/editorCase';
import { NumberField } from './NumberField';
import { totalThicknessCm } from '../state/editorCase';
import { snapCm } from '../state/layerOps';
import { RULES } from './fieldRules';

type Beam = EditorCase['beam'];

function setBeam(patch: Partial<Beam>, key: string | null = null) {
  editCase((c) => ({ ...c, beam: { ...c.beam, ...patch } }), key);
}

/** The water data the last calculation's type-A methods actually read, as the engine names it. */
function WaterDataLine() {
  const used = useAppStore(
    (s) => s.calc.report?.methods.find((m) => m.methodClass === 'type A')?.waterData ?? null,
  );
  // The modelled beam chosen although the case carries its own table: say so, it is not the default.
  const overridden = useAppStore(
    (s) => s.waterSource === 'modelled' && s.history.present.waterData !== undefined,
  );
  const needs = useAppStore(
    (s) => s.calc.report?.unavailable.some((u) => u.reason === NEEDS_WATER_DATA) ?? false,
  );
  return (
    <div className="water-line" data-testid="water-line">
      <span className="label">Water data</span>{' '}
      {used ? (
        <span className="water-used" title={used}>
          {used.split(';')[0]}
          {overridden ? ' — chosen instead of the case’s own table' : ''}
        </span>
      ) : needs ? (
        <span className="missing-text">no table loaded (type-A methods cannot run)</span>
      ) : (
        <span className="hint">—</span>
      )}{' '}
      <button type="button" onClick={() => setTab('water')}>
        Change…
      </button>
    </div>
  );
}

export function BeamPanel() {
  const beam = useAppStore((s) => s.history.present.beam);
  const setup = beam.setup;
  const totalCm = useAppStore((s) => totalThicknessCm(s.history.present));
  return (
    <section className="panel" aria-labelledby="beam-h">
      <h2 id="beam-h">Beam</h2>
      <div className="row">
        <div className="field">
          <label htmlFor="energy">Energy</label>
          <select
            id="energy"
            value={beam.energy}
            onChange={(e) => {
              if (isBeamEnergy(e.target.value)) setBeam({ energy: e.target.value });
            }}
          >
            {BEAM_ENERGIES.map((e) => (
              <option key={e} value={e}>
                {BEAM_ENERGY_LABELS[e]}
              </option>
            ))}
          </select>
        </div>
        <fieldset className="field segmented">
          <legend>Set-up</legend>
          {(['SSD', 'SAD'] as const).map((kind) => (
            <label key={kind}>
              <input
                type="radio"
                name="setup"
                value={kind}
                checked={setup.kind === kind}
                onChange={() =>
                  setBeam({
                    setup:
                      kind === 'SSD'
                        ? {
                            kind: 'SSD',
                            ssdCm:
                              setup.kind === 'SAD' ? setup.sadCm - setup.isocentreDepthCm : 100,
                          }
                        : {
                            kind: 'SAD',
                            sadCm: 100,
                            // 10 cm deep, or mid-phantom in a thinner one.
                            isocentreDepthCm: Math.min(10, snapCm(totalCm / 2)),
                          },
                  })
                }
              />
              {kind}
            </label>
          ))}
        </fieldset>
      </div>
      <div className="row">
        {setup.kind === 'SSD' ? (
          <NumberField
            draftKey="beam.setup.ssdCm"
            label="SSD"
            rule={RULES.distance('SSD')}
            value={setup.ssdCm}
            testId="ssd"
            onCommit={(v) => setBeam({ setup: { kind: 'SSD', ssdCm: v } }, 'beam.setup.ssdCm')}
          />
        ) : (
          <>
            <NumberField
              draftKey="beam.setup.sadCm"
              label="SAD"
              rule={RULES.distance('SAD')}
              value={setup.sadCm}
              onCommit={(v) => setBeam({ setup: { ...setup, sadCm: v } }, 'beam.setup.sadCm')}
            />
            <NumberField
              draftKey="beam.setup.isocentreDepthCm"
              label="Isocentre depth"
              rule={RULES.isocentreDepth}
              value={setup.isocentreDepthCm}
              onCommit={(v) =>
                setBeam({ setup: { ...setup, isocentreDepthCm: v } }, 'beam.setup.isocentreDepthCm')
              }
            />
          </>
        )}
      </div>
      <div className="row">
        <NumberField
          draftKey="beam.fieldXCm"
          label="Field X at 100 cm"
          rule={RULES.field('X')}
          value={beam.fieldXCm}
          testId="field-x"
          onCommit={(v) => setBeam({ fieldXCm: v }, 'beam.fieldXCm')}
        />
        <NumberField
          draftKey="beam.fieldYCm"
          label="Field Y at 100 cm"
          rule={RULES.field('Y')}
          value={beam.fieldYCm}
          testId="field-y"
          onCommit={(v) => setBeam({ fieldYCm: v }, 'beam.fieldYCm')}
        />
      </div>
      <WaterDataLine />
    </section>
  );
}
