// Jacobi constants of the equilibria of a system: they bound where lap-signature searches make sense.
import { lagrangePoints } from '../core/cr3bp/lagrange-points.ts';

export interface SystemJacobiBounds {
  l1: number;
  l2: number;
  l3: number;
  l4: number; // = L5
}

export function systemJacobiBounds(mu: number): SystemJacobiBounds {
  const [l1, l2, l3, l4] = lagrangePoints(mu).map((p) => p.jacobi) as [number, number, number, number];
  return { l1, l2, l3, l4 };
}
