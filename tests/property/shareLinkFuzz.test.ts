// The share-link decoder under generated input: any hash (encoded documents, damaged links, plain
// text) comes back as a validated case or plan, or as problems naming a field (or "(link)"),
// never as a throw; a decoded case calculates with no NaN/Infinity.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../src/compute/calculateCase';
import { validateCase } from '../../src/io/caseFile';
import { validatePlan } from '../../src/io/planFile';
import { base64UrlOf, decodeShareHash } from '../../src/io/shareLink';
import { firstNonFinite } from '../helpers/allFinite';
import { linkRecipe, type LinkRecipe } from './generators/shareLinkArbitraries';

async function deflatedBase64Url(doc: unknown): Promise<string> {
  const json = JSON.stringify(doc) ?? 'null';
  const stream = new Blob([json]).stream().pipeThrough(new CompressionStream('deflate-raw'));
  return base64UrlOf(new Uint8Array(await new Response(stream).arrayBuffer()));
}

async function hashOf(r: LinkRecipe): Promise<string> {
  if (r.kind === 'text') return r.hash;
  const payload = await deflatedBase64Url(r.doc);
  if (r.kind === 'encode') return `#${r.linkKind}=${payload}`;
  let damaged = payload.slice(0, Math.floor(payload.length * r.cutAt));
  if (r.change) {
    const at = Math.floor(damaged.length * r.change.at);
    damaged = damaged.slice(0, at) + r.change.to + damaged.slice(at + 1);
  }
  return `#${r.linkKind}=${damaged}`;
}

describe('share-link decoder under generated input', () => {
  it('decodes any hash to a validated document or to problems naming a field (10 000 hashes)', async () => {
    const seen = { decoded: 0, rejected: 0, calculated: 0 };
    await fc.assert(
      fc.asyncProperty(linkRecipe, async (recipe) => {
        const hash = await hashOf(recipe);
        const r = await decodeShareHash(hash);
        if (!r.ok) {
          seen.rejected++;
          if (r.problems.length === 0) throw new Error(`no problem listed for ${hash}`);
          for (const p of r.problems)
            if (!p.path || !p.message) throw new Error(`unnamed problem ${JSON.stringify(p)}`);
          if (recipe.kind === 'encode' && recipe.valid)
            throw new Error(
              `a valid ${recipe.linkKind} was rejected: ${JSON.stringify(r.problems)}`,
            );
          return;
        }
        seen.decoded++;
        // What comes back has passed the file rules: validating it again changes nothing.
        if (r.doc.kind === 'case') {
          const again = validateCase(r.doc.value);
          if (!again.ok) throw new Error('decoded case does not validate');
          expect(again.value).toEqual(r.doc.value);
          // Every 8th decoded case goes on through the engine (geometry, warnings, kernels).
          if (seen.decoded % 8 === 0) {
            seen.calculated++;
            const report = calculateCase(r.doc.value, {
              depthStepCm: 2,
              methods: ['pencil-beam'],
            });
            const bad = firstNonFinite(report);
            if (bad) throw new Error(`report value at ${bad} is not finite`);
          }
        } else {
          const again = validatePlan(r.doc.value);
          if (!again.ok) throw new Error('decoded plan does not validate');
        }
        if (recipe.kind === 'encode' && recipe.valid && recipe.linkKind === 'case')
          expect(r.doc.value).toEqual(recipe.doc);
      }),
      { numRuns: 10_000, seed: 20261205 },
    );
    // Both outcomes, and the engine after decoding, must really be exercised.
    expect(seen.decoded).toBeGreaterThan(1500);
    expect(seen.rejected).toBeGreaterThan(3000);
    expect(seen.calculated).toBeGreaterThan(150);
  });
});
