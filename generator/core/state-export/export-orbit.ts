// What a state export needs to know of an orbit and its system, taken from the catalog's rows by one
// function, so the CLI and the orbit page (which embeds it as JSON) describe the orbit identically.
import type { Tolerance } from '../propagation/tolerance.ts';

export interface ExportOrbit {
  orbitId: string;
  seq: number;
  familyId: string;
  familyName: string;
  signature: string;
  systemId: string;
  systemName: string;
  primaryName: string;
  secondaryName: string;
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  periodNd: number;
  /** Nondimensional rotating-frame start state x, y, z, vx, vy, vz. */
  state0: number[];
  /** The integration tolerance of the catalog run that made the orbit (its provenance): the samples are as accurate as the orbit. */
  tolerance: Tolerance;
}

/** The catalog rows' fields used here (structural, so the core needs no catalog-db import). */
export interface ExportOrbitRows {
  orbit: { id: string; seq: number; signature: string; period: number; state0: ArrayLike<number> };
  family: { id: string; name: string };
  system: { id: string; name: string; primaryName: string; secondaryName: string; mu: number; lengthUnitKm: number; timeUnitS: number };
  run: Tolerance;
}

export function exportOrbitOf({ orbit, family, system, run }: ExportOrbitRows): ExportOrbit {
  return {
    orbitId: orbit.id,
    seq: orbit.seq,
    familyId: family.id,
    familyName: family.name,
    signature: orbit.signature,
    systemId: system.id,
    systemName: system.name,
    primaryName: system.primaryName,
    secondaryName: system.secondaryName,
    mu: system.mu,
    lengthUnitKm: system.lengthUnitKm,
    timeUnitS: system.timeUnitS,
    periodNd: orbit.period,
    state0: Array.from(orbit.state0),
    tolerance: { rtol: run.rtol, atol: run.atol },
  };
}

/**
 * Whether the Earth-centred EME2000 frame applies: the primaries are the Earth and the Moon, since that
 * frame is pinned to the real Moon. (μ is not checked: the model's μ only places the barycentre.)
 */
export function hasEarthAndMoon(orbit: Pick<ExportOrbit, 'primaryName' | 'secondaryName'>): boolean {
  return orbit.primaryName.trim().toLowerCase() === 'earth' && orbit.secondaryName.trim().toLowerCase() === 'moon';
}
