// A small valid catalog config as a plain object; the bad-config cases each change one thing in a copy.
export function validConfigObject(): Record<string, any> {
  return {
    scenario: { name: 'Test scenario', team: 'Test team (invented)', description: 'Config used by the config tests.' },
    systems: [{ preset: 'earth-moon' }, { preset: 'pluto-charon' }],
    tolerance: { rtol: 1e-12, atol: 1e-12 },
    indexTolerance: 1e-6,
    defaults: {
      limits: { maxMembers: 50, maxPeriodNd: 30, unstableStop: { indexAbove: 1000, members: 20 }, initialStepNd: 1e-3, maxStepNd: 2e-2 },
      search: { segments: ['far-primary', 'between'], directions: [1, -1], maxHalfCrossings: 6, gridPoints: 60, jacobi: [3.05, 3.1] },
    },
    families: [
      { system: 'earth-moon', signature: 'E2M1', jacobi: [3.1, 3.15] },
      { system: 'earth-moon', lyapunov: 'L1', amplitudeNd: 1e-3 },
      { system: 'earth-moon', retrograde: { distanceKm: 70000 } },
      { system: 'pluto-charon', signature: 'P1C1', jacobi: [3.3] },
    ],
  };
}
