// fast-check generators for measured water-data tables (CSV text as a user would paste it): valid
// TMR/PDD matrices with optional scatter factors, and malformed ones made by breaking one cell,
// one row or one option of a valid table. Each table remembers the file line of every row, so a
// test can require that a problem names the row that was broken.
import fc from 'fast-check';
import type { MeasuredTableInput } from '../../../src/engine/beam/measuredTable';
import type { DepthTableKind } from '../../../src/engine/beam/measuredTableCsv';

/** An increasing sequence: a start, then strictly positive steps. */
const increasing = (startMin: number, startMax: number, stepMin: number, stepMax: number) =>
  fc
    .tuple(
      fc.double({ min: startMin, max: startMax, noNaN: true }),
      fc.array(fc.double({ min: stepMin, max: stepMax, noNaN: true }), {
        minLength: 1,
        maxLength: 9,
      }),
    )
    .map(([start, steps]) => {
      const out = [start];
      for (const s of steps) out.push((out[out.length - 1] as number) + s);
      return out;
    });

const VALUE_LIMITS: Record<DepthTableKind, { min: number; max: number }> = {
  // TMR is accepted in (0, 1.2]; PDD in (0, 110] %.
  tmr: { min: 1e-4, max: 1.2 },
  pdd: { min: 1e-2, max: 110 },
};

export interface TableSpec {
  kind: DepthTableKind;
  /** rows[0] is the header (label, sides…); rows[1…] are depth, values…. */
  rows: string[][];
  delimiter: ',' | ';' | '\t';
  /** Comment lines before the header (each adds a file line). */
  comments: number;
  bom: boolean;
  ssdCm?: number;
  dMaxCm?: number;
  referenceDosePerMuCGy?: number;
  scatterRows?: string[][];
}

const num = (v: number) => String(v);

const matrix = (kind: DepthTableKind) =>
  fc
    .tuple(increasing(0, 2, 0.01, 6), increasing(0.5, 5, 0.1, 8))
    .chain(([depths, sides]) =>
      fc
        .array(
          fc.array(
            fc.double({ min: VALUE_LIMITS[kind].min, max: VALUE_LIMITS[kind].max, noNaN: true }),
            { minLength: sides.length, maxLength: sides.length },
          ),
          { minLength: depths.length, maxLength: depths.length },
        )
        .map((values) => [
          ['depth cm', ...sides.map(num)],
          ...depths.map((d, i) => [num(d), ...(values[i] as number[]).map(num)]),
        ]),
    );

const scatterTable = fc
  .tuple(increasing(0.5, 5, 0.1, 8), fc.boolean(), fc.boolean())
  .chain(([sides, withPsf, withHeader]) =>
    fc
      .array(
        fc.tuple(
          fc.double({ min: 0.51, max: 1.5, noNaN: true }),
          fc.double({ min: 0.51, max: 1.5, noNaN: true }),
          fc.double({ min: 1, max: 1.3, noNaN: true }),
        ),
        { minLength: sides.length, maxLength: sides.length },
      )
      .map((factors) => {
        const rows = sides.map((s, i) => {
          const [sc, sp, psf] = factors[i] as [number, number, number];
          return withPsf ? [num(s), num(sc), num(sp), num(psf)] : [num(s), num(sc), num(sp)];
        });
        return withHeader
          ? [withPsf ? ['field cm', 'S_c', 'S_p', 'PSF'] : ['field cm', 'S_c', 'S_p'], ...rows]
          : rows;
      }),
  );

/** A valid table with valid options. */
export const validTableSpec: fc.Arbitrary<TableSpec> = fc
  .constantFrom<DepthTableKind>('tmr', 'pdd')
  .chain((kind) =>
    fc.record(
      {
        kind: fc.constant(kind),
        rows: matrix(kind),
        delimiter: fc.constantFrom<TableSpec['delimiter']>(',', ';', '\t'),
        comments: fc.integer({ min: 0, max: 2 }),
        bom: fc.boolean(),
        ssdCm: kind === 'pdd' ? fc.double({ min: 60, max: 150, noNaN: true }) : fc.constant(100),
        dMaxCm: fc.double({ min: 0.1, max: 9.9, noNaN: true }),
        referenceDosePerMuCGy: fc.double({ min: 0.5, max: 1.5, noNaN: true }),
        scatterRows: scatterTable,
      },
      { requiredKeys: ['kind', 'rows', 'delimiter', 'comments', 'bom', 'ssdCm'] },
    ),
  );

/** The CSV text of a table and the 1-based file line of each of its rows. */
export function renderTable(spec: TableSpec): { csv: string; lineOfRow: number[] } {
  const lines: string[] = [];
  for (let i = 0; i < spec.comments; i++) lines.push(`# comment ${i + 1}`);
  const lineOfRow = spec.rows.map((cells) => {
    lines.push(cells.join(spec.delimiter));
    return lines.length;
  });
  return { csv: (spec.bom ? '\uFEFF' : '') + lines.join('\n') + '\n', lineOfRow };
}

