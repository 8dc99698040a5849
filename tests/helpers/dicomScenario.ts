// Test scenarios: a slab phantom along one beam written as a CT series plus an RT Plan, imported
// and analysed by the same functions as the page and the command line.
import { analyseBeam, type BeamAnalysis } from '../../src/dicom/analyseBeam';
import { importDicom, type DicomImport, type DicomSource } from '../../src/dicom/importDicom';
import { defaultImportSettings, type ImportSettings } from '../../src/dicom/importSettings';
import {
  gridCovering,
  writeCtSeries,
  writeRtPlan,
  type NamedBytes,
  type PatientPosition,
  type PlanBeamSpec,
  type Vec3,
} from './dicomPhantom';
import { slabPhantomBounds, slabPhantomHu, type SlabLayer } from './phantomShapes';
import type { Syntax } from './dicomWriter';

export interface SlabScenario {
  position: PatientPosition;
  gantryDeg: number;
  couchDeg?: number;
  isoMm: Vec3;
  /** Unit direction source → isocentre in patient coordinates, stated by the test. */
  dir: Vec3;
  isoDepthMm: number;
  layers: SlabLayer[];
  radiusMm?: number;
  spacing?: { rowMm: number; colMm: number; sliceMm: number };
  rowCos?: Vec3;
  colCos?: Vec3;
  syntax?: Syntax;
  planSyntax?: Syntax;
  beam?: Partial<PlanBeamSpec>;
}

export const DEFAULT_SPACING = { rowMm: 2.5, colMm: 2.5, sliceMm: 3 };

export function scenarioFiles(s: SlabScenario): NamedBytes[] {
  const phantom = {
    isoMm: s.isoMm,
    dir: s.dir,
    isoDepthMm: s.isoDepthMm,
    layers: s.layers,
    radiusMm: s.radiusMm ?? 40,
  };
  const { min, max } = slabPhantomBounds(phantom, 15);
  const grid = gridCovering(min, max, s.spacing ?? DEFAULT_SPACING, s.rowCos, s.colCos);
  const ct = writeCtSeries({
    grid,
    huAt: slabPhantomHu(phantom),
    patientPosition: s.position,
    syntax: s.syntax ?? 'explicit',
    shuffle: true,
  });
  const plan = writeRtPlan({
    label: 'SLAB TEST',
    patientPosition: s.position,
    syntax: s.planSyntax ?? s.syntax ?? 'explicit',
    beams: [
      {
        number: 1,
        name: 'B1',
        energyMV: 6,
        gantryDeg: s.gantryDeg,
        couchDeg: s.couchDeg ?? 0,
        isoMm: s.isoMm,
        meterset: 120,
        doseGy: 1.0,
        ...s.beam,
      },
    ],
  });
  return [...ct, plan];
}

export const sourcesOf = (files: readonly NamedBytes[]): DicomSource[] =>
  files.map((f) => ({ name: f.name, read: () => f.bytes }));

export async function importFiles(files: readonly NamedBytes[]): Promise<DicomImport> {
  const r = await importDicom(sourcesOf(files));
  if (!r.ok) throw new Error(r.problems.join('\n'));
  return r.value;
}

export async function analyseScenario(
  s: SlabScenario,
  settings: ImportSettings = defaultImportSettings(),
): Promise<{ imported: DicomImport; analysis: BeamAnalysis }> {
  const imported = await importFiles(scenarioFiles(s));
  const beam = imported.beams[0];
  if (!beam) throw new Error('no beam');
  const a = analyseBeam(beam, settings);
  if (!a.ok) throw new Error(a.message);
  return { imported, analysis: a.value };
}
