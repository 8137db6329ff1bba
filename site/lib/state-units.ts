// Nondimensional CR3BP state → km and km/s (length unit LU km, time unit TU s). Runs in Node and the browser.

/** Names of the six components in km and km/s, wherever a download writes them. */
export const STATE_KM_KEYS = ['xKm', 'yKm', 'zKm', 'vxKmS', 'vyKmS', 'vzKmS'] as const;
export const STATE_KM_UNITS = ['km', 'km', 'km', 'km/s', 'km/s', 'km/s'] as const;

export interface StateKm {
  positionKm: [number, number, number];
  velocityKmS: [number, number, number];
}

/** The six components in km, km/s as one list, in STATE_KM_KEYS order. */
export function stateKmList(state: ArrayLike<number>, lengthUnitKm: number, timeUnitS: number): number[] {
  const { positionKm, velocityKmS } = stateToKm(state, lengthUnitKm, timeUnitS);
  return [...positionKm, ...velocityKmS];
}

export function stateToKm(state: ArrayLike<number>, lengthUnitKm: number, timeUnitS: number): StateKm {
  const v = lengthUnitKm / timeUnitS;
  return {
    positionKm: [state[0] * lengthUnitKm, state[1] * lengthUnitKm, state[2] * lengthUnitKm],
    velocityKmS: [state[3] * v, state[4] * v, state[5] * v],
  };
}
