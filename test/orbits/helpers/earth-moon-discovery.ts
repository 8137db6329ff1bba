// The Earth–Moon discovery request and corrector settings the single-edge discovery tests share: the
// generator's loose scan tolerance (signs only), far sides out to 1.2, a 20-unit half-period limit.
import { lagrangePoints } from '../../../generator/core/cr3bp/lagrange-points.ts';
import type { CorrectorOptions } from '../../../generator/core/orbits/correct-on-arc.ts';
import type { DiscoveryRequest } from '../../../generator/core/orbits/discovery/discover-candidates.ts';
import { EARTH_MOON } from './earth-moon-jobs.ts';

export const EARTH_MOON_XL1 = lagrangePoints(EARTH_MOON.mu)[0]!.x;

export const TIGHT_CORRECTOR: CorrectorOptions = { rtol: 1e-12, atol: 1e-12, maxTimeNd: 40, residualTolerance: 2e-11, maxIterations: 12 };

export function earthMoonDiscoveryRequest(
  at: Pick<DiscoveryRequest, 'segment' | 'direction' | 'gridPoints' | 'levels' | 'maxHalfCrossings'>,
): DiscoveryRequest {
  return {
    mu: EARTH_MOON.mu, ...at, rtol: 1e-10, atol: 1e-10, maxHalfTimeNd: 20,
    primaryRadiusNd: EARTH_MOON.primaryRadiusKm / EARTH_MOON.lengthUnitKm, secondaryRadiusNd: EARTH_MOON.secondaryRadiusKm / EARTH_MOON.lengthUnitKm,
    xL1: EARTH_MOON_XL1, reachNd: 1.2,
  };
}
