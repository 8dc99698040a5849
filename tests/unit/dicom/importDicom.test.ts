// The whole import from files: what is refused, with which message, and what is only noted.
import { describe, expect, it } from 'vitest';
import { analyseBeam } from '../../../src/dicom/analyseBeam';
import { importDicom } from '../../../src/dicom/importDicom';
import { defaultImportSettings } from '../../../src/dicom/importSettings';
import { writeRtPlan, type NamedBytes } from '../../helpers/dicomPhantom';
import { boxPlanFiles } from '../../helpers/dicomFixtures';
import { str, writePart10 } from '../../helpers/dicomWriter';
import { sourcesOf } from '../../helpers/dicomScenario';

const files = boxPlanFiles();
const ct = files.filter((f) => f.name.startsWith('CT'));
const planWith = (
  beams: Parameters<typeof writeRtPlan>[0]['beams'],
  extra: Partial<Parameters<typeof writeRtPlan>[0]> = {},
) => writeRtPlan({ label: 'P', patientPosition: 'HFS', beams, ...extra });
const beam = (n: number, over: object = {}) => ({
  number: n,
  name: `B${n}`,
  energyMV: 6,
  gantryDeg: 0,
  isoMm: [0, 0, 0] as const,
  ...over,
});

async function problems(list: NamedBytes[]) {
  const r = await importDicom(sourcesOf(list));
  return r.ok ? [] : r.problems;
}

describe('importDicom', () => {
  it('reads the four-field box plan with progress for every file and beam', async () => {
    const seen: string[] = [];
    const r = await importDicom(sourcesOf(files), (p) =>
      seen.push(`${p.stage} ${p.done}/${p.total}`),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.beams.map((b) => b.refusal)).toEqual([null, null, null, null]);
    expect(seen.filter((s) => s.startsWith('reading'))).toHaveLength(files.length);
    expect(seen.at(-1)).toBe('tracing 4/4');
  });

  it('needs an RT Plan and CT images', async () => {
    expect(await problems(ct)).toEqual(['no RT Plan among the files']);
    expect(await problems([files.at(-1)!])).toEqual(['no CT Image among the files']);
  });

  it('refuses two RT Plans', async () => {
    const two = [...files, { ...planWith([beam(1)]), name: 'other.dcm' }];
    expect((await problems(two))[0]).toMatch(
      /several RT Plans \(RP\.plan\.dcm, other\.dcm\): drop one/,
    );
  });

  it('refuses a plan made on another CT (Frame of Reference UID)', async () => {
    expect(
      await problems([...ct, planWith([beam(1)], { frameOfReferenceUid: '2.25.999' })]),
    ).toEqual([
      "the RT Plan's Frame of Reference UID (0020,0052) differs from the CT's: the plan was not made on this CT",
    ]);
  });

  it('ignores other DICOM objects and non-DICOM files, and lists them', async () => {
    const rtStruct = {
      name: 'RS.dcm',
      bytes: writePart10([str(0x00080060, 'CS', 'RTSTRUCT')], {
        syntax: 'explicit',
        sopClassUid: '1.2.840.10008.5.1.4.1.1.481.3',
        sopInstanceUid: '2.25.7',
      }),
    };
    const note = { name: 'README.txt', bytes: new TextEncoder().encode('not dicom') };
    const r = await importDicom(sourcesOf([...files, rtStruct, note]));
    expect(r.ok && r.value.ignored).toEqual([
      'RS.dcm: RT Structure Set (1.2.840.10008.5.1.4.1.1.481.3), not used',
      'README.txt: too short for a DICOM Part 10 file (9 bytes; PS3.10 7.1: 128-byte preamble, then "DICM")',
    ]);
  });

  it('refuses beams at a second isocentre, an unknown energy, a patient position other than the CT’s, an isocentre outside the CT', async () => {
    const r = await importDicom(
      sourcesOf([
        ...ct,
        planWith([
          beam(1),
          beam(2, { isoMm: [0, 0, 20] }),
          beam(3, { energyMV: 8 }),
          beam(4, { isoMm: [0, 0, 900] }),
        ]),
      ]),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const [b1, b2, b3, b4] = r.value.beams;
    expect(b1!.refusal).toBeNull();
    expect(b2!.refusal).toMatch(
      /isocentre \(0\.0, 0\.0, 20\.0\) mm differs from B1's \(0\.0, 0\.0, 0\.0\) mm/,
    );
    expect(b3!.refusal).toMatch(/no Lamina beam fits a nominal energy of 8 MV/);
    expect(b4!.refusal).toMatch(/isocentre \(0\.0, 0\.0, 900\.0\) mm lies outside the CT volume/);
    const prone = await importDicom(
      sourcesOf([...ct, planWith([beam(1)], { patientPosition: 'HFP' })]),
    );
    expect(prone.ok && prone.value.beams[0]!.refusal).toBe(
      "the plan's patient position HFP differs from the CT's HFS",
    );
  });

  it('refuses an isocentre in the air in front of the body', async () => {
    // The box's front face is at y = −100 mm and the scan reaches y = −120 mm: y = −110 mm is air.
    const r = await importDicom(sourcesOf([...ct, planWith([beam(1, { isoMm: [0, -110, 0] })])]));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const a = analyseBeam(r.value.beams[0]!, defaultImportSettings());
    expect(a).toMatchObject({
      ok: false,
      message: expect.stringContaining('in front of the skin, in air'),
    });
  });

  it('refuses a half-blocked field (the axis on a jaw)', async () => {
    const r = await importDicom(sourcesOf([...ct, planWith([beam(1, { jawXMm: [0, 50] })])]));
    expect(r.ok && r.value.beams[0]!.refusal).toMatch(
      /X jaws 0 \/ 50 mm: the central axis is not inside the open field/,
    );
  });
});
