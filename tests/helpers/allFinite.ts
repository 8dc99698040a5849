// Walks any plain value and names the first number that is NaN or ±Infinity (null when none).

/** Path of the first non-finite number anywhere in `value`, or null when every number is finite. */
export function firstNonFinite(value: unknown, path = ''): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : path || '(root)';
  if (ArrayBuffer.isView(value) && !(value instanceof DataView))
    return firstNonFinite(Array.from(value as unknown as ArrayLike<number>), path);
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const bad = firstNonFinite(value[i], `${path}[${i}]`);
      if (bad) return bad;
    }
    return null;
  }
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      const bad = firstNonFinite(v, path ? `${path}.${k}` : k);
      if (bad) return bad;
    }
  }
  return null;
}
