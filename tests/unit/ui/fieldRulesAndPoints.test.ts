import { describe, expect, it } from 'vitest';
import { fromCaseFile } from '../../../src/state/editorCase';
import { presetById } from '../../../src/state/presets';
import { formatField, parseNumberField, RULES } from '../../../src/ui/fieldRules';
import { addPoint, nextPointId, removePoint, updatePoint } from '../../../src/ui/pointOps';

describe('parseNumberField(...)', () => {
  it('accepts a decimal comma and names the field in every message', () => {
    expect(parseNumberField('2,5', RULES.thickness(2))).toEqual({ ok: true, value: 2.5 });
    expect(parseNumberField('', RULES.thickness(2))).toEqual({
      ok: false,
      message: 'Layer 2 thickness: enter a number',
    });
    expect(parseNumberField('3 cm', RULES.thickness(2))).toEqual({
      ok: false,
      message: 'Layer 2 thickness: "3 cm" is not a number',
    });
    expect(parseNumberField('0', RULES.thickness(2))).toEqual({
      ok: false,
      message: 'Layer 2 thickness: must be > 0 cm',
    });
    expect(parseNumberField('45', RULES.field('X'))).toEqual({
      ok: false,
      message: 'Field X: must be ≤ 40 cm',
    });
    expect(parseNumberField('49.9', RULES.distance('SSD'))).toEqual({
      ok: false,
      message: 'SSD: must be ≥ 50 cm',
    });
    // The page's density rule is the case file's: from 0.001 g/cm³ (below air's 0.0012, NIST).
    expect(parseNumberField('0.0001', RULES.density(3))).toEqual({
      ok: false,
      message: 'Layer 3 density: must be ≥ 0.001 g/cm³',
    });
    expect(parseNumberField('0.0012', RULES.density(3))).toEqual({ ok: true, value: 0.0012 });
  });

  it('formatField(...) drops binary noise and trailing zeros', () => {
    expect(formatField(0.1 + 0.2)).toBe('0.3');
    expect(formatField(10)).toBe('10');
    expect(formatField(undefined)).toBe('');
  });
});

describe('point operations', () => {
  const chest = () => fromCaseFile(presetById('chest')!.make()); // points P1 and in-lung

  it('nextPointId(...) takes the first free P-number', () => {
    expect(nextPointId(chest())).toBe('P2');
    const c = updatePoint(chest(), 1, { id: 'P2' });
    expect(nextPointId(c)).toBe('P3');
  });

  it('addPoint(...) snaps the depth to 0.1 cm, and removePoint(...) removes it', () => {
    const c = addPoint(chest(), 4.349);
    expect(c.points.at(-1)).toMatchObject({ id: 'P2', depthCm: 4.3 });
    expect(removePoint(c, 2).points.map((p) => p.id)).toEqual(['P1', 'in-lung']);
  });
});
