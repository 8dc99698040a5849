// Runs every bench/*.bench.ts module: imports it, calls run() `repeats` times and gathers each
// figure's values into one row. A module that fails to import or throws gets an error row and
// the runner goes on.
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { errorRow, type BenchFigure, type BenchModule, type BenchRow } from './row';

export function benchModuleFiles(benchDir: string): string[] {
  return readdirSync(benchDir)
    .filter((f) => f.endsWith('.bench.ts'))
    .sort()
    .map((f) => join(benchDir, f));
}

function isBenchModule(m: unknown): m is BenchModule {
  return typeof m === 'object' && m !== null && typeof (m as BenchModule).run === 'function';
}

function isFigure(f: unknown): f is BenchFigure {
  const x = f as BenchFigure;
  return (
    typeof x === 'object' &&
    x !== null &&
    typeof x.name === 'string' &&
    typeof x.value === 'number' &&
    typeof x.unit === 'string'
  );
}

export async function runBenchModule(
  file: string,
  repeatsOverride?: number,
  log: (line: string) => void = () => {},
): Promise<BenchRow[]> {
  const group = file.split('/').pop() ?? file;
  let mod: unknown;
  try {
    mod = await import(pathToFileURL(file).href);
  } catch (e) {
    return [errorRow(group, '(import)', e)];
  }
  if (!isBenchModule(mod)) return [errorRow(group, '(module)', 'exports no run() function')];
  const repeats = Math.max(1, repeatsOverride ?? mod.repeats ?? 3);
  const rows = new Map<string, BenchRow>();
  for (let i = 0; i < repeats; i++) {
    log(`  ${group}: run ${i + 1}/${repeats}`);
    let figures: unknown;
    try {
      figures = await mod.run();
    } catch (e) {
      const row = errorRow(group, `(run ${i + 1})`, e);
      return [...rows.values(), row];
    }
    if (!Array.isArray(figures)) return [errorRow(group, '(run)', 'run() did not return an array')];
    for (const f of figures) {
      if (!isFigure(f)) continue;
      const row = rows.get(f.name) ?? { group, name: f.name, unit: f.unit, samples: [] };
      row.samples.push(f.value);
      if (f.note !== undefined) row.note = f.note;
      rows.set(f.name, row);
    }
  }
  return [...rows.values()];
}
