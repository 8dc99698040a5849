// Exponential integral E₁(x) = ∫_x^∞ e^(−t)/t dt for x > 0: power series for x ≤ 1 and a
// continued fraction (modified Lentz) above (Abramowitz & Stegun 5.1.11 and 5.1.22, from memory).

const EULER_GAMMA = 0.5772156649015329;

export function expIntegralE1(x: number): number {
  if (!(x > 0)) return x === 0 ? Infinity : NaN;
  if (x <= 1) {
    let sum = 0;
    let term = 1;
    for (let k = 1; k < 60; k++) {
      term *= -x / k;
      const add = -term / k;
      sum += add;
      if (Math.abs(add) < 1e-17 * Math.abs(sum)) break;
    }
    return -EULER_GAMMA - Math.log(x) + sum;
  }
  const tiny = 1e-300;
  let b = x + 1;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 200; i++) {
    const a = -i * i;
    b += 2;
    d = 1 / (a * d + b);
    c = b + a / c;
    const del = c * d;
    h *= del;
    if (Math.abs(del - 1) < 1e-15) break;
  }
  return h * Math.exp(-x);
}
