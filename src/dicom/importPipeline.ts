// Imported DICOM to a lamina.plan with the analysis of each beam: the steps the command line
// takes in one go (the page takes the same steps, with edits between them).
import { analyseBeam, type BeamAnalysis } from './analyseBeam';
import { assemblePlan, type AssembleResult } from './assemblePlan';
import type { DicomImport, ImportedBeam } from './importDicom';
import type { ImportSettings } from './importSettings';

export interface AnalysedBeam {
  beam: ImportedBeam;
  analysis: BeamAnalysis | null;
  /** Why the beam is not in the plan: refused by the plan or CT, or its ray analysis failed. */
  problem: string | null;
}

export function analyseAll(imp: DicomImport, s: ImportSettings): AnalysedBeam[] {
  return imp.beams.map((beam) => {
    const a = analyseBeam(beam, s);
    return a.ok
      ? { beam, analysis: a.value, problem: null }
      : { beam, analysis: null, problem: a.message };
  });
}

/** The plan of every analysed beam (beams with a problem left out). */
export function planOfAnalysed(
  imp: DicomImport,
  beams: readonly AnalysedBeam[],
  s: ImportSettings,
): AssembleResult {
  return assemblePlan(
    imp.planLabel,
    beams.flatMap((b) =>
      b.analysis ? [{ beam: b.beam, analysis: b.analysis, slabs: b.analysis.slabs }] : [],
    ),
    s,
  );
}
