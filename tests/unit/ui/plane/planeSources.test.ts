import { describe, expect, it } from 'vitest';
import { computeApi } from '../../../../src/compute/computeApi';
import { PRESETS } from '../../../../src/state/presets';
import { isDrawable } from '../../../../src/plots/planeGrid';
import { planeKeyOf, planeSources, runMatchesCase } from '../../../../src/ui/plane/planeSources';
import type { McPlane } from '../../../../src/engine/montecarlo/monteCarloResult';

const chest = PRESETS.find((p) => p.id === 'chest')!.make();
const runKeyOf = (c: typeof chest, extra: Record<string, unknown> = {}) =>
  JSON.stringify({
    beam: c.beam,
    layers: c.layers.map((l) => [l.materialId, l.thicknessCm, l.densityGPerCm3 ?? null]),
    points: c.points.map((p) => [p.id, p.depthCm]),
    ...extra,
  });

describe('runMatchesCase(...)', () => {
  it('runMatchesCase(...) accepts a run key with the same beam and slabs, whatever the points', () => {
    expect(runMatchesCase(runKeyOf(chest), chest)).toBe(true);
    const morePoints = { ...chest, points: [...chest.points, { id: 'P9', depthCm: 2 }] };
    expect(runMatchesCase(runKeyOf(chest), morePoints)).toBe(true);
    // A serialised whole case (layers as objects) is understood too.
    expect(runMatchesCase(JSON.stringify(chest), chest)).toBe(true);
  });

  it('runMatchesCase(...) rejects another slab, another beam, no run and an unreadable key', () => {
    const thinner = {
      ...chest,
      layers: chest.layers.map((l, i) => (i === 1 ? { ...l, thicknessCm: 4 } : l)),
    };
    expect(runMatchesCase(runKeyOf(chest), thinner)).toBe(false);
    const wider = { ...chest, beam: { ...chest.beam, fieldXCm: 12 } };
    expect(runMatchesCase(runKeyOf(chest), wider)).toBe(false);
    expect(runMatchesCase(null, chest)).toBe(false);
    expect(runMatchesCase('not json', chest)).toBe(false);
  });

  it('planeKeyOf(...) does not depend on the order of the beam’s keys', () => {
    const reordered = {
      ...chest,
      beam: { fieldYCm: 10, fieldXCm: 10, setup: chest.beam.setup, energy: chest.beam.energy },
    };
    expect(planeKeyOf(reordered)).toBe(planeKeyOf(chest));
  });
});

describe('planeSources(...)', () => {
  const sup = computeApi.dosePlane(chest, {
    method: 'superposition',
    stepCm: 1,
    profileDepthsCm: [],
  });
  if (!sup.ok) throw new Error('chest preset did not calculate');
  const mc: McPlane = {
    xCm: [-1, 0, 1],
    depthCm: [0.5, 1.5],
    dosePerMuCGy: [
      [0.5, 1, 0.5],
      [0.4, 0.9, 0.4],
    ],
  };

  it('planeSources(...) gives a drawable plane for superposition and plain reasons for the rest', () => {
    const s = planeSources({
      typeB: { superposition: sup.plane },
      mc: { plane: null, matches: false, running: false },
    });
    expect(s.map((x) => x.id)).toEqual(['superposition', 'pencil-beam', 'monte-carlo']);
    expect(s[0]?.grid && isDrawable(s[0].grid)).toBe(true);
    expect(s[1]).toMatchObject({ grid: null, reason: 'not calculated (see the message above).' });
    expect(s[2]?.grid).toBeNull();
    expect(s[2]?.reason).toMatch(/no Monte Carlo run/);
  });

  it('planeSources(...) shows the Monte Carlo plane only for a matching run, marked while running', () => {
    const stale = planeSources({ typeB: {}, mc: { plane: mc, matches: false, running: false } });
    expect(stale[2]?.reason).toMatch(/another beam or slab stack/);
    const live = planeSources({ typeB: {}, mc: { plane: mc, matches: true, running: true } });
    expect(live[2]?.grid?.xCm).toEqual([-1, 0, 1]);
    expect(live[2]?.label).toBe('Monte Carlo (run in progress)');
  });

  it('planeSources(...) refuses a plane with a non-finite value instead of drawing NaN', () => {
    const broken = {
      ...mc,
      dosePerMuCGy: [
        [0.5, NaN, 0.5],
        [0.4, 0.9, 0.4],
      ],
    };
    const s = planeSources({ typeB: {}, mc: { plane: broken, matches: true, running: false } });
    expect(s[2]?.grid).toBeNull();
    expect(s[2]?.reason).toMatch(/non-finite/);
  });
});
