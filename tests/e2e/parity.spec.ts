// One answer everywhere: every file in public/cases (the cases and the plan) and 200 generated
// cases, opened in the page as a user opens them (the file bar, or "Open plan file…" in the
// check), exported with "Results (JSON)", and calculated by the command line in one run
// (`--jsonl`): every number equal within 1e-9 relative, the same warnings, flags, provenance and
// check. The page and the CLI go through the same worker-side functions, so any difference is a
// decision made twice.
import { spawnSync } from 'node:child_process';
import {
  mkdtempSync,
  readFileSync,
  readdirSync,
  writeFileSync,
  openSync,
  closeSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import fc from 'fast-check';
import { expect, test, type Page } from '@playwright/test';
import { validCase } from '../property/generators/caseArbitraries';
import { numericDiff } from '../helpers/numericDiff';

const REL_TOL = 1e-9;
const FUZZED = 200;
/** Generated phantoms are scaled to at most this depth (cm), to keep the suite's time reasonable. */
const MAX_FUZZ_DEPTH_CM = 25;

const demoTable = {
  kind: 'tmr',
  fileName: 'demo-6mv-tmr.csv',
  csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
  scatterFileName: 'demo-6mv-scatter.csv',
  scatterCsv: readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8'),
};

/** Generated cases: unique names; every fourth is a 6 MV case carrying the demo table. */
function fuzzedCases(): { name: string; doc: unknown }[] {
  const cases = fc.sample(validCase, { numRuns: FUZZED, seed: 20261205 });
  return cases.map((c, i) => {
    const total = c.layers.reduce((s, l) => s + l.thicknessCm, 0);
    const k = total > MAX_FUZZ_DEPTH_CM ? MAX_FUZZ_DEPTH_CM / total : 1;
    const layers = c.layers.map((l) => ({ ...l, thicknessCm: l.thicknessCm * k }));
    const setup =
      c.beam.setup.kind === 'SAD'
        ? { ...c.beam.setup, isocentreDepthCm: c.beam.setup.isocentreDepthCm * k }
        : c.beam.setup;
    const withTable = i % 4 === 0;
    const name = `parity-${i}`;
    return {
      name,
      doc: {
        ...c,
        name,
        beam: { ...c.beam, setup, ...(withTable ? { energy: '6MV' } : {}) },
        layers,
        points: c.points.map((p) => ({ ...p, depthCm: p.depthCm * k })),
        ...(withTable ? { waterData: demoTable } : {}),
      },
    };
  });
}

/** The command line's documents of many files, from one run. */
function cliDocuments(files: string[], dir: string): Map<string, unknown> {
  const outPath = join(dir, 'cli.jsonl');
  const fd = openSync(outPath, 'w');
  const r = spawnSync(
    process.execPath,
    ['--import', 'tsx', 'src/cli/calc.ts', '--jsonl', ...files],
    { stdio: ['ignore', fd, 'pipe'], encoding: 'utf8' },
  );
  closeSync(fd);
  if (r.status !== 0) throw new Error(`calc --jsonl exited ${r.status}: ${r.stderr}`);
  const out = new Map<string, unknown>();
  for (const line of readFileSync(outPath, 'utf8').split('\n').filter(Boolean)) {
    const row = JSON.parse(line) as { file: string; document?: unknown; problems?: unknown };
    if (!row.document) throw new Error(`${row.file}: ${JSON.stringify(row.problems)}`);
    out.set(row.file, row.document);
  }
  return out;
}

/** The page's "Results (JSON)" download once it belongs to the case or plan just opened. */
async function pageDocument(page: Page, expectedName: string): Promise<unknown> {
  const button = page.getByTestId('export-results-json');
  for (let attempt = 0; attempt < 40; attempt++) {
    await expect(page.getByTestId('check-pending')).toHaveCount(0, { timeout: 60_000 });
    await expect(button).toBeEnabled({ timeout: 60_000 });
    const [download] = await Promise.all([page.waitForEvent('download'), button.click()]);
    const doc = JSON.parse(readFileSync(await download.path(), 'utf8')) as {
      caseName?: string;
      planName?: string;
    };
    if ((doc.caseName ?? doc.planName) === expectedName) return doc;
    await page.waitForTimeout(250);
  }
  throw new Error(`the page never showed the results of ${expectedName}`);
}

test('every demo file and 200 generated cases give the same numbers, warnings and flags in the page and the CLI', async ({
  page,
}) => {
  test.setTimeout(30 * 60_000);
  const dir = mkdtempSync(join(tmpdir(), 'lamina-parity-'));
  const demos = readdirSync('public/cases')
    .filter((f) => f.endsWith('.json') && f !== 'index.json')
    .map((f) => join('public/cases', f));
  const fuzzed = fuzzedCases().map(({ name, doc }) => {
    const file = join(dir, `${name}.json`);
    writeFileSync(file, JSON.stringify(doc));
    return { file, name };
  });
  const t0 = Date.now();
  const cli = cliDocuments([...demos, ...fuzzed.map((f) => f.file)], dir);
  const cliMs = Date.now() - t0;

  await page.goto('/');
  await page.evaluate(() => localStorage.clear());
  await page.reload();
  await page.getByRole('tab', { name: 'Point check & report' }).click();
  const t1 = Date.now();
  const demoFiles = demos.map((file) => {
    const doc = JSON.parse(readFileSync(file, 'utf8')) as { name: string; format: string };
    return { file, name: doc.name, isPlan: doc.format === 'lamina.plan' };
  });
  // A case opened from the file bar replaces beam 1 and keeps a plan's other beams (as for a
  // user): the plan is opened last.
  const files = [
    ...demoFiles.filter((f) => !f.isPlan),
    ...fuzzed.map((f) => ({ ...f, isPlan: false })),
    ...demoFiles.filter((f) => f.isPlan),
  ];
  const mismatches: string[] = [];
  for (const f of files) {
    if (f.isPlan) await page.getByTestId('check-open-plan').setInputFiles(f.file);
    else await page.getByTestId('open-file').setInputFiles(f.file);
    const doc = await pageDocument(page, f.name);
    const diff = numericDiff(doc, cli.get(f.file), REL_TOL, 5);
    if (diff.length > 0) mismatches.push(`${f.file}:\n  ${diff.join('\n  ')}`);
  }
  console.log(
    `parity: ${files.length} files; CLI --jsonl ${(cliMs / 1000).toFixed(1)} s, page ${((Date.now() - t1) / 1000).toFixed(1)} s`,
  );
  expect(mismatches.slice(0, 10).join('\n')).toBe('');
});
