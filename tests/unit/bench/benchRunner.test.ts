import { afterAll, describe, expect, it } from 'vitest';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { benchModuleFiles, runBenchModule } from '../../../bench/lib/benchModules';
import { formatBenchTable, headline } from '../../../bench/lib/formatTable';
import { median, percentile, spread } from '../../../bench/lib/stats';

describe('bench statistics', () => {
  it('median and percentile interpolate between order statistics', () => {
    expect(median([5, 1, 3])).toBe(3);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    // Linear between order statistics: position 0.95·(5 − 1) = 3.8 → 4 + 0.8·(5 − 4).
    expect(percentile([1, 2, 3, 4, 5], 0.95)).toBeCloseTo(4.8, 12);
    expect(spread([3, 9, 1])).toEqual({ min: 1, max: 9 });
    expect(Number.isNaN(median([]))).toBe(true);
  });

  it('headline reports the p95 for p95 rows and the median otherwise', () => {
    const samples = [1, 2, 3, 4, 5];
    expect(headline({ group: 'g', name: 'n', unit: 'ms', samples })).toBe(3);
    expect(headline({ group: 'g', name: 'n', unit: 'ms', samples, stat: 'p95' })).toBeCloseTo(
      4.8,
      12,
    );
  });
});

describe('runBenchModule', () => {
  const dir = mkdtempSync(join(tmpdir(), 'lamina-bench-test-'));
  writeFileSync(
    join(dir, 'good.bench.mjs'),
    `let n = 0;
export const repeats = 4;
export async function run() { n += 1; return [{ name: 'f', value: n, unit: 'ms', note: 'counted' }]; }`,
  );
  writeFileSync(
    join(dir, 'bad.bench.mjs'),
    `export async function run() { throw new Error('deliberate failure'); }`,
  );
  writeFileSync(join(dir, 'norun.bench.mjs'), `export const x = 1;`);
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it('runBenchModule gathers each figure over the module’s repeats', async () => {
    const rows = await runBenchModule(join(dir, 'good.bench.mjs'));
    expect(rows).toHaveLength(1);
    expect(rows[0]?.samples).toEqual([1, 2, 3, 4]);
    expect(rows[0]?.note).toBe('counted');
  });

  it('runBenchModule turns a throwing or malformed module into an error row', async () => {
    const bad = await runBenchModule(join(dir, 'bad.bench.mjs'));
    expect(bad[0]?.error).toBe('deliberate failure');
    const norun = await runBenchModule(join(dir, 'norun.bench.mjs'));
    expect(norun[0]?.error).toMatch(/no run\(\)/);
    const missing = await runBenchModule(join(dir, 'missing.bench.mjs'));
    expect(missing[0]?.error).toBeDefined();
  });

  it('formatBenchTable prints errors and unmeasured figures in their rows', () => {
    const text = formatBenchTable([
      { group: 'a', name: 'x', unit: 'ms', samples: [1, 2, 3] },
      { group: 'b', name: 'y', unit: '', samples: [], error: 'boom' },
      { group: 'c', name: 'z', unit: '', samples: [], notMeasured: 'no editor' },
    ]);
    expect(text).toMatch(/a\s+x\s+2\.00\s+1\.00–3\.00\s+ms\s+3/);
    expect(text).toMatch(/b\s+y\s+ERROR\s+boom/);
    expect(text).toMatch(/c\s+z\s+not measured\s+no editor/);
  });

  it('benchModuleFiles lists only *.bench.ts files', () => {
    writeFileSync(join(dir, 'one.bench.ts'), 'export {};');
    writeFileSync(join(dir, 'helper.ts'), 'export {};');
    expect(benchModuleFiles(dir).map((f) => f.split('/').pop())).toEqual(['one.bench.ts']);
  });
});
