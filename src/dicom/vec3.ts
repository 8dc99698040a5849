// Three-vectors in millimetres for patient and machine geometry.
export type Vec3 = readonly [number, number, number];

export const dot = (a: Vec3, b: Vec3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
/** a + s·b */
export const addScaled = (a: Vec3, b: Vec3, s: number): Vec3 => [
  a[0] + s * b[0],
  a[1] + s * b[1],
  a[2] + s * b[2],
];
export const sub = (a: Vec3, b: Vec3): Vec3 => [a[0] - b[0], a[1] - b[1], a[2] - b[2]];
export const norm = (a: Vec3): number => Math.sqrt(dot(a, a));
export const distanceMm = (a: Vec3, b: Vec3): number => norm(sub(a, b));

export function formatVec(a: Vec3, digits = 1): string {
  return `(${a.map((c) => c.toFixed(digits)).join(', ')})`;
}
