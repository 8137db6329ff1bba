import type { OrbitRow } from '../../catalog-db/types.ts';

/** The members nearest an arclength along the family on either side (either may be the member at it). */
export function membersBeside(members: readonly OrbitRow[], arclength: number): { before?: OrbitRow; after?: OrbitRow } {
  let before: OrbitRow | undefined;
  let after: OrbitRow | undefined;
  for (const o of members) {
    if (o.arclength <= arclength && (!before || o.arclength > before.arclength)) before = o;
    if (o.arclength >= arclength && (!after || o.arclength < after.arclength)) after = o;
  }
  return { before, after };
}
