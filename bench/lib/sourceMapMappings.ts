// Decoder of a source map's "mappings" string (Source Map Revision 3: base-64 VLQ segments, ';'
// between generated lines, ',' between segments; fields relative to the previous segment).
// Only what bench/bundleComposition.ts needs: generated column and source index per segment.

export interface MappingSegment {
  /** Generated column (0-based, UTF-16 units). */
  column: number;
  /** Index into the map's sources, when the segment has one. */
  source?: number;
}

const BASE64 = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789+/';
const DIGIT = new Map([...BASE64].map((c, i) => [c, i]));

/** The VLQ numbers of one segment. */
function decodeSegment(text: string): number[] {
  const out: number[] = [];
  let value = 0;
  let shift = 0;
  for (const c of text) {
    const d = DIGIT.get(c);
    if (d === undefined) throw new Error(`source map: bad base-64 digit '${c}'`);
    value += (d & 31) << shift;
    if (d & 32) shift += 5;
    else {
      out.push(value & 1 ? -(value >>> 1) : value >>> 1);
      value = 0;
      shift = 0;
    }
  }
  return out;
}

/** Segments per generated line. */
export function decodeMappings(mappings: string): MappingSegment[][] {
  let source = 0;
  return mappings.split(';').map((line) => {
    let column = 0;
    return line
      .split(',')
      .filter((s) => s.length > 0)
      .map((s) => {
        const f = decodeSegment(s);
        column += f[0] ?? 0;
        if (f.length < 4) return { column };
        source += f[1] ?? 0;
        return { column, source };
      });
  });
}
