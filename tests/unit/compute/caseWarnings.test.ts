import { describe, expect, it } from 'vitest';
import { modelledWaterData } from '../../../src/engine/beam/modelledBeam';
import { readFileSync } from 'node:fs';
import { calculateCase, phantomOfCase } from '../../../src/compute/calculateCase';
import { caseWarnings } from '../../../src/compute/caseWarnings';
import { formatWarnings } from '../../../src/cli/formatReport';
import type { WaterData } from '../../../src/engine/beam/waterData';
import { parseCaseText } from '../../../src/io/caseFile';
import type { LaminaCase } from '../../../src/io/caseSchema';

function demoCase(): LaminaCase {
  const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  if (!parsed.ok) throw new Error('demo case must parse');
  return parsed.value;
}

// A water data stand-in with an exponential TMR beyond d_max = 2 cm: TPR20,10 = e^(−10·0.04).
const expWater: WaterData = {
  source: 'exponential test table',
  dMaxCm: 2,
  depthRangeCm: [0, 40],
  fieldRangeCm: [2, 40],
  tmr: (d) => Math.exp(-0.04 * Math.max(d - 2, 0)),
  sp: () => 1,
  sc: () => 1,
  psf: () => 1,
  referenceDosePerMuCGy: 1,
};

describe('caseWarnings', () => {
  it('calculateCase reports warnings sorted by depth with the demo case’s interfaces', () => {
    const r = calculateCase(demoCase());
    const ids = r.warnings.map((w) => w.id);
    expect(ids).toContain('INTERFACE-DOWNSTREAM@layer2');
    expect(ids).toContain('INTERFACE-DOWNSTREAM@layer3');
    const starts = r.warnings.map((w) => w.depthRangeCm.fromCm);
    expect([...starts].sort((a, b) => a - b)).toEqual(starts);
    // The report is plain data: it survives a JSON round trip unchanged.
    expect(JSON.parse(JSON.stringify(r.warnings))).toEqual(r.warnings);
  });

  it('caseWarnings takes d_max and TPR20,10 from the water data in use', () => {
    const c = demoCase();
    const r = calculateCase(c);
    const ws = caseWarnings(c, phantomOfCase(c), [], expWater);
    const w = ws.find((x) => x.id === 'INTERFACE-DOWNSTREAM@layer3');
    expect(w?.numbers).toMatch(/exponential test table/);
    // Derived: TPR20,10 = e^(−0.4) = 0.670.
    expect(w?.numbers).toMatch(/TPR20,10 0\.670, d_max 2\.00 cm/);
    expect(r.warnings.length).toBeGreaterThan(0);
  });

  it('formatWarnings prints a table with id, severity, depth range and methods, then the numbers', () => {
    const text = formatWarnings(calculateCase(demoCase()).warnings).join('\n');
    expect(text).toMatch(/^Warnings\nid\s+severity\s+depth cm\s+points\s+concerns/);
    // Modelled 6 MV d_max (water-equivalent) → d_max/1.050 cm of soft tissue (ρ_e 1.050) past 11 cm.
    const end = /INTERFACE-DOWNSTREAM@layer3\s+caution\s+11\.00–(\d+\.\d+)/.exec(text);
    expect(end).not.toBeNull();
    // Printed to 0.01 cm.
    expect(Math.abs(Number(end![1]) - (11 + modelledWaterData('6MV').dMaxCm / 1.05))).toBeLessThan(
      0.011,
    );
    expect(text).toMatch(/What to do:/);
    expect(formatWarnings([])).toEqual(['Warnings', '(none)']);
  });
});
