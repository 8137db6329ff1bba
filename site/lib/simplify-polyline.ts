// Ramer–Douglas–Peucker simplification (Ramer 1972; Douglas & Peucker 1973) of a polyline given as
// interleaved x, y pairs: keeps the points that bend the line by more than `tolerance` (same units).

export function simplifyPolyline(xy: ArrayLike<number>, tolerance: number): number[] {
  const n = xy.length / 2;
  if (n <= 2) return Array.from(xy);
  const keep = new Uint8Array(n);
  keep[0] = 1;
  keep[n - 1] = 1;
  const tol2 = tolerance * tolerance;
  const stack: number[] = [0, n - 1];
  while (stack.length > 0) {
    const last = stack.pop()!;
    const first = stack.pop()!;
    const ax = xy[2 * first], ay = xy[2 * first + 1];
    const dx = xy[2 * last] - ax, dy = xy[2 * last + 1] - ay;
    const len2 = dx * dx + dy * dy;
    let worst = -1;
    let worstD2 = tol2;
    for (let i = first + 1; i < last; i++) {
      const px = xy[2 * i] - ax, py = xy[2 * i + 1] - ay;
      let d2: number;
      if (len2 === 0) d2 = px * px + py * py;
      else {
        const cross = px * dy - py * dx;
        d2 = (cross * cross) / len2;
      }
      if (d2 > worstD2) {
        worstD2 = d2;
        worst = i;
      }
    }
    if (worst >= 0) {
      keep[worst] = 1;
      stack.push(first, worst, worst, last);
    }
  }
  const out: number[] = [];
  for (let i = 0; i < n; i++) if (keep[i]) out.push(xy[2 * i], xy[2 * i + 1]);
  return out;
}
