/**
 * A sequential colour scale for vertex values: five stops of matplotlib's "viridis" map
 * (S. van der Walt and N. Smith, 2015; stop values from memory), linearly interpolated in RGB.
 * Ordered from dark to light and readable by colour-blind readers.
 */
const STOPS: ReadonlyArray<readonly [number, number, number]> = [
  [0x44, 0x01, 0x54],
  [0x3b, 0x52, 0x8b],
  [0x21, 0x91, 0x8c],
  [0x5e, 0xc9, 0x62],
  [0xfd, 0xe7, 0x25],
];

function hex(c: number): string {
  return Math.round(c).toString(16).padStart(2, '0');
}

/** The colour at t in [0, 1] (clamped). */
export function sequentialColour(t: number): string {
  const u = Math.min(1, Math.max(0, Number.isFinite(t) ? t : 1)) * (STOPS.length - 1);
  const i = Math.min(STOPS.length - 2, Math.floor(u));
  const f = u - i;
  const [a, b] = [STOPS[i], STOPS[i + 1]];
  return `#${hex(a[0] + (b[0] - a[0]) * f)}${hex(a[1] + (b[1] - a[1]) * f)}${hex(a[2] + (b[2] - a[2]) * f)}`;
}

/** Whether text on this background should be white (dark background) rather than black. */
export function needsLightText(colour: string): boolean {
  const r = parseInt(colour.slice(1, 3), 16);
  const g = parseInt(colour.slice(3, 5), 16);
  const b = parseInt(colour.slice(5, 7), 16);
  // Relative luminance weights of ITU-R BT.709.
  return 0.2126 * r + 0.7152 * g + 0.0722 * b < 128;
}