/** The import input of a table spec. */
export function inputOf(spec: TableSpec): MeasuredTableInput {
  return {
    kind: spec.kind,
    fileName: 'fuzz-table.csv',
    csv: renderTable(spec).csv,
    ssdCm: spec.ssdCm,
    dMaxCm: spec.dMaxCm,
    referenceDosePerMuCGy: spec.referenceDosePerMuCGy,
    ...(spec.scatterRows
      ? {
          scatterFileName: 'fuzz-scatter.csv',
          scatterCsv: spec.scatterRows.map((r) => r.join(',')).join('\n'),
        }
      : {}),
  };
}

/** Cell texts no table may accept where a number in range is needed. */
export const badCell = fc.oneof(
  fc.constantFrom(
    '',
    'abc',
    'NaN',
    'Infinity',
    '-Infinity',
    '1e999',
    '-1e999',
    '-1',
    '0',
    '0x10',
    '1.2.3',
    '—',
    '<img src=x>',
    '"',
  ),
  fc
    .string({ minLength: 1, maxLength: 6 })
    .filter((s) => !/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(s.trim())),
);

export type Breakage =
  /** A cell of the matrix made unreadable or out of range: a problem must name its file line. */
  | { kind: 'cell'; spec: TableSpec; line: number }
  /** A row that lost or gained a cell: a problem must name its file line. */
  | { kind: 'ragged'; spec: TableSpec; line: number }
  /** Something else (options, too few rows, empty): only "some problem" is required. */
  | { kind: 'other'; spec: TableSpec };

function withRows(spec: TableSpec, rows: string[][]): TableSpec {
  return { ...spec, rows };
}

/** A valid table with one thing broken, and where the problem must be reported. */
export const brokenTable: fc.Arbitrary<Breakage> = fc
  .tuple(validTableSpec, fc.nat(), fc.nat(), badCell, fc.integer({ min: 0, max: 7 }))
  .map(([spec, r, c, bad, how]): Breakage => {
    const rows = spec.rows.map((row) => [...row]);
    const row = r % rows.length;
    const col = c % (rows[0] as string[]).length;
    const line = renderTable(spec).lineOfRow[row] as number;
    switch (how) {
      case 0:
      case 1: {
        // A value (or depth, or header field size) that is not a number in range. The header's
        // label cell (row 0, column 0) is free text, so it is never the broken cell.
        const target = row === 0 && col === 0 ? 1 : col;
        const cells = rows[row] as string[];
        // A bad cell must not contain the delimiter, a quote or a newline (that would change the
        // row's shape, which is the "ragged" case).
        // A cell starting with "#" in the first column would turn the row into a comment.
        let text = /[,;\t"\n\r]/.test(bad) || bad.trim().startsWith('#') ? 'x' : bad;
        // Depth 0 is valid in the first data row.
        if (row === 1 && target === 0 && Number(text) === 0 && text.trim() !== '') text = '-1';
        cells[target] = text;
        return { kind: 'cell', spec: withRows(spec, rows), line };
      }
      case 2: {
        if (row === 0) return { kind: 'other', spec: { ...spec, rows: rows.slice(0, 1) } };
        (rows[row] as string[]).pop();
        return { kind: 'ragged', spec: withRows(spec, rows), line };
      }
      case 3: {
        if (row === 0) return { kind: 'other', spec: withRows(spec, []) };
        (rows[row] as string[]).push('1');
        return { kind: 'ragged', spec: withRows(spec, rows), line };
      }
      case 4: {
        // Depths out of order: the row copies its predecessor's depth.
        if (row < 2) return { kind: 'other', spec: { ...spec, dMaxCm: -1 } };
        (rows[row] as string[])[0] = (rows[row - 1] as string[])[0] as string;
        return { kind: 'cell', spec: withRows(spec, rows), line };
      }
      case 5:
        return spec.kind === 'pdd'
          ? { kind: 'other', spec: { ...spec, ssdCm: bad === '' ? 0 : Number.NaN } }
          : { kind: 'other', spec: { ...spec, referenceDosePerMuCGy: 11 } };
      case 6:
        return { kind: 'other', spec: { ...spec, dMaxCm: 10 + row } };
      default: {
        const scatter = (spec.scatterRows ?? [['5', '1', '1']]).map((x) => [...x]);
        const last = scatter[scatter.length - 1] as string[];
        last[1] = '2'; // S_c outside (0.5, 1.5]
        return { kind: 'other', spec: { ...spec, scatterRows: scatter } };
      }
    }
  });

/** Arbitrary text as a table: mostly rejected, occasionally a tiny valid table. */
export const randomTableText = fc.oneof(
  fc.string({ maxLength: 200 }),
  fc
    .array(
      fc.array(fc.oneof(fc.double().map(String), fc.string({ maxLength: 4 })), {
        maxLength: 5,
      }),
      { maxLength: 6 },
    )
    .map((rows) => rows.map((r) => r.join(',')).join('\n')),
);
