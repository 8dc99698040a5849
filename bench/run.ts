// `npm run bench`: the project's speed figures, with the median (or p95) and spread over
// repeated runs, printed as a table and written to bench/results.json. Runs every
// bench/*.bench.ts module, then the built-in figures: type-A curve time, bundle size, cold page
// load and edit-to-paint latency in Chromium. Options: --repeats N (bench modules),
// --no-browser (skip build, bundle and Chromium), --only TEXT (modules whose file name contains it),
// --browser-only (only the page figures: bundle, cold load, edit-to-paint).
import { writeFileSync } from 'node:fs';
import { cpus } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { rmSync } from 'node:fs';
import { benchModuleFiles, runBenchModule } from './lib/benchModules';
import { coldLoadRows, editToPaintRows, launchChromium } from './lib/browserFigures';
import { bundleSizeRows } from './lib/bundleSize';
import { formatBenchTable, headline } from './lib/formatTable';
import { buildPage, startPreview } from './lib/previewServer';
import { errorRow, type BenchRow } from './lib/row';
import { spread } from './lib/stats';
import { typeACurveRows } from './lib/typeACurve';
import { loadGeneratedDataFromDisk } from '../src/io/generatedDataNode';

const BENCH_DIR = dirname(fileURLToPath(import.meta.url));

function option(argv: string[], name: string): string | undefined {
  const i = argv.indexOf(name);
  return i >= 0 ? argv[i + 1] : undefined;
}

const log = (line: string) => process.stderr.write(`${line}\n`);

async function guarded(group: string, name: string, fn: () => Promise<BenchRow[]>) {
  try {
    return await fn();
  } catch (e) {
    return [errorRow(group, name, e)];
  }
}

async function browserRows(): Promise<BenchRow[]> {
  log('building the page (vite build)…');
  let outDir: string;
  try {
    outDir = buildPage();
  } catch (e) {
    return [errorRow('page (Chromium)', 'vite build', e)];
  }
  const rows: BenchRow[] = [];
  try {
    rows.push(
      ...(await guarded('bundle', 'bundle size', () => Promise.resolve(bundleSizeRows(outDir)))),
    );
    log('serving with vite preview and launching Chromium…');
    const server = await startPreview(outDir);
    try {
      const browser = await launchChromium();
      try {
        log('cold page load (5 runs)…');
        rows.push(
          ...(await guarded('page (Chromium)', 'cold load', () =>
            coldLoadRows(browser, server.url),
          )),
        );
        log('edit-to-paint latency…');
        rows.push(...(await editToPaintRows(browser, server.url)));
      } finally {
        await browser.close();
      }
    } finally {
      server.stop();
    }
  } catch (e) {
    rows.push(errorRow('page (Chromium)', 'browser figures', e));
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
  return rows;
}

async function main(argv: string[]): Promise<number> {
  loadGeneratedDataFromDisk();
  const repeatsText = option(argv, '--repeats');
  const repeats = repeatsText !== undefined ? Number(repeatsText) : undefined;
  if (repeats !== undefined && !(Number.isInteger(repeats) && repeats > 0)) {
    log('--repeats: expected a positive integer');
    return 2;
  }
  const only = option(argv, '--only');
  const rows: BenchRow[] = [];
  const browserOnly = argv.includes('--browser-only');
  for (const file of benchModuleFiles(BENCH_DIR)) {
    if (browserOnly || (only !== undefined && !file.includes(only))) continue;
    log(`bench module ${file.split('/').pop()}…`);
    rows.push(...(await runBenchModule(file, repeats, log)));
  }
  if (browserOnly) rows.push(...(await browserRows()));
  else if (only === undefined) {
    log('type-A curves (calculateCase, demo case)…');
    rows.push(...(await guarded('type-A curves', 'calculateCase', () => typeACurveRows())));
    if (!argv.includes('--no-browser')) rows.push(...(await browserRows()));
  }
  process.stdout.write(`${formatBenchTable(rows)}\n`);
  const results = {
    format: 'lamina.bench',
    version: 1,
    date: new Date().toISOString(),
    node: process.version,
    cpu: `${cpus().length} × ${cpus()[0]?.model ?? 'unknown'}`,
    rows: rows.map((r) => {
      const s = r.samples.length > 0 ? spread(r.samples) : undefined;
      return {
        ...r,
        value: r.samples.length > 0 ? headline(r) : null,
        min: s?.min ?? null,
        max: s?.max ?? null,
      };
    }),
  };
  writeFileSync(join(BENCH_DIR, 'results.json'), `${JSON.stringify(results, null, 2)}\n`);
  log(`wrote ${join(BENCH_DIR, 'results.json')}`);
  return 0;
}

main(process.argv.slice(2)).then(
  (code) => (process.exitCode = code),
  (e: unknown) => {
    log(e instanceof Error ? (e.stack ?? e.message) : String(e));
    process.exitCode = 1;
  },
);
