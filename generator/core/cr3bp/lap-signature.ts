// Lap signature E{n}M{m} (our vocabulary, see DESIGN.md): over one period, n passes across the x-axis on the
// far side of the larger primary going with ẏ < 0, and m on the far side of the smaller one with ẏ > 0.

export interface AxisCrossing {
  x: number;
  vy: number;
}

export interface LapCounts {
  primaryLaps: number;
  secondaryLaps: number;
}

/** Counts laps from every crossing of y = 0 over exactly one period (the start point included once). */
export function countLaps(mu: number, crossings: readonly AxisCrossing[]): LapCounts {
  let primaryLaps = 0;
  let secondaryLaps = 0;
  for (const c of crossings) {
    if (c.x < -mu && c.vy < 0) primaryLaps++;
    else if (c.x > 1 - mu && c.vy > 0) secondaryLaps++;
  }
  return { primaryLaps, secondaryLaps };
}

export function formatSignature(primaryLetter: string, secondaryLetter: string, laps: LapCounts): string {
  return `${primaryLetter}${laps.primaryLaps}${secondaryLetter}${laps.secondaryLaps}`;
}

/** Parses "E2M1" into lap counts, given the system's letters; null when it does not match. */
export function parseSignature(signature: string, primaryLetter: string, secondaryLetter: string): LapCounts | null {
  const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const match = new RegExp(`^${escape(primaryLetter)}(\\d+)${escape(secondaryLetter)}(\\d+)$`).exec(signature);
  if (!match) return null;
  return { primaryLaps: Number(match[1]), secondaryLaps: Number(match[2]) };
}
