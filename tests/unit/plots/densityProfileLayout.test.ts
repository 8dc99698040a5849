import { describe, expect, it } from 'vitest';
import { densityProfileLayout } from '../../../src/plots/densityProfileLayout';

const frame = { width: 420, height: 200, margin: { top: 10, right: 20, bottom: 30, left: 40 } };

describe('densityProfileLayout(profile, slabs, markers, frame)', () => {
  const l = densityProfileLayout({
    depthCm: [0.25, 0.75, 1.25, 1.75],
    rhoE: [1, 1, 0.3, 0.3],
    slabs: [
      { thicknessCm: 1, rhoE: 1 },
      { thicknessCm: 1, rhoE: 0.3 },
    ],
    markers: [{ id: 'ISO', depthCm: 1.5 }],
    frame,
  });

  it('spans the slab stack across the plot and places blocks and markers on the depth scale', () => {
    expect(l.x.domain()).toEqual([0, 2]);
    expect(l.blocks.map((b) => [b.x, b.width])).toEqual([
      [40, 180],
      [220, 180],
    ]);
    expect(l.markers).toEqual([{ id: 'ISO', x: 310 }]);
  });

  it('draws each slab to its own level and shades denser slabs darker', () => {
    expect(l.blocks[0]!.y).toBeLessThan(l.blocks[1]!.y);
    expect(l.blocks[0]!.fill).not.toBe(l.blocks[1]!.fill);
    expect(l.slabPath.startsWith('M40,')).toBe(true);
    expect(l.profilePath.split(/[ML]/).filter(Boolean)).toHaveLength(4);
  });

  it('keeps water (ρe 1) below the top of the axis', () => {
    expect(l.y.domain()[1]).toBeGreaterThan(1);
  });
});
