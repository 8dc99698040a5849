import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseCaseText } from '../../../src/io/caseFile';
import { validatePlan } from '../../../src/io/planFile';
import {
  base64UrlOf,
  bytesOfBase64Url,
  decodeShareHash,
  isShareHash,
  shareHashOf,
  shareUrlOf,
} from '../../../src/io/shareLink';

const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
if (!parsed.ok) throw new Error('demo case must be valid');
const demo = parsed.value;

async function hashOfRaw(kind: 'case' | 'plan', raw: unknown): Promise<string> {
  const stream = new Blob([JSON.stringify(raw)])
    .stream()
    .pipeThrough(new CompressionStream('deflate-raw'));
  return `#${kind}=${base64UrlOf(new Uint8Array(await new Response(stream).arrayBuffer()))}`;
}

describe('share links', () => {
  it('base64UrlOf and bytesOfBase64Url invert each other for every byte value', () => {
    const bytes = new Uint8Array(300).map((_, i) => (i * 7) % 256);
    const text = base64UrlOf(bytes);
    expect(text).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(bytesOfBase64Url(text)).toEqual(bytes);
  });

  it('case → link → case returns the same case', async () => {
    const url = await shareUrlOf('http://127.0.0.1/lamina/#old', { kind: 'case', value: demo });
    expect(url.startsWith('http://127.0.0.1/lamina/#case=')).toBe(true);
    const hash = url.slice(url.indexOf('#'));
    expect(isShareHash(hash)).toBe(true);
    expect(await decodeShareHash(hash)).toEqual({ ok: true, doc: { kind: 'case', value: demo } });
  });

  it('plan → link → plan returns the same plan', async () => {
    const plan = validatePlan({
      format: 'lamina.plan',
      version: 1,
      name: 'two beams',
      beams: [
        { id: 'AP', weight: 1, case: demo },
        { id: 'PA', weight: 0.5, label: 'posterior', case: { ...demo, name: 'PA' } },
      ],
      prescription: { pointId: 'P1', doseCGy: 180 },
    });
    if (!plan.ok) throw new Error('plan must be valid');
    const hash = await shareHashOf({ kind: 'plan', value: plan.value });
    expect(await decodeShareHash(hash)).toEqual({
      ok: true,
      doc: { kind: 'plan', value: plan.value },
    });
  });

  it('decodeShareHash(...) reports an invalid case in a link by field path', async () => {
    const hash = await hashOfRaw('case', {
      ...demo,
      layers: [{ materialId: 'lung', thicknessCm: 0 }],
    });
    const r = await decodeShareHash(hash);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems.map((p) => p.path)).toContain('layers[0].thicknessCm');
  });

  it('decodeShareHash(...) reports a damaged or foreign link instead of throwing', async () => {
    const good = await shareHashOf({ kind: 'case', value: demo });
    const cut = await decodeShareHash(good.slice(0, good.length - 20));
    expect(cut.ok).toBe(false);
    const bad = await decodeShareHash('#case=***');
    expect(!bad.ok && bad.problems[0]?.path).toBe('(link)');
    const foreign = await decodeShareHash('#section-2');
    expect(!foreign.ok && foreign.problems[0]?.path).toBe('(link)');
    expect(isShareHash('#section-2')).toBe(false);
  });
});
