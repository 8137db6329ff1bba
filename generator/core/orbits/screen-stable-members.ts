// The screenings "beyond the three-body model" of a family's stable members, as catalog rows: the hold
// radius (core/beyond/hold-radius.ts) of the members pick-screened-members.ts chooses, and the Sun
// (bicircular model) and lunar-eccentricity (elliptic model) screenings (core/beyond/screen-in-model.ts)
// of every stable member inside a window. Pure numerics, synchronous; the caller reports progress.
// Spans: spanSynodicMonths × the system's synodic month, in the system's time unit. A system without a
// synodic month gets no Sun screening (said in the notes), and its eccentricity span counts the
// secondary's orbital periods (2π each) instead. The Sun is the Earth–Moon one of Simó et al. (1995) and
// the eccentricity the Moon's, 0.0549 (core/beyond/model-constants.ts), whatever the system.
// Tolerance: the catalog's own (the job's), not the core's default 1e-10: on catalog members next to a
// resonance (rotation per return near 1/5, say) the 1e-10 map drifts ~4e-10 per return, enough to scramble
// the circle order of 200 returns at the first displacement (1e-6) and report a radius of 0, where 1e-12
// holds. A step ending inside a body (its radius, not only its centre) is an impact.
import type { FamilyBundle, OrbitRow } from './family-rows.ts';
import type { HoldRadiusRow, ModelScreeningRow } from './screening-rows.ts';
import { holdRadius } from '../beyond/hold-radius.ts';
import { screenInModel, type ScreeningModel, type ScreeningResult } from '../beyond/screen-in-model.ts';
import type { ScreeningSettings, SystemSpec } from './family-job.ts';
import { parseSignature } from '../cr3bp/lap-signature.ts';
import { pickScreenedMembers } from './pick-screened-members.ts';
import type { Tolerance } from '../propagation/tolerance.ts';

const SECONDS_PER_DAY = 86400;
/** Section points kept of the outermost holding curve (every return up to 200 returns). */
const MAX_CURVE_POINTS = 200;

export interface ScreeningHooks {
  /** After each member: how many of the total are done. */
  onMember?(done: number, total: number): void;
  /** Polled before each member; true stops (the rows so far are returned, `interrupted` set). */
  shouldStop?(): boolean;
}

export interface StableMemberScreenings {
  holdRadii: HoldRadiusRow[];
  modelScreenings: ModelScreeningRow[];
  /** One-line remarks: screenings skipped, members that could not be screened. */
  notes: string[];
  interrupted: boolean;
  /** Members screened (any of the three) and members with a hold radius asked. */
  screenedCount: number;
  holdRadiusCount: number;
}

export function screenStableMembers(
  system: SystemSpec, bundle: Pick<FamilyBundle, 'family' | 'orbits' | 'stableWindows'>, settings: ScreeningSettings,
  tolerance: Tolerance, hooks: ScreeningHooks = {},
): StableMemberScreenings {
  const out: StableMemberScreenings = { holdRadii: [], modelScreenings: [], notes: [], interrupted: false, screenedCount: 0, holdRadiusCount: 0 };
  const familyId = bundle.family.id;
  const { hold, models } = plan(system, settings, familyId, out.notes);
  if (!hold && models.length === 0) return out;
  const picked = pickScreenedMembers(bundle.orbits, bundle.stableWindows, settings.holdRadius.membersPerWindow);
  const members = models.length > 0 ? picked.stable : picked.stable.filter((o) => picked.holdRadiusIds.has(o.id));
  const mu = system.mu;
  const km = system.lengthUnitKm;
  const radii = { primaryRadiusNd: system.primaryRadiusKm / km, secondaryRadiusNd: system.secondaryRadiusKm / km };
  const common = { ...radii, rtol: tolerance.rtol, atol: tolerance.atol };
  const failed: string[] = [];
  hooks.onMember?.(0, members.length);
  for (const [index, orbit] of members.entries()) {
    if (hooks.shouldStop?.()) {
      out.interrupted = true;
      break;
    }
    if (hold && picked.holdRadiusIds.has(orbit.id)) {
      out.holdRadiusCount++;
      attempt(failed, orbit, 'hold radius', () => {
        out.holdRadii.push(holdRadiusRow(orbit, settings.holdRadius.returns, km, () => holdRadius({
          mu, state0: orbit.state0, periodNd: orbit.period, returns: settings.holdRadius.returns, maxCurvePoints: MAX_CURVE_POINTS, ...common,
        })));
      });
    }
    const laps = parseSignature(orbit.signature, system.primaryLetter, system.secondaryLetter);
    for (const run of models) {
      attempt(failed, orbit, `${run.model} screening`, () => {
        if (!laps) throw new RangeError(`signature "${orbit.signature}" does not use the letters ${system.primaryLetter} and ${system.secondaryLetter}`);
        const result = screenInModel({
          model: run.model, mu, state0: orbit.state0, periodNd: orbit.period, laps, spanNd: run.spanNd, phasesCount: run.phases, ...common,
        });
        out.modelScreenings.push(screeningRow(orbit, run.spanNd, km, result));
      });
    }
    out.screenedCount++;
    hooks.onMember?.(index + 1, members.length);
  }
  if (failed.length > 0) {
    out.notes.push(`${familyId}: ${failed.length} screening(s) could not be done and are left out: ${failed.slice(0, 3).join('; ')}${failed.length > 3 ? '; …' : ''}`);
  }
  return out;
}

