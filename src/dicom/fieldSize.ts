// The jaw field at the isocentre plane (Leaf/Jaw Positions (300A,011C) are projected to the
// isocentre plane, PS3.3 C.8.8.14) and its size at 100 cm from the source, as a case gives it.
// Lamina's field is symmetric about the central axis: asymmetric jaws are taken as the symmetric
// field of the same size (off-axis factors are not modelled), and a field the axis does not
// cross is refused.

export interface JawField {
  /** X × Y at the isocentre plane (cm). */
  xAtIsoCm: number;
  yAtIsoCm: number;
  /** X × Y at 100 cm from the source (cm). */
  xAt100Cm: number;
  yAt100Cm: number;
  asymmetric: boolean;
}

export type JawFieldResult = { ok: true; value: JawField } | { ok: false; message: string };

export function jawField(
  x: readonly [number, number],
  y: readonly [number, number],
  sadMm: number,
): JawFieldResult {
  for (const [[a, b], axis] of [
    [x, 'X'],
    [y, 'Y'],
  ] as const) {
    if (!(b > a)) return { ok: false, message: `${axis} jaws ${a} / ${b} mm leave no opening` };
    if (a >= 0 || b <= 0)
      return {
        ok: false,
        message: `${axis} jaws ${a} / ${b} mm: the central axis is not inside the open field (half-beam or off-axis field not handled)`,
      };
  }
  const scale = 1000 / sadMm;
  const xAtIsoCm = (x[1] - x[0]) / 10;
  const yAtIsoCm = (y[1] - y[0]) / 10;
  return {
    ok: true,
    value: {
      xAtIsoCm,
      yAtIsoCm,
      xAt100Cm: xAtIsoCm * scale,
      yAt100Cm: yAtIsoCm * scale,
      asymmetric: Math.abs(x[0] + x[1]) > 1 || Math.abs(y[0] + y[1]) > 1,
    },
  };
}
