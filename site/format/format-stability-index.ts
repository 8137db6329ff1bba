// The one rule for showing a stability index (in-plane ν, vertical ν_z) in the finder, on family and orbit
// pages and in chart tooltips: 6 significant digits, and more where fewer would move the value onto or
// across ±1. |ν| < 1 (linearly stable) must never read as ±1 or beyond, and |ν| > 1 never as ±1 or
// within: −0.9999999964 reads "-0.9999999964", not "-1". Only an index that is exactly ±1 reads ±1.
import { formatSig } from './format-number.ts';

export const INDEX_DIGITS = 6;
const MAX_DIGITS = 17; // enough for any double to read back exactly

/** −1, 0 or +1: inside, on or outside the stable band |ν| < 1. */
const sideOfOne = (nu: number) => Math.sign(Math.abs(nu) - 1);

/** The fewest significant digits (at least INDEX_DIGITS) whose rounding keeps ν on its side of ±1. */
export function stabilityIndexDigits(nu: number): number {
  if (!Number.isFinite(nu)) return INDEX_DIGITS;
  let digits = INDEX_DIGITS;
  while (digits < MAX_DIGITS && sideOfOne(Number(nu.toPrecision(digits))) !== sideOfOne(nu)) digits++;
  return digits;
}

export function formatStabilityIndex(nu: number | null | undefined): string {
  if (nu === null || nu === undefined) return formatSig(nu);
  return formatSig(nu, stabilityIndexDigits(nu));
}