interface ModelRun {
  model: ScreeningModel;
  spanNd: number;
  phases: number;
}

/** What runs for this system, with the spans in its time unit; skipped screenings are noted. */
function plan(system: SystemSpec, settings: ScreeningSettings, familyId: string, notes: string[]): { hold: boolean; models: ModelRun[] } {
  const models: ModelRun[] = [];
  const synodicNd = system.synodicPeriodDays === null ? null : (system.synodicPeriodDays * SECONDS_PER_DAY) / system.timeUnitS;
  if (settings.sun.enabled) {
    if (synodicNd === null) notes.push(`${familyId}: no Sun screening (${system.id} has no synodic period configured)`);
    else models.push({ model: 'bicircular', spanNd: settings.sun.spanSynodicMonths * synodicNd, phases: settings.sun.phases });
  }
  if (settings.eccentricity.enabled) {
    const monthNd = synodicNd ?? 2 * Math.PI;
    if (synodicNd === null) {
      notes.push(`${familyId}: eccentricity span counted in orbital periods of ${system.secondaryName} (${system.id} has no synodic period configured)`);
    }
    models.push({ model: 'elliptic', spanNd: settings.eccentricity.spanSynodicMonths * monthNd, phases: settings.eccentricity.phases });
  }
  return { hold: settings.holdRadius.enabled, models };
}

function attempt(failed: string[], orbit: OrbitRow, what: string, work: () => void): void {
  try {
    work();
  } catch (error) {
    failed.push(`${what} of ${orbit.id} (${error instanceof Error ? error.message : String(error)})`);
  }
}

function holdRadiusRow(orbit: OrbitRow, returns: number, km: number, compute: () => ReturnType<typeof holdRadius>): HoldRadiusRow {
  if (orbit.state0[2] !== 0 || orbit.state0[5] !== 0) throw new RangeError('the orbit is not planar (the hold radius uses the planar section map)');
  const r = compute();
  return {
    orbitId: orbit.id,
    familyId: orbit.familyId,
    holdRadiusKm: r.holdRadiusNd * km,
    holdRadiusNd: r.holdRadiusNd,
    failingDisplacementKm: Number.isFinite(r.failingDisplacementNd) ? r.failingDisplacementNd * km : null,
    returns,
    curveX: Array.from(r.curveX),
    curveVx: Array.from(r.curveVx),
    rotationPerReturnRad: Number.isFinite(r.rotationPerReturnRad) ? r.rotationPerReturnRad : null,
  };
}

function screeningRow(orbit: OrbitRow, spanNd: number, km: number, r: ScreeningResult): ModelScreeningRow {
  return {
    orbitId: orbit.id,
    familyId: orbit.familyId,
    model: r.model,
    spanNd,
    phases: r.phases.length,
    survivingFraction: r.survivingFraction,
    firstBrokenPeriods: r.phases.map((p) => p.firstBrokenPeriod),
    phaseRad: r.phases.map((p) => p.phaseRad),
    // Position part of the departure on the section (x, and z for a spatial start), as the row promises.
    maxDepartureKm: r.phases.map((p) => p.maxPositionDepartureNd * km),
    parameters: r.sun
      ? { sunMass: r.sun.sunMass, sunDistance: r.sun.sunDistanceNd, sunRate: r.sun.sunRateNd }
      : { eccentricity: r.eccentricity ?? 0 },
  };
}
