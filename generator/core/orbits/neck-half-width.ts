// Half-width of the opening of the zero-velocity curve at x = x(L1): the largest |y| from the axis
// with 2Ω(x_L1, y) ≥ C (Szebehely 1967, ch. 4). Zero when the neck is closed (C ≥ C_L1).

function twiceOmega(mu: number, x: number, y: number): number {
  return x * x + y * y + (2 * (1 - mu)) / Math.hypot(x + mu, y) + (2 * mu) / Math.hypot(x - 1 + mu, y);
}

export function neckHalfWidth(mu: number, xL1: number, jacobi: number): number {
  if (twiceOmega(mu, xL1, 0) <= jacobi) return 0;
  let inside = 0;
  let step = 1e-3;
  let outside = step;
  while (twiceOmega(mu, xL1, outside) > jacobi) {
    inside = outside;
    step *= 1.5;
    outside += step;
    if (outside > 2) return 2; // the curve does not close near the neck: treat the whole line as open
  }
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (inside + outside);
    if (twiceOmega(mu, xL1, mid) > jacobi) inside = mid;
    else outside = mid;
  }
  return inside;
}
