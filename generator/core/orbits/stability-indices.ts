// Stability indices from a 6×6 monodromy matrix of a planar periodic orbit (Hénon 1973, A&A 28):
// in-plane ν = (tr M_plane − 2)/2 = (λ + 1/λ)/2 over the (x, y, vx, vy) block (the block has the
// eigenvalue pair 1, 1 besides λ, 1/λ), vertical ν_z = tr M_z / 2 over the (z, vz) block.

export interface StabilityIndices {
  inPlane: number;
  vertical: number;
}

export function stabilityIndices(monodromy: ArrayLike<number>): StabilityIndices {
  const m = (i: number, j: number) => monodromy[6 * i + j];
  const planeTrace = m(0, 0) + m(1, 1) + m(3, 3) + m(4, 4);
  return { inPlane: (planeTrace - 2) / 2, vertical: (m(2, 2) + m(5, 5)) / 2 };
}

/** The reciprocal eigenvalue pair with (λ + 1/λ)/2 = ν, as [re, im]. */
export function eigenvaluePair(index: number): Array<[number, number]> {
  if (Math.abs(index) >= 1) {
    const root = Math.sqrt(index * index - 1);
    const big = index >= 0 ? index + root : index - root;
    return [[big, 0], [1 / big, 0]];
  }
  const im = Math.sqrt(1 - index * index);
  return [[index, im], [index, -im]];
}
