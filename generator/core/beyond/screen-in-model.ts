// Screening of a CR3BP orbit in a model closer to the real Earth–Moon system: the bicircular model (Sun) or
// the elliptic model (lunar eccentricity). The orbit's start state is propagated in the other model for a
// fixed span, once per phase of the perturbation (Sun angle θ0 = 2πk/N, or the Moon's true anomaly
// f0 = 2πk/N), and each period is judged on the lap signature:
//  - a "period" is the stretch between successive returns to the start section (y = 0, ẏ with the start's
//    sign, x on the start's segment; one return = as many section crossings as the CR3BP orbit makes in one
//    period), so that a perturbed orbit whose period drifts is still judged lap by lap;
//  - laps are counted over that stretch with the rules of orbits/lap-signature.ts (x < −μ and ẏ < 0: a lap
//    of the larger primary; x > 1 − μ and ẏ > 0: a lap of the smaller one), the start crossing once;
//  - a period breaks when its counts differ from the CR3BP orbit's (or already exceed them mid-way), when no
//    return comes within returnTimeFactor periods, or when the run hits a body or the integrator gives up.
// A phase stops at its first broken period (terminal observer). The departure from the CR3BP orbit is
// measured at each return in the section plane (x, ẋ), against the fixed point (x0, ẋ0) of the CR3BP
// return map: the same plane and the same nondimensional units as the hold radius, so the two compare
// directly (a departure well inside the hold radius keeps the orbit inside its CR3BP stability region).
// Position-only and velocity-only departures are returned besides, for conversion to km and km/s.
// Independent variable: time for the bicircular model; the true anomaly for the elliptic one, whose spans
// and periods are then in units of f (f advances 2π per anomalistic month, t by 2π per sidereal month).
import { spatialEquations } from '../cr3bp/equations-spatial.ts';
import { assertMassRatio } from '../cr3bp/lagrange-points.ts';
import type { Rhs } from '../dop853/workspace.ts';
import { countLaps, type LapCounts } from '../cr3bp/lap-signature.ts';
import { AxisCrossingWatch } from './axis-crossing-watch.ts';
import { bicircularEquations } from './bicircular-equations.ts';
import { bicircularParameters, type BicircularParameters } from './bicircular-parameters.ts';
import { ellipticEquations } from './elliptic-equations.ts';
import { ellipticInitialState } from './elliptic-initial-state.ts';
import { LUNAR_ECCENTRICITY } from './model-constants.ts';
import { referencePeriod } from './reference-period.ts';
import { runWithAxisCrossings } from './run-with-axis-crossings.ts';
import { isOnSection } from './start-section.ts';

export type ScreeningModel = 'bicircular' | 'elliptic';

export interface ScreeningOptions {
  model: ScreeningModel;
  mu: number;
  /** CR3BP start state (x, y, z, ẋ, ẏ, ż) on y = 0. */
  state0: ArrayLike<number>;
  /** CR3BP period of the orbit. */
  periodNd: number;
  /** Lap signature the orbit keeps in the CR3BP (checked against one CR3BP period). */
  laps: LapCounts;
  /** Length of each run (time, or true anomaly for the elliptic model). */
  spanNd: number;
  /** Phases of the perturbation, evenly spaced over 2π (default 8). */
  phasesCount?: number;
  /** Tolerances of DOP853 (default 1e-10 both). */
  rtol?: number;
  atol?: number;
  /** Sun of the bicircular model (default bicircularParameters(); sunPhaseRad is set per phase). */
  sun?: Partial<Omit<BicircularParameters, 'sunPhaseRad'>>;
  /** Eccentricity of the elliptic model (default LUNAR_ECCENTRICITY, 0.0549). */
  eccentricity?: number;
  /** A step ending closer than this to a body's centre is an impact (default 1e-9: the centres only). */
  primaryRadiusNd?: number;
  secondaryRadiusNd?: number;
  /** A period with no return to the start section within this many CR3BP periods breaks (default 1.5). */
  returnTimeFactor?: number;
}

export type BreakReason = 'laps' | 'no-return' | 'impact-primary' | 'impact-secondary' | 'integration-error';

