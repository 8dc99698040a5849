// `npm run calc -- --dicom DIR [--json] [--write-plan out.json]`: a CT series and RT Plan read
// from DIR (every file below it), each beam's central ray turned into slabs, the plan checked
// by the same calculation as any plan file. Any beam Lamina cannot model stops the import here
// (exit 2, one line per reason); the page can go on with the other beams.
import { readdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { parseArgs } from './args';
import { calculateDocument, jsonOf, textOf } from './checkCommand';
import { cliCalcOf } from './cliCalc';
import { commandLineProblems } from './flagRules';
import { parseCalibrationCsv } from '../dicom/calibration';
import { importDicom, type DicomSource } from '../dicom/importDicom';
import { analyseAll, planOfAnalysed } from '../dicom/importPipeline';
import {
  defaultImportSettings,
  settingsProblems,
  type ImportSettings,
} from '../dicom/importSettings';
import { SLAB_MODEL_CAUTION } from '../dicom/assemblePlan';
import { describeProblems } from '../io/caseFile';
import { serializePlan } from '../io/planFile';
import { getMaterial } from '../engine/materials/materialLibrary';
import type { AnalysedBeam } from '../dicom/importPipeline';

export const DICOM_USAGE = `  --dicom DIR       read a CT series and RT Plan (DICOM files anywhere below DIR) and check the plan
  --write-plan FILE with --dicom: also write the imported plan (lamina.plan) to FILE
  --calibration F   with --dicom: HU to relative electron density curve (CSV: HU, rho_e);
                    default: generic, from memory — replace with your scanner's
  --body-threshold HU (default -400)  --similarity RHO_E (default 0.05)
  --min-slab CM (default 0.5)  --extra-points CM,CM,... (distances past the isocentre)`;

function filesBelow(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir).sort()) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...filesBelow(p));
    else out.push(p);
  }
  return out;
}

function settingsOf(flags: Map<string, string | true>): {
  settings: ImportSettings;
  problems: string[];
} {
  const s = defaultImportSettings();
  const problems: string[] = [];
  const num = (name: string, set: (v: number) => void) => {
    const v = flags.get(name);
    if (v === undefined) return;
    const n = Number(v);
    if (typeof v !== 'string' || v.trim() === '' || !Number.isFinite(n))
      problems.push(`--${name}: "${String(v)}" is not a number`);
    else set(n);
  };
  num('body-threshold', (v) => (s.bodyThresholdHu = v));
  num('similarity', (v) => (s.segmentation.similarityRhoE = v));
  num('min-slab', (v) => (s.segmentation.minThicknessCm = v));
  const extra = flags.get('extra-points');
  if (typeof extra === 'string') {
    const parts = extra.split(',').map((x) => Number(x.trim()));
    if (parts.some((x) => !Number.isFinite(x)))
      problems.push(`--extra-points: "${extra}" is not a list of numbers (cm)`);
    else s.extraPointOffsetsCm = parts;
  }
  const cal = flags.get('calibration');
  if (typeof cal === 'string') {
    try {
      const r = parseCalibrationCsv(readFileSync(cal, 'utf8'), `file ${cal}`);
      if (r.ok) s.calibration = r.value;
      else problems.push(...r.problems.map((p) => `--calibration ${cal}: ${p}`));
    } catch (e) {
      problems.push(`--calibration ${cal}: cannot read (${(e as Error).message})`);
    }
  }
  problems.push(...settingsProblems(s));
  return { settings: s, problems };
}

