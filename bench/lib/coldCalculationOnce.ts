// One cold calculation, as a freshly started compute worker does it (run in its own process by
// bench/coldCalculation.bench.ts): decode the generated data, then calculate the chest demo case
// with every method on the page's grid (modelled beam, 0.05 cm), then once more warm. Prints
// {"decodeMs", "firstMs", "secondMs"} as JSON.
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { computeApi } from '../../src/compute/computeApi';
import { loadGeneratedDataFromDisk } from '../../src/io/generatedDataNode';

const raw: unknown = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
// The page's full calculation (grid 0.05 cm, FULL_DEPTH_STEP_CM) through the contract.
const request = { purpose: 'full', case: raw, water: { kind: 'modelled' } } as const;
let t = performance.now();
loadGeneratedDataFromDisk();
const decodeMs = performance.now() - t;
t = performance.now();
const first = computeApi.calculateCase(request);
const firstMs = performance.now() - t;
t = performance.now();
computeApi.calculateCase(request);
const secondMs = performance.now() - t;
if (!first.ok) throw new Error('demo case invalid');
process.stdout.write(`${JSON.stringify({ decodeMs, firstMs, secondMs })}\n`);
