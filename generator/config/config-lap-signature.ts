// A lap signature written in a config ("E2M1" with the system's own letters, see DESIGN.md): read by the
// core's one parser (core/orbits/lap-signature.ts), then held to the config's stricter rule. Stored orbits
// may carry a count of 0 (E0M1), but a config entry asks for cyclers, which pass both bodies at least once;
// and a count is written without leading zeros, so one family has one job key.
import { formatSignature, parseSignature, type LapCounts } from '../core/cr3bp/lap-signature.ts';

/** n and m of "<P>n<S>m", or null if the text does not match or a count is outside 1..maxLaps. */
export function parseConfigSignature(signature: string, primaryLetter: string, secondaryLetter: string, maxLaps: number): LapCounts | null {
  const laps = parseSignature(signature, primaryLetter, secondaryLetter);
  if (laps === null || formatSignature(primaryLetter, secondaryLetter, laps) !== signature) return null;
  const allowed = (count: number) => count >= 1 && count <= maxLaps;
  return allowed(laps.primaryLaps) && allowed(laps.secondaryLaps) ? laps : null;
}
