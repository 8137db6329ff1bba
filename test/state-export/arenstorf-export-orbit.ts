// The Arenstorf orbit of Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.0, as a state-export orbit,
// with the Earth–Moon length and time units of DESIGN.md (common practice).
import type { ExportOrbit } from '../../generator/core/state-export/export-orbit.ts';
import { ARENSTORF } from '../site/site-test-catalog.ts';

export const ARENSTORF_ORBIT: ExportOrbit = {
  orbitId: 'test/arenstorf/0000', seq: 0, familyId: 'test/arenstorf', familyName: 'Arenstorf', signature: 'E1M1',
  systemId: 'hnw', systemName: 'Earth–Moon (HNW μ)', primaryName: 'Earth', secondaryName: 'Moon',
  mu: ARENSTORF.mu, lengthUnitKm: 384_400, timeUnitS: 375_190.262, periodNd: ARENSTORF.periodNd,
  state0: [ARENSTORF.x0, 0, 0, 0, ARENSTORF.vy0, 0], tolerance: { rtol: 1e-12, atol: 1e-12 },
};
