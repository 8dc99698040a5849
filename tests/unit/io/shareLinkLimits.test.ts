// Share links from others are untrusted: a few kilobytes of deflate can claim gigabytes. The
// decoder stops at MAX_LINK_JSON_BYTES and says so, while the largest honest document still opens.
import { describe, expect, it } from 'vitest';
import { base64UrlOf, decodeShareHash, MAX_LINK_JSON_BYTES } from '../../../src/io/shareLink';

async function hashOfText(kind: 'case' | 'plan', json: string): Promise<string> {
  const stream = new Blob([json]).stream().pipeThrough(new CompressionStream('deflate-raw'));
  return `#${kind}=${base64UrlOf(new Uint8Array(await new Response(stream).arrayBuffer()))}`;
}

describe('share-link size limit', () => {
  it('rejects a link that unpacks past the limit, naming the link, before building the text', async () => {
    const bomb = `{"format":"lamina.case","name":"${' '.repeat(MAX_LINK_JSON_BYTES + 1024)}"}`;
    const hash = await hashOfText('case', bomb);
    // deflate packs the run of spaces about 1000:1, so the link itself is small
    expect(hash.length).toBeLessThan(MAX_LINK_JSON_BYTES / 100);
    const r = await decodeShareHash(hash);
    expect(r).toEqual({
      ok: false,
      problems: [
        {
          path: '(link)',
          message: 'the link is damaged or incomplete (it unpacks to more than 16 MiB)',
        },
      ],
    });
  });

  it('still opens a 12-beam plan whose beams all carry a 500 000-character water table', async () => {
    // The table is only checked by the measured-table reader at calculation time; here it only
    // has to be within the case file's size rules (csv ≤ 500 000 characters).
    let csv = 'depth cm,5,10\n';
    for (let i = 0; ; i++) {
      const row = `${(i / 1000).toFixed(3)},0.9,0.9\n`;
      if (csv.length + row.length > 500_000) break;
      csv += row;
    }
    const beam = (i: number) => ({
      id: `b${i}`,
      weight: 1,
      case: {
        format: 'lamina.case',
        version: 1,
        name: `beam ${i}`,
        beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
        layers: [{ materialId: 'water', thicknessCm: 20 }],
        points: [{ id: 'P1', depthCm: 10 }],
        waterData: { kind: 'tmr', fileName: 't.csv', csv },
      },
    });
    const plan = {
      format: 'lamina.plan',
      version: 1,
      name: 'large',
      beams: Array.from({ length: 12 }, (_, i) => beam(i + 1)),
    };
    const r = await decodeShareHash(await hashOfText('plan', JSON.stringify(plan)));
    if (!r.ok) throw new Error(JSON.stringify(r.problems.slice(0, 3)));
    expect(r.doc.kind).toBe('plan');
    if (r.doc.kind === 'plan') expect(r.doc.value.beams).toHaveLength(12);
  });
});
