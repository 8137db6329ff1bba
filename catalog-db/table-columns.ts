// How each row type of types.ts maps onto its table: one column per field, named in snake_case.
// The ColumnSpec type makes a field without a column (or with a kind that does not fit its type) a
// compile error, so types.ts and schema.sql cannot drift apart silently.
import type {
  BifurcationRow,
  FamilyRow,
  HoldRadiusRow,
  ModelScreeningRow,
  OrbitRow,
  RunRow,
  SignatureChangeRow,
  StableWindowRow,
  SystemRow,
} from './types.ts';
import { createRowMapper, type ColumnSpec } from './row-mapping.ts';

const systemColumns: ColumnSpec<SystemRow> = {
  id: 'text',
  name: 'text',
  mu: 'real',
  lengthUnitKm: 'real',
  timeUnitS: 'real',
  primaryName: 'text',
  secondaryName: 'text',
  primaryLetter: 'text',
  secondaryLetter: 'text',
  primaryRadiusKm: 'real',
  secondaryRadiusKm: 'real',
  synodicPeriodDays: 'real?',
  source: 'text',
};

const runColumns: ColumnSpec<RunRow> = {
  id: 'int',
  generatorVersion: 'text',
  gitCommit: 'text',
  configHash: 'text',
  configPath: 'text',
  scenarioName: 'text',
  scenarioDescription: 'text',
  rtol: 'real',
  atol: 'real',
  shard: 'text',
  startedAt: 'text',
  finishedAt: 'text?',
};

const familyColumns: ColumnSpec<FamilyRow> = {
  id: 'text',
  systemId: 'text',
  runId: 'int',
  configKey: 'text',
  name: 'text',
  kind: 'text',
  signature: 'text',
  primaryLaps: 'int',
  secondaryLaps: 'int',
  seedSegment: 'text',
  endReasonStart: 'text',
  endReasonEnd: 'text',
  memberCount: 'int',
  jacobiMin: 'real',
  jacobiMax: 'real',
  periodDaysMin: 'real',
  periodDaysMax: 'real',
  stableWindowCount: 'int',
};

const orbitColumns: ColumnSpec<OrbitRow> = {
  id: 'text',
  familyId: 'text',
  seq: 'int',
  arclength: 'real',
  state0: 'state6',
  jacobi: 'real',
  period: 'real',
  periodDays: 'real',
  stabilityIndex: 'real',
  verticalStabilityIndex: 'real',
  eigenvalues: 'complexList',
  monodromy: 'matrix36',
  primaryMinRadiusKm: 'real',
  primaryMinAltKm: 'real',
  secondaryMinRadiusKm: 'real',
  secondaryMinAltKm: 'real',
  maxDistanceKm: 'real',
  l1Passages: 'int',
  signature: 'text',
  synodicP: 'int?',
  synodicQ: 'int?',
  synodicRelError: 'real?',
  closureError: 'real',
  jacobiDrift: 'real',
  stable: 'bool',
};

const stableWindowColumns: ColumnSpec<StableWindowRow> = {
  id: 'text',
  familyId: 'text',
  fromJacobi: 'real',
  toJacobi: 'real',
  fromSecondaryMinAltKm: 'real',
  toSecondaryMinAltKm: 'real',
  widthKm: 'real',
  widthJacobi: 'real',
  fromArclength: 'real',
  toArclength: 'real',
  midOrbitId: 'text',
  midPeriodDays: 'real',
};

const bifurcationColumns: ColumnSpec<BifurcationRow> = {
  id: 'text',
  familyId: 'text',
  kind: 'text',
  plane: 'text',
  arclength: 'real',
  jacobi: 'real',
  secondaryMinAltKm: 'real',
  periodDays: 'real',
  state0: 'state6',
};

const holdRadiusColumns: ColumnSpec<HoldRadiusRow> = {
  orbitId: 'text',
  familyId: 'text',
  holdRadiusKm: 'real',
  holdRadiusNd: 'real',
  failingDisplacementKm: 'real?',
  returns: 'int',
  curveX: 'realList',
  curveVx: 'realList',
  rotationPerReturnRad: 'real?',
};

const modelScreeningColumns: ColumnSpec<ModelScreeningRow> = {
  orbitId: 'text',
  familyId: 'text',
  model: 'text',
  spanNd: 'real',
  phases: 'int',
  survivingFraction: 'real',
  firstBrokenPeriods: 'intOrNullList',
  phaseRad: 'realList',
  maxDepartureKm: 'realList',
  parameters: 'realRecord',
};

const signatureChangeColumns: ColumnSpec<SignatureChangeRow> = {
  familyId: 'text',
  side: 'text',
  signature: 'text',
  state0: 'state6',
  jacobi: 'real',
  period: 'real',
  periodDays: 'real',
  intoFamilyId: 'text?',
  followedUp: 'bool',
};

export const systemTable = createRowMapper('system', 'systems', systemColumns);
export const runTable = createRowMapper('run', 'runs', runColumns);
export const familyTable = createRowMapper('family', 'families', familyColumns);
export const orbitTable = createRowMapper('orbit', 'orbits', orbitColumns);
export const stableWindowTable = createRowMapper('stable window', 'stable_windows', stableWindowColumns);
export const bifurcationTable = createRowMapper('bifurcation', 'bifurcations', bifurcationColumns);
export const holdRadiusTable = createRowMapper('hold radius', 'hold_radii', holdRadiusColumns);
export const modelScreeningTable = createRowMapper('model screening', 'model_screenings', modelScreeningColumns);
export const signatureChangeTable = createRowMapper('signature change', 'signature_changes', signatureChangeColumns);
