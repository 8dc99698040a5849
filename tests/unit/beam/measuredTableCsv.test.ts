// CSV validation of measured tables: every rejection names its row and column as a spreadsheet
// shows them (1-based, lettered columns).
import { describe, expect, it } from 'vitest';
import {
  columnLetter,
  parseDepthFieldCsv,
  parseScatterCsv,
} from '../../../src/engine/beam/measuredTableCsv';

const GOOD = ['depth cm,5,10,20', '0,0.5,0.5,0.5', '1.5,1,1,1', '10,0.75,0.78,0.8'].join('\n');

function problemsOf(text: string, kind: 'tmr' | 'pdd' = 'tmr'): string[] {
  const r = parseDepthFieldCsv(text, kind);
  expect(r.ok).toBe(false);
  return r.ok ? [] : r.problems;
}

describe('parseDepthFieldCsv', () => {
  it('parseDepthFieldCsv reads header sides, depths and values, skipping comments and blank lines', () => {
    const r = parseDepthFieldCsv(`# invented\n\n${GOOD}\n`, 'tmr');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.sidesCm).toEqual([5, 10, 20]);
    expect(r.value.depthsCm).toEqual([0, 1.5, 10]);
    expect(r.value.values[2]).toEqual([0.75, 0.78, 0.8]);
  });

  it('parseDepthFieldCsv accepts semicolon-separated files', () => {
    expect(parseDepthFieldCsv(GOOD.replaceAll(',', ';'), 'tmr').ok).toBe(true);
  });

  it('parseDepthFieldCsv rejects an empty file', () => {
    expect(problemsOf('')[0]).toMatch(/empty/);
    expect(problemsOf('# only a comment\n\n')[0]).toMatch(/empty/);
  });

  it('parseDepthFieldCsv rejects a ragged row, naming the row', () => {
    const text = GOOD.replace('1.5,1,1,1', '1.5,1,1');
    expect(problemsOf(text)).toEqual(['row 3: has 3 cells, the header has 4 (ragged row)']);
  });

  it('parseDepthFieldCsv rejects text in a number cell, naming row and column', () => {
    const text = GOOD.replace('10,0.75,0.78', '10,0.75,abc');
    expect(problemsOf(text)).toEqual(['row 4, column 3 (C): "abc" is not a number']);
  });

  it('parseDepthFieldCsv rejects a number too large to be finite ("1e999"), naming the cell', () => {
    // found by the measured-table fuzz: "1e999" matches the number pattern but reads as Infinity
    const text = GOOD.replace('10,0.75', '1e999,0.75');
    expect(problemsOf(text)).toEqual(['row 4, column 1 (A): "1e999" is too large to be a number']);
  });

  it('parseDepthFieldCsv rejects a depth that does not increase', () => {
    const text = GOOD.replace('10,0.75', '1.5,0.75');
    expect(problemsOf(text)[0]).toMatch(/^row 4, column 1 \(A\): depth 1\.5 cm does not increase/);
  });

  it('parseDepthFieldCsv rejects values outside (0, 1.2] for TMR and (0, 110] for PDD', () => {
    expect(problemsOf(GOOD.replace('0.78', '1.5'))).toEqual([
      'row 4, column 3 (C): TMR 1.5 is outside (0, 1.2]',
    ]);
    expect(problemsOf(GOOD.replace('0.78', '0'))[0]).toMatch(/row 4, column 3 \(C\)/);
    const pdd = ['d,5,10', '0,50,50', '1.5,100,100', '10,65,120'].join('\n');
    expect(problemsOf(pdd, 'pdd')).toEqual(['row 4, column 3 (C): PDD 120 is outside (0, 110]']);
  });

  it('parseDepthFieldCsv needs at least 2 fields and 2 depths', () => {
    expect(problemsOf('d,10\n0,0.5\n1.5,1')[0]).toMatch(/at least 2 field sizes/);
    expect(problemsOf('d,5,10\n1.5,1,1')).toContain(
      'the table needs at least 2 depth rows below the header',
    );
  });

  it('parseDepthFieldCsv rejects field sizes that do not increase, naming the header cell', () => {
    expect(problemsOf(GOOD.replace('depth cm,5,10,20', 'depth cm,5,20,10'))).toEqual([
      'row 1, column 4 (D): field sizes must increase from left to right',
    ]);
  });

  it('columnLetter numbers columns as a spreadsheet does', () => {
    expect([1, 3, 26, 27, 52].map(columnLetter)).toEqual(['A', 'C', 'Z', 'AA', 'AZ']);
  });
});

describe('parseScatterCsv', () => {
  it('parseScatterCsv reads field, S_c, S_p and an optional PSF column, header optional', () => {
    const r = parseScatterCsv('field cm,S_c,S_p,PSF\n5,0.98,0.99,1.02\n10,1,1,1.035\n');
    expect(r.ok && r.value.psf).toEqual([1.02, 1.035]);
    const noHeader = parseScatterCsv('5,0.98,0.99\n10,1,1\n');
    expect(noHeader.ok && noHeader.value.sp).toEqual([0.99, 1]);
    expect(noHeader.ok && noHeader.value.psf).toBeUndefined();
  });

  it('parseScatterCsv rejects ragged rows, text and non-increasing fields with row and column', () => {
    const r = parseScatterCsv('field,S_c,S_p\n5,0.98,0.99\n4,1,x\n10,1\n');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems).toEqual([
      'row 3, column 1 (A): field size 4 cm does not increase (previous 5 cm)',
      'row 3, column 3 (C): "x" is not a number',
      'row 4: has 2 cells, expected 3 (ragged row)',
    ]);
  });

  it('parseScatterCsv rejects an empty file', () => {
    const r = parseScatterCsv('\n');
    expect(r.ok).toBe(false);
  });
});

describe('field-size cells', () => {
  it('parseDepthFieldCsv reads square labels "10x10" and "10 × 10" as sides', () => {
    const r = parseDepthFieldCsv(
      GOOD.replace('depth cm,5,10,20', 'depth cm,5x5,10 × 10,20X20'),
      'tmr',
    );
    expect(r.ok && r.value.sidesCm).toEqual([5, 10, 20]);
  });

  it('parseDepthFieldCsv refuses a rectangular field label, naming the cell', () => {
    expect(problemsOf(GOOD.replace('depth cm,5,10,20', 'depth cm,5,10x20,20'))).toContain(
      'row 1, column 3 (C): rectangular field "10x20": give the equivalent square side (cm)',
    );
  });
});
