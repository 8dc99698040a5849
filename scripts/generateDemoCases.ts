// Writes the demo check cases in public/cases/ (invented scenarios, invented planning values)
// with the invented demo 6 MV table inline, so each file is self-contained.
// The "planning system" values are this tool's own effective-depth (RTMR) result shifted by a
// stated percentage, to show a pass and a fail. `npx tsx scripts/generateDemoCases.ts`
import { readFileSync, writeFileSync } from 'node:fs';
import { calculatePlan } from '../src/compute/calculatePlan';
import { validatePlan, type LaminaPlan } from '../src/io/planFile';
import { serializeCase, validateCase } from '../src/io/caseFile';
import type { LaminaCase } from '../src/io/caseSchema';
import { loadGeneratedDataFromDisk } from '../src/io/generatedDataNode';

loadGeneratedDataFromDisk();

const waterData = {
  kind: 'tmr',
  fileName: 'demo-6mv-tmr.csv',
  csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
  scatterFileName: 'demo-6mv-scatter.csv',
  scatterCsv: readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8'),
  dMaxCm: 1.5,
  referenceDosePerMuCGy: 1,
};

type Layer = { materialId: string; thicknessCm: number; label?: string; densityGPerCm3?: number };
const NOTE = 'Invented scenario and invented planning-system values (demo only).';

function caseDoc(name: string, beam: unknown, layers: Layer[], points: unknown[]): LaminaCase {
  const r = validateCase({
    format: 'lamina.case',
    version: 2,
    name,
    notes: NOTE,
    beam,
    layers,
    points,
    waterData,
  });
  if (!r.ok) throw new Error(`${name}: ${JSON.stringify(r.problems)}`);
  return r.value;
}

/** Planning values = RTMR result × (1 + offsetPercent/100) in dose, i.e. the plan's MU for the dose. */
function withPlanning(c: LaminaCase, doseCGy: number, offsetPercent: number): LaminaCase {
  const dpm = (id: string) =>
    calculatePlan({
      format: 'lamina.plan',
      version: 2,
      name: '',
      beams: [{ id: 'b', weight: 1, case: c }],
    })
      .beams[0]?.report.methods.find((m) => m.id === 'rtmr')
      ?.points.find((p) => p.id === id)?.dosePerMuCGy;
  const first = c.points[0];
  const v = first ? dpm(first.id) : null;
  if (!first || v === null || v === undefined) return c;
  const mu = Math.round((doseCGy / v) * (1 + offsetPercent / 100) * 10) / 10;
  return {
    ...c,
    beam: { ...c.beam, planningMu: mu },
    points: c.points.map((p, i) => (i === 0 ? { ...p, planningDoseCGy: doseCGy } : p)),
  };
}

const sad = (isoDepthCm: number) => ({ kind: 'SAD', sadCm: 100, isocentreDepthCm: isoDepthCm });
const ssd100 = { kind: 'SSD', ssdCm: 100 };

const cases: Record<string, LaminaCase> = {
  'water-reference-6mv.json': withPlanning(
    caseDoc(
      'Demo: homogeneous water reference, 6 MV 10 × 10 at SSD 100 (invented)',
      { energy: '6MV', setup: ssd100, fieldXCm: 10, fieldYCm: 10 },
      [{ materialId: 'water', thicknessCm: 25 }],
      [{ id: 'ref', depthCm: 10 }],
    ),
    200,
    -0.8,
  ),
  'rib-and-bone-6mv.json': withPlanning(
    caseDoc(
      'Demo: 6 MV 8 × 8 through a cortical-bone slab into soft tissue (invented)',
      { energy: '6MV', setup: ssd100, fieldXCm: 8, fieldYCm: 8 },
      [
        { materialId: 'softTissue', thicknessCm: 3, label: 'skin and fat' },
        { materialId: 'corticalBone', thicknessCm: 2, label: 'bone plate' },
        { materialId: 'softTissue', thicknessCm: 12 },
      ],
      [{ id: 'target', depthCm: 10 }],
    ),
    180,
    2.5,
  ),
  'air-gap-6mv-small-field.json': withPlanning(
    caseDoc(
      'Demo: 6 MV 4 × 4 across a 3 cm air gap; planning value 7 % apart (invented)',
      { energy: '6MV', setup: sad(8), fieldXCm: 4, fieldYCm: 4 },
      [
        { materialId: 'softTissue', thicknessCm: 2 },
        { materialId: 'air', thicknessCm: 3, label: 'air gap' },
        { materialId: 'softTissue', thicknessCm: 10 },
      ],
      [
        { id: 'iso', depthCm: 8 },
        { id: 'behind-gap', depthCm: 5.5 },
      ],
    ),
    200,
    -7,
  ),
};

for (const [file, c] of Object.entries(cases))
  writeFileSync(`public/cases/${file}`, serializeCase(c));

// Opposed pair through the chest: the isocentre lies 11 cm deep from the front and 13 cm from the back.
const ap = caseDoc(
  'AP beam',
  { energy: '6MV', setup: sad(11), fieldXCm: 10, fieldYCm: 12 },
  [
    { materialId: 'softTissue', thicknessCm: 3, label: 'chest wall' },
    { materialId: 'lung', thicknessCm: 5 },
    { materialId: 'softTissue', thicknessCm: 8, label: 'mediastinum' },
    { materialId: 'lung', thicknessCm: 4 },
    { materialId: 'softTissue', thicknessCm: 4, label: 'back' },
  ],
  [{ id: 'iso', depthCm: 11 }],
);
const pa = caseDoc(
  'PA beam',
  { energy: '6MV', setup: sad(13), fieldXCm: 10, fieldYCm: 12 },
  [...ap.layers].reverse(),
  [{ id: 'iso', depthCm: 13 }],
);
const plan: LaminaPlan = {
  format: 'lamina.plan',
  version: 2,
  name: 'Demo: opposed AP/PA pair through the chest, 6 MV, 200 cGy at the isocentre (invented)',
  notes: NOTE,
  beams: [
    { id: 'AP', label: 'anterior', weight: 1, case: withPlanning(ap, 100, 1.2) },
    { id: 'PA', label: 'posterior', weight: 1, case: withPlanning(pa, 100, -0.9) },
  ],
  prescription: { pointId: 'iso', doseCGy: 200 },
  tolerances: { homogeneousPercent: 2, heterogeneousPercent: 5 },
};
const checked = validatePlan(plan);
if (!checked.ok) throw new Error(JSON.stringify(checked.problems));
writeFileSync(
  'public/cases/opposed-pair-chest-6mv.plan.json',
  `${JSON.stringify(plan, null, 2)}\n`,
);
