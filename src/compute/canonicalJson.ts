// JSON text that does not depend on key order or on keys holding undefined, so a document and the
// same document after validation give one key (run keys, water-table hashes, caches).
export function canonicalJson(value: unknown): string {
  return JSON.stringify(sorted(value));
}

function sorted(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(sorted);
  if (v === null || typeof v !== 'object') return v;
  const out: Record<string, unknown> = {};
  for (const k of Object.keys(v).sort()) {
    const x = (v as Record<string, unknown>)[k];
    if (x !== undefined) out[k] = sorted(x);
  }
  return out;
}
