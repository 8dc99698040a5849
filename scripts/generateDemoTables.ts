// Writes the demo water-data tables in public/tables/ from the analytic 6 MV-like test fixture:
// invented demo data, not a measured beam. `npx tsx scripts/generateDemoTables.ts`
import { writeFileSync } from 'node:fs';
import { pddFromTmr } from '../src/engine/beam/depthDoseConversions';
import { f6Psf, f6Tmr, F6_DMAX_CM } from '../tests/fixtures/f6WaterData';

const DEPTHS_CM = [
  0, 0.25, 0.5, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18,
  19, 20, 22, 24, 26, 28, 30, 32, 35, 40,
];
const SIDES_CM = [3, 4, 5, 6, 8, 10, 12, 15, 20, 25, 30, 40];
const SSD_CM = 100;
const HEADER =
  '# invented demo data, not a measured beam: analytic 6 MV-like fixture (Lamina tests), d_max 1.5 cm';

const sc = (s: number) =>
  (1 + 0.06 * (1 - Math.exp(-s / 7))) / (1 + 0.06 * (1 - Math.exp(-10 / 7)));
const sp = (s: number) => f6Psf(s) / f6Psf(10);
const fmt = (v: number) => v.toFixed(4);

function matrix(valueAt: (d: number, s: number) => number, label: string): string {
  const lines = [HEADER, `${label},${SIDES_CM.join(',')}`];
  for (const d of DEPTHS_CM) lines.push([d, ...SIDES_CM.map((s) => fmt(valueAt(d, s)))].join(','));
  return `${lines.join('\n')}\n`;
}

writeFileSync('public/tables/demo-6mv-tmr.csv', matrix(f6Tmr, 'depth cm \\ field at depth cm'));
writeFileSync(
  'public/tables/demo-6mv-pdd-ssd100.csv',
  matrix((d, s) => {
    // PDD at SSD 100 for surface side s, rebuilt from TMR (Khan's TMR → PDD relation, from memory)
    const sd = (s * (SSD_CM + d)) / SSD_CM;
    const sdm = (s * (SSD_CM + F6_DMAX_CM)) / SSD_CM;
    return pddFromTmr(f6Tmr(d, sd), SSD_CM, d, F6_DMAX_CM, sp(sd) / sp(sdm));
  }, 'depth cm \\ field at surface cm (SSD 100)'),
);
const scatter = [HEADER, 'field cm,S_c,S_p,PSF'];
for (const s of SIDES_CM) scatter.push([s, fmt(sc(s)), fmt(sp(s)), fmt(f6Psf(s))].join(','));
writeFileSync('public/tables/demo-6mv-scatter.csv', `${scatter.join('\n')}\n`);
