// Nondimensional CR3BP state → km and km/s (length unit LU km, time unit TU s). Runs in Node and the browser.

export interface StateKm {
  positionKm: [number, number, number];
  velocityKmS: [number, number, number];
}

export function stateToKm(state: ArrayLike<number>, lengthUnitKm: number, timeUnitS: number): StateKm {
  const v = lengthUnitKm / timeUnitS;
  return {
    positionKm: [state[0] * lengthUnitKm, state[1] * lengthUnitKm, state[2] * lengthUnitKm],
    velocityKmS: [state[3] * v, state[4] * v, state[5] * v],
  };
}