export interface ScreenedPeriod {
  /** End of the period (time of the return, or of the break), counted from the start of the run. */
  endNd: number;
  primaryLaps: number;
  secondaryLaps: number;
  holds: boolean;
  /** Section-plane distance √((x − x0)² + (ẋ − ẋ0)²) at the return; NaN for a period without return. */
  departureNd: number;
}

export interface PhaseScreening {
  /** θ0 (bicircular) or f0 (elliptic). */
  phaseRad: number;
  /** No period broke within the span. */
  survived: boolean;
  /** Whole periods completed with the CR3BP signature. */
  periodsHeld: number;
  /** 1-based number of the first broken period, or null. */
  firstBrokenPeriod: number | null;
  breakReason: BreakReason | null;
  breakAtNd: number | null;
  /** Largest √((x − x0)² + (ẋ − ẋ0)²) over the returns of the periods that held (0 if none). */
  maxDepartureNd: number;
  /** Largest √((x − x0)² + (z − z0)²) over the same returns. */
  maxPositionDepartureNd: number;
  /** Largest |(ẋ − ẋ0, ẏ − ẏ0, ż − ż0)| over the same returns. */
  maxVelocityDepartureNd: number;
  periods: ScreenedPeriod[];
}

export interface ScreeningResult {
  model: ScreeningModel;
  /** The perturbation used (the Sun for the bicircular model with sunPhaseRad 0; e for the elliptic one). */
  sun: BicircularParameters | null;
  eccentricity: number | null;
  sectionCrossingsPerPeriod: number;
  phases: PhaseScreening[];
  /** Share of phases that survived the whole span. */
  survivingFraction: number;
}

function checkPositive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(`${name} must be a positive finite number, got ${value}`);
}

