// The "beyond the CR3BP" results of one orbit as the page shows them: hold radius and its section points in
// km and m/s, and the Sun (bicircular) and eccentricity (elliptic) screenings phase by phase. Only unit
// conversion and counting; every number comes from the catalog rows.
import type { HoldRadiusRow, ModelScreeningRow, OrbitRow, OrbitScreenings, ScreeningModelName, SystemRow } from '../../catalog-db/types.ts';

export interface SectionPoint {
  xKm: number; // x on the section, rotating frame, from the barycentre
  vxMS: number; // ẋ on the section, m/s
}

export interface HoldRadiusView {
  holdRadiusKm: number;
  holdRadiusNd: number;
  failingDisplacementKm: number | null;
  returns: number;
  rotationPerReturnDeg: number | null;
  /** The orbit's own crossing of the section: the fixed point of the return map. */
  fixedPoint: SectionPoint;
  /** Stored points of the outermost holding curve, in the order of the returns (decimated). */
  points: SectionPoint[];
}

export interface PhaseRow {
  phaseDeg: number;
  /** 1-based first broken period, or null when the phase held for the whole span. */
  firstBrokenPeriod: number | null;
  /** Largest departure over the periods that held; null when none held (the row then stores 0). */
  maxDepartureKm: number | null;
}

export interface ModelScreeningView {
  model: ScreeningModelName;
  heading: string;
  survivingFraction: number;
  survivingPhases: number;
  phaseCount: number;
  spanNd: number;
  spanText: string;
  parametersText: string;
  rows: PhaseRow[];
}

export interface ScreeningView {
  /** False for every member that was not screened (only stable members are). */
  screened: boolean;
  holdRadius: HoldRadiusView | null;
  models: ModelScreeningView[];
}

const DEG = 180 / Math.PI;
const SECONDS_PER_DAY = 86_400;

export function holdRadiusView(row: HoldRadiusRow, orbit: OrbitRow, system: SystemRow): HoldRadiusView {
  const lu = system.lengthUnitKm;
  const vMS = (system.lengthUnitKm / system.timeUnitS) * 1000;
  const n = Math.min(row.curveX.length, row.curveVx.length);
  const points: SectionPoint[] = [];
  for (let i = 0; i < n; i++) points.push({ xKm: row.curveX[i] * lu, vxMS: row.curveVx[i] * vMS });
  return {
    holdRadiusKm: row.holdRadiusKm,
    holdRadiusNd: row.holdRadiusNd,
    failingDisplacementKm: row.failingDisplacementKm,
    returns: row.returns,
    rotationPerReturnDeg: row.rotationPerReturnRad === null ? null : row.rotationPerReturnRad * DEG,
    fixedPoint: { xKm: orbit.state0[0] * lu, vxMS: orbit.state0[3] * vMS },
    points,
  };
}

const fmt = (v: number, digits = 4) => String(Number(v.toPrecision(digits)));

function spanText(row: ModelScreeningRow, orbit: OrbitRow, system: SystemRow): string {
  if (row.model === 'bicircular') {
    const days = (row.spanNd * system.timeUnitS) / SECONDS_PER_DAY;
    return `${fmt(row.spanNd)} TU of time = ${fmt(days)} days ≈ ${fmt(row.spanNd / orbit.period, 3)} orbital periods`;
  }
  // The elliptic model runs on the Moon's true anomaly f: 2π per revolution of the Moon (anomalistic month).
  return `${fmt(row.spanNd)} rad of the Moon's true anomaly = ${fmt(row.spanNd / (2 * Math.PI), 3)} lunar revolutions (anomalistic months)`;
}

const PARAMETER_LABELS: Record<string, string> = {
  sunMass: 'Sun mass (Earth + Moon masses)',
  sunDistance: 'Sun distance (LU)',
  sunRate: 'Sun angular rate in the rotating frame (rad/TU)',
  eccentricity: 'lunar eccentricity e',
};

function parametersText(parameters: Record<string, number>): string {
  return Object.entries(parameters)
    .map(([key, value]) => `${PARAMETER_LABELS[key] ?? key} ${fmt(value, 8)}`)
    .join('; ');
}

export function modelScreeningView(row: ModelScreeningRow, orbit: OrbitRow, system: SystemRow): ModelScreeningView {
  const count = row.phaseRad.length;
  const rows: PhaseRow[] = row.phaseRad.map((phase, i) => ({
    phaseDeg: phase * DEG,
    firstBrokenPeriod: row.firstBrokenPeriods[i] ?? null,
    maxDepartureKm: row.firstBrokenPeriods[i] === 1 || !Number.isFinite(row.maxDepartureKm[i]) ? null : row.maxDepartureKm[i],
  }));
  return {
    model: row.model,
    heading: row.model === 'bicircular' ? 'Sun (bicircular model)' : 'Lunar eccentricity (elliptic model)',
    survivingFraction: row.survivingFraction,
    survivingPhases: rows.filter((r) => r.firstBrokenPeriod === null).length,
    phaseCount: count,
    spanNd: row.spanNd,
    spanText: spanText(row, orbit, system),
    parametersText: parametersText(row.parameters),
    rows,
  };
}

export function screeningView(screenings: OrbitScreenings | undefined, orbit: OrbitRow, system: SystemRow): ScreeningView {
  if (!screenings) return { screened: false, holdRadius: null, models: [] };
  const models = (['bicircular', 'elliptic'] as const)
    .map((m) => screenings[m])
    .filter((m): m is ModelScreeningRow => m !== null)
    .map((m) => modelScreeningView(m, orbit, system));
  return {
    screened: screenings.holdRadius !== null || models.length > 0,
    holdRadius: screenings.holdRadius ? holdRadiusView(screenings.holdRadius, orbit, system) : null,
    models,
  };
}
