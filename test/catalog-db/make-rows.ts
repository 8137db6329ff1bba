// Invented rows for storage tests. The numbers mean nothing physically; they are chosen to be awkward
// for storage instead (non-terminating binary fractions, the smallest subnormal and the largest
// double, nulls, booleans both ways, names with commas, quotes, line breaks and non-ASCII text).
// No −0 anywhere: the catalog stores it as +0 (see row-mapping.ts).
import type {
  BifurcationRow,
  FamilyBundle,
  OrbitRow,
  RunRow,
  ScenarioMeta,
  StableWindowRow,
  SystemRow,
} from '../../catalog-db/types.ts';

export function makeSystem(overrides: Partial<SystemRow> = {}): SystemRow {
  return {
    id: 'test-system',
    name: 'Test–System "A"',
    mu: 0.1 + 0.2,
    lengthUnitKm: 123456.789,
    timeUnitS: 1 / 3,
    primaryName: 'Big, body',
    secondaryName: 'Small body',
    primaryLetter: 'B',
    secondaryLetter: 'S',
    primaryRadiusKm: 1000.5,
    secondaryRadiusKm: 250.25,
    synodicPeriodDays: null,
    source: 'invented for a storage test',
    ...overrides,
  };
}

export function makeRunInput(overrides: Partial<Omit<RunRow, 'id' | 'finishedAt'>> = {}): Omit<RunRow, 'id' | 'finishedAt'> {
  return {
    generatorVersion: '0.0.0-test',
    gitCommit: 'abc1234',
    configHash: 'hash-1',
    configPath: 'catalogs/test.yaml',
    scenarioName: 'Storage test',
    scenarioDescription: 'invented',
    rtol: 1e-12,
    atol: 1e-14,
    shard: '1/1',
    startedAt: '2026-01-02T03:04:05.678Z',
    ...overrides,
  };
}

export function makeScenario(overrides: Partial<ScenarioMeta> = {}): ScenarioMeta {
  return { name: 'Storage test scenario', description: 'Line one,\nline "two"', team: 'Team Ünïcode', ...overrides };
}

export interface BundleOptions {
  systemId?: string;
  runId: number;
  orbitCount?: number;
  /** Added to every number, so that two versions of one family differ. */
  offset?: number;
  signature?: string;
}

/** A family with orbitCount members, one stable window (when there are 3 or more members) and two bifurcations. */
export function makeBundle(familyId: string, options: BundleOptions): FamilyBundle {
  const { systemId = 'test-system', runId, orbitCount = 5, offset = 0, signature = 'B2S1' } = options;
  const orbits = Array.from({ length: orbitCount }, (_, seq) => makeOrbit(familyId, seq, offset, signature));
  const stableWindows: StableWindowRow[] =
    orbitCount >= 3
      ? [
          {
            id: `${familyId}/w0`,
            familyId,
            fromJacobi: 3.1 + offset,
            toJacobi: 3.05 + offset,
            fromSecondaryMinAltKm: 100.125 + offset,
            toSecondaryMinAltKm: 900.875 + offset,
            widthKm: 800.75,
            widthJacobi: 0.05,
            fromArclength: 0.1,
            toArclength: 0.3,
            midOrbitId: orbits[1]!.id,
            midPeriodDays: 12.5 + offset,
          },
        ]
      : [];
  const bifurcations: BifurcationRow[] = [
    {
      id: `${familyId}/b0`,
      familyId,
      kind: 'tangent',
      plane: 'in-plane',
      arclength: 0.1 + offset,
      jacobi: 3.1,
      secondaryMinAltKm: 100.125,
      periodDays: 12.25,
      state0: [0.9, 0, 0, 0, 0.3 + offset, 0],
    },
    {
      id: `${familyId}/b1`,
      familyId,
      kind: 'period-doubling',
      plane: 'vertical',
      arclength: 0.7 + offset,
      jacobi: 3.01,
      secondaryMinAltKm: 5e-324,
      periodDays: 13.75,
      state0: [1.1, 0, 1e-300, 0, -0.4, 0.25],
    },
  ];
  const periodDays = orbits.map((o) => o.periodDays);
  const jacobis = orbits.map((o) => o.jacobi);
  return {
    family: {
      id: familyId,
      systemId,
      runId,
      configKey: `job:${familyId}`,
      name: `Family ${familyId}, "quoted"\nsecond line`,
      kind: 'cycler',
      signature,
      primaryLaps: 2,
      secondaryLaps: 1,
      seedSegment: 'between',
      endReasonStart: 'step-too-small',
      endReasonEnd: 'max-members',
      memberCount: orbits.length,
      jacobiMin: Math.min(...jacobis),
      jacobiMax: Math.max(...jacobis),
      periodDaysMin: Math.min(...periodDays),
      periodDaysMax: Math.max(...periodDays),
      stableWindowCount: stableWindows.length,
    },
    orbits,
    stableWindows,
    bifurcations,
  };
}

function makeOrbit(familyId: string, seq: number, offset: number, signature: string): OrbitRow {
  const t = seq / 7 + offset;
  return {
    id: `${familyId}/${String(seq).padStart(4, '0')}`,
    familyId,
    seq,
    arclength: seq * 0.1 + offset,
    state0: [0.8 + t / 10, 0, 0.001 * seq, 0, 0.5 - t / 3, 1e-300],
    jacobi: 3.2 - t / 100,
    period: 2.5 + t,
    periodDays: 10.85620 + t * 4.3,
    stabilityIndex: seq % 2 === 0 ? 0.5 + t : -1.25 - t,
    verticalStabilityIndex: 0.9999999999999999 - t,
    eigenvalues: [
      [1.5 + t, 0],
      [1 / (1.5 + t), 0],
      [Math.cos(t), Math.sin(t)],
      [Math.cos(t), 0 - Math.sin(t)], // 0 - x, not -x: SQLite and JSON.stringify both store −0 as 0
    ],
    monodromy: Array.from({ length: 36 }, (_, k) =>
      k === 0 ? 5e-324 : k === 35 ? 1.7976931348623157e308 : (k % 7 === 0 ? 1 : 0) + (k + t) / 3,
    ),
    primaryMinRadiusKm: 7000 + seq,
    primaryMinAltKm: 6000 + seq,
    secondaryMinRadiusKm: 2000.1 + seq,
    secondaryMinAltKm: 262.7 + seq,
    maxDistanceKm: 450000 + seq,
    l1Passages: 2 * seq,
    signature,
    synodicP: seq % 3 === 0 ? null : 2,
    synodicQ: seq % 3 === 0 ? null : 5,
    synodicRelError: seq % 3 === 0 ? null : 1e-3 * seq,
    closureError: 1e-11 * (seq + 1),
    jacobiDrift: 3e-13,
    stable: seq % 2 === 0,
  };
}
