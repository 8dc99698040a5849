// Reading measured water-data tables from CSV text: a depth × field matrix (TMR or PDD) and a
// scatter-factor table (field, S_c, S_p and optionally PSF). Every problem names its row and
// column as a spreadsheet shows them (1-based rows, lettered and numbered columns). Lines starting
// with "#" are comments; blank lines are ignored. Nothing is coerced: a bad cell is reported.
import Papa from 'papaparse';

export type DepthTableKind = 'tmr' | 'pdd';

/** Sane ranges of the tabulated values, by kind (TMR is a ratio, PDD a percentage). */
export const VALUE_RANGES: Record<DepthTableKind, { min: number; max: number; label: string }> = {
  tmr: { min: 0, max: 1.2, label: 'TMR' },
  pdd: { min: 0, max: 110, label: 'PDD' },
};

export interface DepthFieldMatrix {
  kind: DepthTableKind;
  depthsCm: number[];
  /** Field sides from the header row (cm). */
  sidesCm: number[];
  /** values[i][j] at depthsCm[i], sidesCm[j]. */
  values: number[][];
}

export interface ScatterFactorTable {
  sidesCm: number[];
  sc: number[];
  sp: number[];
  /** Peak-scatter factors when the file has a fourth column. */
  psf?: number[];
}

export type CsvResult<T> = { ok: true; value: T } | { ok: false; problems: string[] };

const MAX_PROBLEMS = 25;
const NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

/** Spreadsheet column name of a 1-based column index: 1 → A, 27 → AA. */
export function columnLetter(column: number): string {
  let n = column;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

export function cellRef(row: number, column: number): string {
  return `row ${row}, column ${column} (${columnLetter(column)})`;
}

interface CsvRow {
  /** 1-based line number in the file. */
  row: number;
  cells: string[];
}

/** Split CSV text into non-comment, non-blank rows with their line numbers. */
export function csvRows(text: string): CsvRow[] {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), {
    delimitersToGuess: [',', ';', '\t'],
    skipEmptyLines: false,
  });
  const rows: CsvRow[] = [];
  parsed.data.forEach((cells, i) => {
    const trimmed = cells.map((c) => c.trim());
    if (trimmed.every((c) => c === '')) return;
    if ((trimmed[0] ?? '').startsWith('#')) return;
    rows.push({ row: i + 1, cells: trimmed });
  });
  return rows;
}

/** A cell as a number, or a problem naming the cell. */
function numberCell(row: CsvRow, index: number, problems: string[]): number {
  const raw = row.cells[index] ?? '';
  if (raw === '') {
    problems.push(`${cellRef(row.row, index + 1)}: empty cell (a number is needed)`);
    return NaN;
  }
  if (!NUMBER.test(raw)) {
    problems.push(`${cellRef(row.row, index + 1)}: "${raw}" is not a number`);
    return NaN;
  }
  const value = Number(raw);
  // "1e999" passes the pattern but reads as Infinity, which no depth, field or factor can be.
  if (!Number.isFinite(value)) {
    problems.push(`${cellRef(row.row, index + 1)}: "${raw}" is too large to be a number`);
    return NaN;
  }
  return value;
}

const SQUARE = /^(\d+\.?\d*|\.\d+)\s*[x×*]\s*(\d+\.?\d*|\.\d+)$/i;

/**
 * A field-size cell: a side in cm, or a square written "10x10" / "10 × 10". A rectangle is refused
 * (tables are by equivalent square; the user converts).
 */
function fieldCell(row: CsvRow, index: number, problems: string[]): number {
  const raw = row.cells[index] ?? '';
  const m = SQUARE.exec(raw);
  if (!m) return numberCell(row, index, problems);
  const a = Number(m[1]);
  const b = Number(m[2]);
  if (a === b) return a;
  problems.push(
    `${cellRef(row.row, index + 1)}: rectangular field "${raw}": give the equivalent square side (cm)`,
  );
  return NaN;
}

function capped(problems: string[]): string[] {
  return problems.length > MAX_PROBLEMS
    ? [...problems.slice(0, MAX_PROBLEMS), `… and ${problems.length - MAX_PROBLEMS} more problems`]
    : problems;
}

/**
 * Parse a depth × field matrix: header row = a label cell, then field sides (cm); each further row
 * = depth (cm), then one value per field. TMR values must lie in (0, 1.2], PDD in (0, 110].
 */
