// Stacking short labels placed along an axis: each label goes to the first row where it does
// not overlap the previous label of that row, so close points of interest stay readable.

export interface PlacedLabel<T> {
  item: T;
  x: number;
  row: number;
}

/** Labels sorted by x, each with the row (0, 1, …) it fits in; width ≈ 6.5 px per character. */
export function labelRows<T>(
  items: readonly T[],
  xOf: (item: T) => number,
  textOf: (item: T) => string,
  charPx = 6.5,
  gapPx = 6,
): PlacedLabel<T>[] {
  const ends: number[] = [];
  return [...items]
    .map((item) => ({ item, x: xOf(item) }))
    .sort((a, b) => a.x - b.x)
    .map(({ item, x }) => {
      let row = ends.findIndex((end) => end + gapPx <= x);
      if (row < 0) row = ends.length;
      ends[row] = x + textOf(item).length * charPx;
      return { item, x, row };
    });
}
