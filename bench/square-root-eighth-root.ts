// For the core bench's what-if figure only: runs a computation with Math.pow(x, 1/8) served by three square
// roots (IEEE-exact, no libm call), every other power by the native pow, then puts the native back. The DOP853
// driver takes its step-size root from a swapped Math.pow (dop853/integrate.ts).
export function withSquareRootEighthRoot<T>(compute: () => T): T {
  const native = Math.pow;
  Math.pow = (x: number, y: number): number => (y === 0.125 ? Math.sqrt(Math.sqrt(Math.sqrt(x))) : native(x, y));
  try {
    return compute();
  } finally {
    Math.pow = native;
  }
}
