// The initial-state download of an orbit page (built into the page as a data: link, so it needs no script).
import type { OrbitPageData } from './orbit-page-data.ts';
import { STATE_KM_KEYS } from './state-units.ts';

export function initialStateFile(page: OrbitPageData) {
  const { orbit, system, family } = page;
  return {
    orbitId: orbit.id,
    family: family.name,
    system: system.name,
    model: 'circular restricted three-body problem, rotating frame (not an ephemeris model)',
    mu: system.mu,
    lengthUnitKm: system.lengthUnitKm,
    timeUnitS: system.timeUnitS,
    state0Nd: { x: page.state0Nd[0], y: page.state0Nd[1], z: page.state0Nd[2], vx: page.state0Nd[3], vy: page.state0Nd[4], vz: page.state0Nd[5] },
    state0Km: Object.fromEntries(STATE_KM_KEYS.map((key, k) => [key, [...page.state0Km.positionKm, ...page.state0Km.velocityKmS][k]])),
    periodNd: page.periodNd,
    periodDays: page.periodDays,
    jacobi: orbit.jacobi,
  };
}
