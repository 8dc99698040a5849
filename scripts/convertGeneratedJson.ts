// One-off conversion of generated data still in the JSON form (src/engine/data/generated/*.json,
// as written before the typed-array files) to the typed-array files the engine reads
// (npx tsx scripts/convertGeneratedJson.ts [--delete]). The same arrays become Float32 as the
// generators now write them; everything else is copied as it is. --delete removes the JSON files.
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { writeTypedArrayFileSync } from '../src/io/generatedDataNode';

const DIR = 'src/engine/data/generated';
type Doc = Record<string, unknown>;
type Beams = Record<string, Doc>;

const f32 = (a: unknown) => Float32Array.from(a as number[]);

const conversions: Record<string, (d: Doc) => Doc> = {
  pointKernelsMono: (d) => ({
    ...d,
    kernels: (d.kernels as Doc[]).map((k) => ({
      ...k,
      primary: f32(k.primary),
      scatter: f32(k.scatter),
    })),
  }),
  beamKernels: (d) => ({
    ...d,
    beams: Object.fromEntries(
      Object.entries(d.beams as Beams).map(([e, b]) => [
        e,
        {
          ...b,
          weights: f32(b.weights),
          primary: f32(b.primary),
          scatter: f32(b.scatter),
          // The hardened companion kernel (kernelHardening.ts): its bins as arrays, the rest
          // (filtration, escaped fraction, the mixing fractions of `hardening`) as numbers.
          ...(b.hardened
            ? {
                hardened: {
                  ...(b.hardened as Doc),
                  primary: f32((b.hardened as Doc).primary),
                  scatter: f32((b.hardened as Doc).scatter),
                },
              }
            : {}),
        },
      ]),
    ),
  }),
  pencilKernels: (d) => ({
    ...d,
    beams: Object.fromEntries(
      Object.entries(d.beams as Beams).map(([e, b]) => [e, { ...b, values: f32(b.values) }]),
    ),
  }),
  modelledBeams: (d) => ({
    ...d,
    beams: Object.fromEntries(
      Object.entries(d.beams as Beams).map(([e, b]) => [
        e,
        { ...b, pdd: (b.pdd as number[][]).map(f32), tmr: (b.tmr as number[][]).map(f32) },
      ]),
    ),
  }),
};

for (const [name, convert] of Object.entries(conversions)) {
  const json = `${DIR}/${name}.json`;
  if (!existsSync(json)) {
    console.log(`${json}: not found, skipped`);
    continue;
  }
  writeTypedArrayFileSync(
    `${DIR}/${name}.bin`,
    convert(JSON.parse(readFileSync(json, 'utf8')) as Doc),
  );
  console.log(`${json} → ${DIR}/${name}.bin`);
  if (process.argv.includes('--delete')) rmSync(json);
}
