// Differences between two JSON documents: numbers compared within a relative tolerance, every
// other value (strings, booleans, null, keys, array lengths) exactly. Returns the paths that
// differ (at most `limit`), empty when the documents agree.
export function numericDiff(a: unknown, b: unknown, relTol: number, limit = 12): string[] {
  const out: string[] = [];
  const walk = (x: unknown, y: unknown, path: string): void => {
    if (out.length >= limit) return;
    if (typeof x === 'number' && typeof y === 'number') {
      const ok = x === y || Math.abs(x - y) <= relTol * Math.max(Math.abs(x), Math.abs(y));
      if (!ok) out.push(`${path}: ${x} ≠ ${y}`);
      return;
    }
    if (Array.isArray(x) && Array.isArray(y)) {
      if (x.length !== y.length) out.push(`${path}: length ${x.length} ≠ ${y.length}`);
      else x.forEach((v, i) => walk(v, y[i], `${path}[${i}]`));
      return;
    }
    if (
      x &&
      y &&
      typeof x === 'object' &&
      typeof y === 'object' &&
      !Array.isArray(x) &&
      !Array.isArray(y)
    ) {
      const kx = Object.keys(x).sort();
      const ky = Object.keys(y).sort();
      if (kx.join() !== ky.join()) {
        out.push(`${path}: keys {${kx.join(', ')}} ≠ {${ky.join(', ')}}`);
        return;
      }
      for (const k of kx)
        walk((x as Record<string, unknown>)[k], (y as Record<string, unknown>)[k], `${path}.${k}`);
      return;
    }
    if (x !== y) out.push(`${path}: ${JSON.stringify(x)} ≠ ${JSON.stringify(y)}`);
  };
  walk(a, b, '$');
  return out;
}