export function screenInModel(options: ScreeningOptions): ScreeningResult {
  const { model, mu, state0, periodNd, laps, spanNd } = options;
  if (model !== 'bicircular' && model !== 'elliptic') throw new RangeError(`model must be "bicircular" or "elliptic", got "${model}"`);
  assertMassRatio(mu);
  checkPositive('periodNd', periodNd);
  checkPositive('spanNd', spanNd);
  const phasesCount = options.phasesCount ?? 8;
  if (!Number.isInteger(phasesCount) || phasesCount < 1 || phasesCount > 4096) {
    throw new RangeError(`phasesCount must be an integer in [1, 4096], got ${phasesCount}`);
  }
  const tolerance = { rtol: options.rtol ?? 1e-10, atol: options.atol ?? 1e-10 };
  checkPositive('rtol', tolerance.rtol);
  checkPositive('atol', tolerance.atol);
  const returnTimeFactor = options.returnTimeFactor ?? 1.5;
  if (!(returnTimeFactor > 1) || !Number.isFinite(returnTimeFactor)) {
    throw new RangeError(`returnTimeFactor must be a finite number > 1, got ${returnTimeFactor}`);
  }
  const primaryRadiusNd = options.primaryRadiusNd ?? 1e-9;
  const secondaryRadiusNd = options.secondaryRadiusNd ?? 1e-9;
  checkPositive('primaryRadiusNd', primaryRadiusNd);
  checkPositive('secondaryRadiusNd', secondaryRadiusNd);

  for (const key of ['primaryLaps', 'secondaryLaps'] as const) {
    if (!Number.isInteger(laps?.[key]) || laps[key] < 0) throw new RangeError(`laps.${key} must be an integer ≥ 0, got ${laps?.[key]}`);
  }
  const eccentricity = model === 'elliptic' ? options.eccentricity ?? LUNAR_ECCENTRICITY : null;
  if (eccentricity !== null && !(eccentricity >= 0 && eccentricity < 1)) throw new RangeError(`eccentricity must be in [0, 1), got ${eccentricity}`);
  const sun = model === 'bicircular' ? bicircularParameters({ ...options.sun, sunPhaseRad: 0 }) : null;

  const reference = referencePeriod(mu, state0, periodNd, tolerance);
  if (reference.laps.primaryLaps !== laps.primaryLaps || reference.laps.secondaryLaps !== laps.secondaryLaps) {
    throw new RangeError(`laps: the CR3BP orbit makes ${reference.laps.primaryLaps} + ${reference.laps.secondaryLaps} laps per period, `
      + `not the ${laps.primaryLaps} + ${laps.secondaryLaps} given`);
  }
  const section = reference.section;
  const perReturn = reference.sectionCrossingsPerPeriod;

  const rhsFor = (phaseRad: number): Rhs => (sun ? bicircularEquations(mu, { ...sun, sunPhaseRad: phaseRad }) : ellipticEquations(mu, eccentricity!));

  const phases: PhaseScreening[] = [];
  for (let k = 0; k < phasesCount; k++) {
    const phaseRad = (2 * Math.PI * k) / phasesCount;
    // The elliptic model runs in f from f0; the bicircular one in t from 0 with the Sun at θ0.
    const t0 = sun ? 0 : phaseRad;
    const start = sun ? Float64Array.from(state0) : ellipticInitialState(state0, eccentricity!, phaseRad).stateNd;
    const result: PhaseScreening = {
      phaseRad, survived: false, periodsHeld: 0, firstBrokenPeriod: null, breakReason: null, breakAtNd: null,
      maxDepartureNd: 0, maxPositionDepartureNd: 0, maxVelocityDepartureNd: 0, periods: [],
    };
    const startLaps = countLaps(mu, [{ x: section.x0, vy: section.vy0 }]);
    let primary = startLaps.primaryLaps;
    let secondary = startLaps.secondaryLaps;
    let sectionHits = 0;
    const closeWindow = (tNd: number, holds: boolean, departureNd: number) => {
      result.periods.push({ endNd: tNd - t0, primaryLaps: primary, secondaryLaps: secondary, holds, departureNd });
    };
    const breakHere = (tNd: number, reason: BreakReason) => {
      result.firstBrokenPeriod = result.periodsHeld + 1;
      result.breakReason = reason;
      result.breakAtNd = tNd - t0;
    };
    const watch = new AxisCrossingWatch(mu, primaryRadiusNd, secondaryRadiusNd, (t, s) => {
      const onSection = isOnSection(section, s);
      if (onSection && ++sectionHits % perReturn === 0) {
        // A return: judge the period it closes (the return crossing itself opens the next one).
        const dx = s[0] - section.x0, dz = s[2] - section.z0;
        const dvx = s[3] - section.vx0, dvy = s[4] - section.vy0, dvz = s[5] - section.vz0;
        const departure = Math.hypot(dx, dvx);
        const holds = primary === laps.primaryLaps && secondary === laps.secondaryLaps;
        closeWindow(t, holds, departure);
        if (!holds) {
          breakHere(t, 'laps');
          return true;
        }
        result.periodsHeld++;
        result.maxDepartureNd = Math.max(result.maxDepartureNd, departure);
        result.maxPositionDepartureNd = Math.max(result.maxPositionDepartureNd, Math.hypot(dx, dz));
        result.maxVelocityDepartureNd = Math.max(result.maxVelocityDepartureNd, Math.hypot(dvx, dvy, dvz));
        primary = startLaps.primaryLaps;
        secondary = startLaps.secondaryLaps;
        watch.deadlineNd = t + returnTimeFactor * periodNd;
        return false;
      }
      const lap = countLaps(mu, [{ x: s[0], vy: s[4] }]);
      primary += lap.primaryLaps;
      secondary += lap.secondaryLaps;
      if (primary > laps.primaryLaps || secondary > laps.secondaryLaps) {
        closeWindow(t, false, NaN);
        breakHere(t, 'laps');
        return true;
      }
      return false;
    });
    const run = runWithAxisCrossings(rhsFor(phaseRad), start, t0, t0 + spanNd, tolerance, watch, t0 + returnTimeFactor * periodNd);
    if (run.stop !== 'end' && run.stop !== 'handler') {
      const reason: BreakReason = run.stop === 'deadline' ? 'no-return' : run.stop;
      closeWindow(run.tFinalNd, false, NaN);
      breakHere(run.tFinalNd, reason);
    }
    result.survived = result.firstBrokenPeriod === null;
    phases.push(result);
  }
  return {
    model, sun, eccentricity, sectionCrossingsPerPeriod: perReturn, phases,
    survivingFraction: phases.filter((p) => p.survived).length / phasesCount,
  };
}