export function parseDepthFieldCsv(
  text: string,
  kind: DepthTableKind,
): CsvResult<DepthFieldMatrix> {
  const rows = csvRows(text);
  if (rows.length === 0)
    return { ok: false, problems: ['the file is empty (no header row, no data)'] };
  const problems: string[] = [];
  const header = rows[0] as CsvRow;
  const nCols = header.cells.length;
  if (nCols < 3)
    problems.push(
      `row ${header.row}: the header needs a depth label and at least 2 field sizes (found ${nCols - 1})`,
    );
  const sidesCm: number[] = [];
  for (let c = 1; c < nCols; c++) {
    const v = fieldCell(header, c, problems);
    if (Number.isNaN(v)) continue;
    if (!(v > 0)) problems.push(`${cellRef(header.row, c + 1)}: field size ${v} cm must be > 0`);
    else if (sidesCm.length > 0 && v <= (sidesCm[sidesCm.length - 1] as number))
      problems.push(`${cellRef(header.row, c + 1)}: field sizes must increase from left to right`);
    sidesCm.push(v);
  }
  const data = rows.slice(1);
  if (data.length < 2) problems.push('the table needs at least 2 depth rows below the header');
  const range = VALUE_RANGES[kind];
  const depthsCm: number[] = [];
  const values: number[][] = [];
  for (const r of data) {
    if (r.cells.length !== nCols) {
      problems.push(
        `row ${r.row}: has ${r.cells.length} cells, the header has ${nCols} (ragged row)`,
      );
      continue;
    }
    const depth = numberCell(r, 0, problems);
    if (!Number.isNaN(depth)) {
      if (depth < 0) problems.push(`${cellRef(r.row, 1)}: depth ${depth} cm must be ≥ 0`);
      const prev = depthsCm[depthsCm.length - 1];
      if (prev !== undefined && depth <= prev)
        problems.push(
          `${cellRef(r.row, 1)}: depth ${depth} cm does not increase (previous row ${prev} cm)`,
        );
    }
    const rowValues: number[] = [];
    for (let c = 1; c < nCols; c++) {
      const v = numberCell(r, c, problems);
      if (!Number.isNaN(v) && !(v > range.min && v <= range.max))
        problems.push(
          `${cellRef(r.row, c + 1)}: ${range.label} ${v} is outside (${range.min}, ${range.max}]`,
        );
      rowValues.push(v);
    }
    depthsCm.push(depth);
    values.push(rowValues);
  }
  if (problems.length > 0) return { ok: false, problems: capped(problems) };
  return { ok: true, value: { kind, depthsCm, sidesCm, values } };
}

/**
 * Parse a scatter-factor table: columns field side (cm), S_c, S_p and optionally PSF; an optional
 * header row (first cell not a number). S_c and S_p must lie in (0.5, 1.5], PSF in [1, 1.3].
 */
export function parseScatterCsv(text: string): CsvResult<ScatterFactorTable> {
  const rows = csvRows(text);
  if (rows.length === 0) return { ok: false, problems: ['the scatter-factor file is empty'] };
  const problems: string[] = [];
  const first = rows[0] as CsvRow;
  const hasHeader = !NUMBER.test(first.cells[0] ?? '');
  const data = hasHeader ? rows.slice(1) : rows;
  const nCols = hasHeader ? first.cells.length : first.cells.length;
  if (nCols !== 3 && nCols !== 4)
    problems.push(
      `row ${first.row}: expected 3 columns (field cm, S_c, S_p) or 4 (… , PSF), found ${nCols}`,
    );
  if (data.length < 2) problems.push('the scatter-factor table needs at least 2 field sizes');
  const sidesCm: number[] = [];
  const sc: number[] = [];
  const sp: number[] = [];
  const psf: number[] = [];
  for (const r of data) {
    if (r.cells.length !== nCols) {
      problems.push(`row ${r.row}: has ${r.cells.length} cells, expected ${nCols} (ragged row)`);
      continue;
    }
    const side = fieldCell(r, 0, problems);
    if (!Number.isNaN(side)) {
      if (!(side > 0)) problems.push(`${cellRef(r.row, 1)}: field size ${side} cm must be > 0`);
      const prev = sidesCm[sidesCm.length - 1];
      if (prev !== undefined && side <= prev)
        problems.push(
          `${cellRef(r.row, 1)}: field size ${side} cm does not increase (previous ${prev} cm)`,
        );
    }
    sidesCm.push(side);
    const checks: [number[], string, number, number, boolean][] = [
      [sc, 'S_c', 0.5, 1.5, false],
      [sp, 'S_p', 0.5, 1.5, false],
      [psf, 'PSF', 1, 1.3, true],
    ];
    checks.slice(0, nCols - 1).forEach(([arr, label, lo, hi, closedLow], k) => {
      const v = numberCell(r, k + 1, problems);
      const inRange = (closedLow ? v >= lo : v > lo) && v <= hi;
      if (!Number.isNaN(v) && !inRange)
        problems.push(
          `${cellRef(r.row, k + 2)}: ${label} ${v} is outside ${closedLow ? '[' : '('}${lo}, ${hi}]`,
        );
      arr.push(v);
    });
  }
  if (problems.length > 0) return { ok: false, problems: capped(problems) };
  return { ok: true, value: nCols === 4 ? { sidesCm, sc, sp, psf } : { sidesCm, sc, sp } };
}
