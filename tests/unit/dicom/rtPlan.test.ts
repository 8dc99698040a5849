// RT Plan reading (PS3.3 C.8.8.12–14): beams, first control point, fraction group values, and
// the beams Lamina refuses with their reason.
import { describe, expect, it } from 'vitest';
import { readDicomFile } from '../../../src/dicom/readPart10';
import { readRtPlan, type RtPlanInfo } from '../../../src/dicom/rtPlan';
import { writeRtPlan, type PlanBeamSpec, type PlanSpec } from '../../helpers/dicomPhantom';

const base: PlanBeamSpec = {
  number: 1,
  name: 'A',
  energyMV: 6,
  gantryDeg: 30,
  isoMm: [1, 2, 3],
  meterset: 123.4,
  doseGy: 1.8,
};

function read(spec: Partial<PlanSpec> & { beams: PlanBeamSpec[] }): RtPlanInfo {
  const f = writeRtPlan({ label: 'L', patientPosition: 'HFS', ...spec });
  const d = readDicomFile(f.name, f.bytes);
  if (!d.ok) throw new Error(d.message);
  const r = readRtPlan(d.file);
  if (!r.ok) throw new Error(r.message);
  return r.plan;
}

const refusal = (b: Partial<PlanBeamSpec>) =>
  read({ beams: [{ ...base, ...b }] }).beams[0]!.refusal;

describe('readRtPlan', () => {
  it.each([
    ['explicit', false],
    ['implicit', true],
  ] as const)(
    'reads geometry and fraction values (%s VR, undefined lengths %s)',
    (syntax, undef) => {
      const p = read({
        syntax,
        undefinedLengthSequences: undef,
        beams: [
          {
            ...base,
            couchDeg: 10,
            collimatorDeg: 90,
            sadMm: 800,
            jawXMm: [-40, 60],
            jawYMm: [-50, 50],
            ssdMm: 712.5,
          },
        ],
      });
      expect(p.label).toBe('L');
      expect(p.fractionsPlanned).toBe(25);
      const b = p.beams[0]!;
      expect(b).toMatchObject({
        number: 1,
        name: 'A',
        refusal: null,
        nominalEnergyMV: 6,
        patientPosition: 'HFS',
        sadMm: 800,
        gantryDeg: 30,
        couchDeg: 10,
        collimatorDeg: 90,
        isoMm: [1, 2, 3],
        jawXMm: [-40, 60],
        jawYMm: [-50, 50],
        plannedSsdMm: 712.5,
        meterset: 123.4,
        doseGy: 1.8,
        hasMlc: false,
      });
    },
  );

  it.each([
    [{ wedges: 1 }, /1 wedge: wedge factors are not modelled/],
    [{ radiationType: 'ELECTRON' }, /Radiation Type ELECTRON/],
    [{ finalGantryDeg: 180 }, /gantry angle changes from 30 to 180 between control points/],
    [{ gantryPitchDeg: 5 }, /gantry pitch 5°: not handled/],
  ] as const)('refuses a beam with %j', (b, why) => {
    expect(refusal(b)).toMatch(why);
  });

  it('reads a gantry pitch of 0 (FL) as no pitch in implicit VR too', () => {
    expect(
      read({ syntax: 'implicit', beams: [{ ...base, gantryPitchDeg: 0 }] }).beams[0]!.refusal,
    ).toBeNull();
  });

  it('notes an MLC (aperture not modelled) without refusing the beam', () => {
    const b = read({ beams: [{ ...base, mlc: true }] }).beams[0]!;
    expect(b.refusal).toBeNull();
    expect(b.hasMlc).toBe(true);
    expect(b.notes.join()).toMatch(/MLC present: its aperture is not modelled/);
  });

  it('keeps the fluence mode of a flattening-filter-free beam (refused later by energy mapping)', () => {
    expect(read({ beams: [{ ...base, fluenceModeId: 'FFF' }] }).beams[0]!.fluenceModeId).toBe(
      'FFF',
    );
  });

  it('skips setup beams', () => {
    const p = read({
      beams: [base, { ...base, number: 2, name: 'SETUP kV', deliveryType: 'SETUP' }],
    });
    expect(p.beams).toHaveLength(1);
    expect(p.skipped).toEqual(['SETUP kV: Treatment Delivery Type SETUP, not a treatment beam']);
  });

  it('refuses a plan not placed on a CT', () => {
    const f = writeRtPlan({
      label: 'L',
      patientPosition: 'HFS',
      beams: [base],
      geometry: 'TREATMENT_DEVICE',
    });
    const d = readDicomFile(f.name, f.bytes);
    expect(d.ok && readRtPlan(d.file)).toMatchObject({
      ok: false,
      message: expect.stringContaining('TREATMENT_DEVICE'),
    });
  });
});
