// A shareable link that carries a whole case (or plan) in the URL hash: JSON, deflate-raw
// compressed with the platform's CompressionStream, base64url-encoded. Nothing leaves the
// browser: the hash is never sent to a server. Decoding validates through the file rules and
// reports problems by field path.
import { validateCase, type CaseProblem } from './caseFile';
import type { LaminaCase } from './caseSchema';
import { validatePlan, type LaminaPlan } from './planFile';

export type SharedDocument =
  { kind: 'case'; value: LaminaCase } | { kind: 'plan'; value: LaminaPlan };

export type ShareDecodeResult =
  { ok: true; doc: SharedDocument } | { ok: false; problems: CaseProblem[] };

const KEYS = { case: 'case', plan: 'plan' } as const;

/**
 * Most JSON a link may unpack to. The largest valid document (a 12-beam plan, each beam with a
 * full inline water table) stays below it; a few kilobytes of deflate can otherwise claim
 * gigabytes and stall or crash the tab.
 */
export const MAX_LINK_JSON_BYTES = 16 * 1024 * 1024;

/** Inflate deflate-raw bytes, giving up as soon as the output passes `maxBytes`. */
async function inflateBounded(
  bytes: Uint8Array<ArrayBuffer>,
  maxBytes: number,
): Promise<Uint8Array<ArrayBuffer>> {
  const reader = new Blob([bytes])
    .stream()
    .pipeThrough(new DecompressionStream('deflate-raw'))
    .getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw new Error(`it unpacks to more than ${Math.round(maxBytes / 1024 / 1024)} MiB`);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}

async function pipeBytes(
  bytes: Uint8Array<ArrayBuffer>,
  stream: CompressionStream | DecompressionStream,
) {
  const out = new Response(new Blob([bytes]).stream().pipeThrough(stream));
  return new Uint8Array(await out.arrayBuffer());
}

export function base64UrlOf(bytes: Uint8Array): string {
  let bin = '';
  const chunk = 0x8000;
  for (let i = 0; i < bytes.length; i += chunk)
    bin += String.fromCharCode(...bytes.subarray(i, i + chunk));
  return btoa(bin).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}

export function bytesOfBase64Url(text: string): Uint8Array<ArrayBuffer> {
  if (!/^[A-Za-z0-9_-]*$/.test(text))
    throw new Error('the link contains characters outside base64url');
  const b64 = text.replace(/-/g, '+').replace(/_/g, '/');
  const bin = atob(b64 + '='.repeat((4 - (b64.length % 4)) % 4));
  const out = new Uint8Array(bin.length);
  for (let i = 0; i < bin.length; i++) out[i] = bin.charCodeAt(i);
  return out;
}

/** The hash ("#case=…" or "#plan=…") that carries the document. */
export async function shareHashOf(doc: SharedDocument): Promise<string> {
  const json = JSON.stringify(doc.value);
  const packed = await pipeBytes(
    new TextEncoder().encode(json),
    new CompressionStream('deflate-raw'),
  );
  return `#${KEYS[doc.kind]}=${base64UrlOf(packed)}`;
}

/** A full link: the page address without its hash, plus the document's hash. */
export async function shareUrlOf(pageUrl: string, doc: SharedDocument): Promise<string> {
  return `${pageUrl.split('#')[0] ?? ''}${await shareHashOf(doc)}`;
}

/** True when a hash looks like a Lamina share link (so the page tries to open it). */
export function isShareHash(hash: string): boolean {
  return /^#(case|plan)=/.test(hash);
}

/** Decode and validate a share hash; problems come back by field path, never as a throw. */
export async function decodeShareHash(hash: string): Promise<ShareDecodeResult> {
  const m = /^#?(case|plan)=(.*)$/s.exec(hash);
  if (!m)
    return {
      ok: false,
      problems: [{ path: '(link)', message: 'the link carries no case ("#case=…" or "#plan=…")' }],
    };
  const kind = m[1] as 'case' | 'plan';
  let raw: unknown;
  try {
    const bytes = await inflateBounded(bytesOfBase64Url(m[2] ?? ''), MAX_LINK_JSON_BYTES);
    raw = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(bytes));
  } catch (e) {
    return {
      ok: false,
      problems: [
        { path: '(link)', message: `the link is damaged or incomplete (${(e as Error).message})` },
      ],
    };
  }
  if (kind === 'case') {
    const r = validateCase(raw);
    return r.ok ? { ok: true, doc: { kind, value: r.value } } : r;
  }
  const r = validatePlan(raw);
  return r.ok ? { ok: true, doc: { kind, value: r.value } } : r;
}
