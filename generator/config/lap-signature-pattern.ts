// Parses a lap signature such as "E2M1" with a system's own body letters (see DESIGN.md, "lap signature").

/** n and m of "<P>n<S>m", or null if the text does not match or a count is outside 1..maxLaps. */
export function parseLapSignature(
  signature: string,
  primaryLetter: string,
  secondaryLetter: string,
  maxLaps: number,
): { primaryLaps: number; secondaryLaps: number } | null {
  const match = new RegExp(`^${primaryLetter}([1-9]\\d*)${secondaryLetter}([1-9]\\d*)$`).exec(signature);
  if (match === null) return null;
  const primaryLaps = Number(match[1]);
  const secondaryLaps = Number(match[2]);
  if (primaryLaps > maxLaps || secondaryLaps > maxLaps) return null;
  return { primaryLaps, secondaryLaps };
}
