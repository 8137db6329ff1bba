// A CR3BP state from the command line: x,y,z,vx,vy,vz (spatial) or x,y,vx,vy (planar), nondimensional.
import { distanceToPrimary, distanceToSecondary } from '../core/propagation/primary-distances.ts';
import { formatNumber } from '../config/format-value.ts';
import { UsageError } from '../errors/usage-error.ts';
import { readNumber } from './parse-number.ts';

const STATE_FORMS = 'x,y,z,vx,vy,vz, or x,y,vx,vy for a planar state';

/** Parses the numbers and refuses a position closer than collisionRadiusNd to either primary. */
export function parseState(option: string, text: string, mu: number, collisionRadiusNd: number): number[] {
  const parts = text.split(',');
  if (parts.length !== 4 && parts.length !== 6) {
    throw new UsageError(`${option}: ${parts.length} number(s) given, need 6 or 4 (${STATE_FORMS})`);
  }
  const state = parts.map((part, i) => {
    const value = readNumber(part);
    if (value === null) throw new UsageError(`${option}: item ${i + 1} "${part.trim()}" is not a finite number (${STATE_FORMS})`);
    return value;
  });
  const planar = state.length === 4;
  const position = [state[0], state[1], planar ? 0 : state[2]];
  const bodies = [
    { name: 'larger primary at (-mu, 0, 0)', distance: distanceToPrimary(mu, position) },
    { name: 'smaller primary at (1-mu, 0, 0)', distance: distanceToSecondary(mu, position) },
  ];
  for (const body of bodies) {
    if (body.distance < collisionRadiusNd) {
      throw new UsageError(
        `${option}: the position lies on the ${body.name} (distance ${formatNumber(body.distance)}, must be at least ${formatNumber(collisionRadiusNd)})`,
      );
    }
  }
  return state;
}
