// Method styles: Okabe–Ito colours (distinguishable with the common colour-vision deficiencies)
// paired with a dash pattern, so curves also differ in greyscale print. Known methods keep a
// fixed style (by their place in the method registry); others take the next free one in order of
// appearance.
import { METHOD_IDS } from '../engine/methodRegistry';

export const OKABE_ITO = [
  '#000000', // black (drawn with the text colour in dark theme)
  '#E69F00', // orange
  '#56B4E9', // sky blue
  '#009E73', // bluish green
  '#D55E00', // vermillion
  '#0072B2', // blue
  '#CC79A7', // reddish purple
  '#F0E442', // yellow
] as const;

export const DASHES = ['', '8 4', '2 3', '10 3 2 3', '4 4', '12 4', '1 2', '6 2 2 2 2 2'] as const;

export interface SeriesStyle {
  color: string;
  dash: string;
}

// Yellow is hard to see on white: used last, and only with a dash pattern.
const STYLES: SeriesStyle[] = [
  { color: 'currentColor', dash: '' },
  { color: OKABE_ITO[1], dash: DASHES[1] },
  { color: OKABE_ITO[2], dash: DASHES[2] },
  { color: OKABE_ITO[3], dash: DASHES[3] },
  { color: OKABE_ITO[4], dash: DASHES[4] },
  { color: OKABE_ITO[5], dash: DASHES[5] },
  { color: OKABE_ITO[6], dash: DASHES[6] },
  { color: OKABE_ITO[5], dash: DASHES[7] },
  { color: OKABE_ITO[4], dash: '' },
  { color: OKABE_ITO[7], dash: DASHES[1] },
];

/** Style of each method id, stable for known ids. */
export function seriesStyles(ids: readonly string[]): Map<string, SeriesStyle> {
  const out = new Map<string, SeriesStyle>();
  const used = new Set<number>();
  for (const id of ids) {
    const k = (METHOD_IDS as readonly string[]).indexOf(id);
    if (k >= 0) {
      out.set(id, STYLES[k] as SeriesStyle);
      used.add(k);
    }
  }
  let next = 0;
  for (const id of ids) {
    if (out.has(id)) continue;
    while (used.has(next) && next < STYLES.length) next++;
    out.set(id, STYLES[next % STYLES.length] as SeriesStyle);
    used.add(next);
  }
  return out;
}
