// Order test for an orbit on an invariant circle (Poincaré's theory of circle homeomorphisms): an
// orientation-preserving homeomorphism of the circle keeps the cyclic order of any three points, so the
// angular successor of p_i among p_0 … p_{N−1} is, shifted by one, the successor of p_{i+1} among
// p_1 … p_N. Holds exactly for every N and every rotation number, resonant or not; an orbit filling an area
// (a chaotic layer) or circling an island off the centre scrambles the order at once.

/** Number of i in [0, N − 1] whose successor relation is broken, for angles of points p_0 … p_N. */
export function circleOrderViolations(angles: ArrayLike<number>, count: number = angles.length): number {
  const n = count - 1; // last index
  if (n < 2) return 0;
  const order = new Int32Array(count);
  for (let i = 0; i < count; i++) order[i] = i;
  order.sort((i, j) => angles[i] - angles[j]);
  const successorWithout = (skip: number): Int32Array => {
    const next = new Int32Array(count).fill(-1);
    let first = -1;
    let previous = -1;
    for (let k = 0; k < count; k++) {
      const i = order[k];
      if (i === skip) continue;
      if (previous >= 0) next[previous] = i;
      else first = i;
      previous = i;
    }
    next[previous] = first;
    return next;
  };
  const early = successorWithout(n); // among p_0 … p_{N−1}
  const late = successorWithout(0); // among p_1 … p_N
  let violations = 0;
  for (let i = 0; i < n; i++) if (late[i + 1] !== early[i] + 1) violations++;
  return violations;
}
