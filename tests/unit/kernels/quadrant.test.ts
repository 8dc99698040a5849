import { describe, expect, it } from 'vitest';
import {
  quadrantAt,
  quadrantFromRadial,
  quadrantTable,
  rectangleIntegral,
} from '../../../src/engine/kernels/quadrant';
import { cylinderAt, cylinderCumulative } from '../../../src/engine/kernels/cylinderCumulative';
import { makeSinhGrid } from '../../../src/engine/kernels/sinhGrid';
import { beamPointKernel } from '../../../src/engine/superposition/beamModel';
import { expectAbsClose, expectRelClose } from '../../helpers/expectClose';

// erf by Abramowitz & Stegun 7.1.26 (|error| ≤ 1.5e-7).
function erf(x: number): number {
  const t = 1 / (1 + 0.3275911 * Math.abs(x));
  const y =
    1 -
    ((((1.061405429 * t - 1.453152027) * t + 1.421413741) * t - 0.284496736) * t + 0.254829592) *
      t *
      Math.exp(-x * x);
  return Math.sign(x) * y;
}

describe('quadrantFromRadial', () => {
  it('integrates a 2-D Gaussian over a quadrant rectangle to ¼·erf(U/σ√2)·erf(V/σ√2)', () => {
    // Unit-mass isotropic Gaussian: radial cumulative F(S) = 1 − exp(−S²/2σ²) (exact).
    const sigma = 1.3;
    const F = (s: number) => 1 - Math.exp(-(s * s) / (2 * sigma * sigma));
    for (const [u, v] of [
      [0.5, 0.5],
      [1, 3],
      [4, 0.2],
      [10, 10],
    ] as const) {
      const exact = 0.25 * erf(u / (sigma * Math.SQRT2)) * erf(v / (sigma * Math.SQRT2));
      // 8-point Gauss–Legendre on each side of the diagonal: ≤ 1e-4 relative for this smooth F.
      expectRelClose(quadrantFromRadial(F, u, v), exact, 1e-4);
    }
  });

  it('rectangleIntegral(...) of a symmetric kernel over a centred field is 4 quadrants', () => {
    const F = (s: number) => 1 - Math.exp(-s);
    const q = (u: number, v: number) => quadrantFromRadial(F, u, v);
    expectRelClose(rectangleIntegral(q, -2, 2, -3, 3), 4 * q(2, 3), 1e-12);
    expectAbsClose(rectangleIntegral(q, 1, 1, -3, 3), 0, 1e-15);
  });
});

describe('makeSinhGrid', () => {
  it('position(...) inverts the node formula to within 1e-3 of a node spacing', () => {
    // The inverse is read from a 16 384-interval table of asinh; linear interpolation error
    // (h²/8)·max|f''| is below 1e-3 node spacings for these grids.
    const g = makeSinhGrid(60, 40, 5, true);
    for (let k = 0; k < g.nodes.length; k += 7)
      expectAbsClose(g.position(g.nodes[k] as number), k, 1e-3);
    expect(g.position(-100)).toBe(0);
    expect(g.position(100)).toBe(80);
  });
});

describe('cylinderCumulative of the 6 MV kernel', () => {
  const kernel = beamPointKernel('6MV');
  const q = cylinderCumulative(kernel, 'total');

  it('holds all deposited energy at the far corner and the backward hemisphere at ζ = 0', () => {
    const nR = kernel.radialEdgesCm.length;
    let total = 0;
    let backward = 0;
    for (let j = 0; j < kernel.polarBins; j++)
      for (let i = 0; i < nR; i++) {
        const e = (kernel.primary[j * nR + i] as number) + (kernel.scatter[j * nR + i] as number);
        total += e;
        if (j >= kernel.polarBins / 2) backward += e;
      }
    // The 48 polar bins split exactly at 90°, so Q(0, ∞) is the backward bins' sum (exact up to
    // float rounding); the corner is the total (the kernel ends at 60 cm).
    expectRelClose(cylinderAt(q, 60, 60), total, 1e-9);
    expectRelClose(cylinderAt(q, 0, 60), backward, 1e-6);
    expect(backward).toBeLessThan(0.2 * total);
  });

  it('quadrantAt(...) of a very wide quadrant is a quarter of the disc', () => {
    const t = quadrantTable(q);
    // A 60 × 60 quadrant covers the quarter disc of radius 60 cm entirely (energy at s > 60 cm
    // is outside the kernel); linear interpolation in ζ between nodes: 1e-6.
    expectRelClose(quadrantAt(t, 5, 60, 60), 0.25 * cylinderAt(q, 5, 60), 1e-6);
  });
});
