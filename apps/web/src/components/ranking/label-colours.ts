/** Cairn's sequential scale for labels: weathered stone for the lowest, through lichen, to slate ink at the top. */
const STOPS: readonly [number, number, number][] = [
  [0xec, 0xe6, 0xd9],
  [0xa9, 0xb9, 0xa8],
  [0x6f, 0x8a, 0x80],
  [0x1f, 0x2d, 0x2b],
];

const hex = (n: number) => Math.round(n).toString(16).padStart(2, '0');

/** The fill of label `label` (1-based) among `labelCount` labels. */
export function labelColour(label: number, labelCount: number): string {
  const t = labelCount <= 1 ? 0 : (label - 1) / (labelCount - 1);
  const x = t * (STOPS.length - 1);
  const i = Math.min(STOPS.length - 2, Math.floor(x));
  const f = x - i;
  const [a, b] = [STOPS[i]!, STOPS[i + 1]!];
  return `#${hex(a[0] + (b[0] - a[0]) * f)}${hex(a[1] + (b[1] - a[1]) * f)}${hex(a[2] + (b[2] - a[2]) * f)}`;
}

/** Dark text on light cells, light text on dark ones (the scale's lower half is light). */
export function labelInk(label: number, labelCount: number): string {
  const t = labelCount <= 1 ? 0 : (label - 1) / (labelCount - 1);
  return t < 0.5 ? '#1f2d2b' : '#f6f3ec';
}
