// Compact SVG path text from interleaved x, y pairs (one decimal: a tenth of a pixel is plenty).

const r1 = (v: number) => Math.round(v * 10) / 10;

export function polylinePath(xy: ArrayLike<number>): string {
  if (xy.length < 2) return '';
  let d = `M${r1(xy[0])} ${r1(xy[1])}`;
  for (let i = 2; i < xy.length; i += 2) d += `L${r1(xy[i])} ${r1(xy[i + 1])}`;
  return d;
}

export { r1 as roundTenth };