function summaryOf(beams: readonly AnalysedBeam[], s: ImportSettings): string {
  const lines = [`Calibration: ${s.calibration.label}`, SLAB_MODEL_CAUTION];
  for (const { beam: b, analysis: a } of beams) {
    if (!a) continue;
    const planned =
      b.plannedSsdMm !== null ? ` (planning system ${(b.plannedSsdMm / 10).toFixed(2)} cm)` : '';
    lines.push(
      `${b.id} "${b.name}": gantry ${b.gantryDeg}°, couch ${b.couchDeg}°, ${b.patientPosition}, SSD ${a.ssdCm.toFixed(2)} cm${planned}, isocentre depth ${a.isoDepthCm.toFixed(2)} cm, ${a.slabs.length} slabs: ` +
        a.slabs
          .map(
            (l) =>
              `${l.thicknessCm.toFixed(2)} cm ${getMaterial(l.materialId).label} (ρe ${l.rhoE.toFixed(3)})`,
          )
          .join(', '),
    );
    for (const n of [...b.notes, ...a.notes]) lines.push(`  note: ${n}`);
  }
  return lines.join('\n');
}

export async function runDicomCommand(argv: string[], usage: string): Promise<number> {
  let args;
  try {
    args = parseArgs(argv);
  } catch (e) {
    console.error(`${(e as Error).message}\n${usage}`);
    return 2;
  }
  const flagProblems = commandLineProblems(args);
  if (flagProblems.length > 0) {
    console.error(`${flagProblems.join('\n')}\n${usage}`);
    return 2;
  }
  const dir = args.flags.get('dicom');
  if (typeof dir !== 'string') {
    console.error(`--dicom needs a folder\n${usage}`);
    return 2;
  }
  let paths: string[];
  try {
    paths = filesBelow(dir);
  } catch (e) {
    console.error(`${dir}: cannot read the folder (${(e as Error).message})`);
    return 2;
  }
  const { settings, problems } = settingsOf(args.flags);
  const made = cliCalcOf(args.flags);
  if (!made.ok) problems.push(...made.problems);
  if (problems.length > 0 || !made.ok) {
    console.error(`invalid options\n${problems.join('\n')}`);
    return 2;
  }
  for (const line of made.notes) console.error(line);
  const sources: DicomSource[] = paths.map((p) => ({
    name: relative(dir, p),
    read: () => new Uint8Array(readFileSync(p)),
  }));
  const imported = await importDicom(sources);
  if (!imported.ok) {
    console.error(`${dir}: the DICOM files were not imported\n${imported.problems.join('\n')}`);
    return 2;
  }
  const beams = analyseAll(imported.value, settings);
  const refused = beams.filter((b) => b.problem);
  if (refused.length > 0) {
    console.error(
      `${dir}: ${refused.length} of ${beams.length} beams cannot be checked\n` +
        refused.map((b) => `${b.beam.id} "${b.beam.name}": ${b.problem}`).join('\n'),
    );
    return 2;
  }
  const assembled = planOfAnalysed(imported.value, beams, settings);
  if (!assembled.ok) {
    console.error(`${dir}: the imported plan is not valid\n${assembled.problems.join('\n')}`);
    return 2;
  }
  const out = args.flags.get('write-plan');
  if (typeof out === 'string') {
    try {
      writeFileSync(out, serializePlan(assembled.plan));
    } catch (e) {
      console.error(`${out}: cannot write (${(e as Error).message})`);
      return 2;
    }
  }
  // The imported plan is calculated like a plan file: the same contract (purpose 'plan'), water
  // source and check options as `npm run calc -- plan.json`.
  const answer = calculateDocument({ ok: true, raw: assembled.plan }, made.calc);
  if (!answer.ok) {
    console.error(`${dir}: the imported plan is not valid\n${describeProblems(answer.problems)}`);
    return 2;
  }
  const result = answer.report;
  if (args.flags.get('json') === true)
    process.stdout.write(`${JSON.stringify(jsonOf(result, true), null, 2)}\n`);
  else {
    const notes = [
      ...imported.value.ignored.map((i) => `ignored: ${i}`),
      ...imported.value.notes,
      ...assembled.notes,
    ];
    process.stdout.write(
      `${summaryOf(beams, settings)}${notes.length ? `\n${notes.join('\n')}` : ''}\n\n${textOf(result, true)}\n`,
    );
  }
  return 0;
}
