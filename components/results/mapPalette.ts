/**
 * Ketbook's palette for the Hamiltonian map: log10|H_IJ| from pale ket-blue (small) through
 * the action blue to ink (large); an exact zero is warm sand, so that a value that is merely
 * tiny (rounding noise in a Brillouin block) never looks like a Slater–Condon zero.
 */
export type Rgb = [number, number, number];

export const ZERO_COLOUR: Rgb = [243, 233, 210];
const STOPS: Rgb[] = [
  [238, 243, 251],
  [157, 179, 221],
  [59, 94, 168],
  [38, 63, 116],
  [28, 35, 51],
];
/** Decades the colour ramp spans below the largest element. */
export const MAP_DECADES = 12;

export interface LogRange {
  /** log10 of the ramp's top (≥ the largest |H_IJ|). */
  top: number;
  bottom: number;
}

export function logRange(matrix: ArrayLike<number>): LogRange {
  let largest = 0;
  for (let i = 0; i < matrix.length; i++) largest = Math.max(largest, Math.abs(matrix[i]));
  const top = largest > 0 ? Math.ceil(Math.log10(largest)) : 0;
  return { top, bottom: top - MAP_DECADES };
}

/** Position 0…1 on the ramp of a non-zero value; values below the ramp sit at 0. */
export function rampPosition(value: number, range: LogRange): number {
  const t = (Math.log10(Math.abs(value)) - range.bottom) / (range.top - range.bottom);
  return Math.min(1, Math.max(0, t));
}

export function rampColour(t: number): Rgb {
  const x = Math.min(1, Math.max(0, t)) * (STOPS.length - 1);
  const k = Math.min(STOPS.length - 2, Math.floor(x));
  const f = x - k;
  const a = STOPS[k];
  const b = STOPS[k + 1];
  return [0, 1, 2].map((c) => Math.round(a[c] + f * (b[c] - a[c]))) as Rgb;
}

export function colourOf(value: number, range: LogRange): Rgb {
  return value === 0 ? ZERO_COLOUR : rampColour(rampPosition(value, range));
}

export function cssColour([r, g, b]: Rgb): string {
  return `rgb(${r}, ${g}, ${b})`;
}

/** The map's block labels: the excitation level relative to the reference. */
export function levelLabel(level: number): string {
  return level === 0 ? 'ref' : `${level}×`;
}
