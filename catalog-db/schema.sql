-- Schema of a cycler-atlas catalog (SQLite). Applied once to a new file by create-schema.ts,
-- which also sets PRAGMA user_version to CATALOG_SCHEMA_VERSION (schema-version.ts).
-- Column names are the snake_case forms of the row fields in types.ts (mapping in table-columns.ts).
-- Arrays (state0, eigenvalues, monodromy, curves, per-phase lists) and the screening parameters are JSON
-- text. STRICT tables reject values of the wrong type.
-- Version 2 added hold_radii, model_screenings and the view vertical_branch_points.
-- Version 3 added jobs.settings: the settings a done job's results depend on, and the audits table.
-- Version 4 added signature_changes: where a family's lap signature changes and what it continues into.

CREATE TABLE systems (
  id                  TEXT PRIMARY KEY,
  name                TEXT NOT NULL,
  mu                  REAL NOT NULL,
  length_unit_km      REAL NOT NULL,
  time_unit_s         REAL NOT NULL,
  primary_name        TEXT NOT NULL,
  secondary_name      TEXT NOT NULL,
  primary_letter      TEXT NOT NULL,
  secondary_letter    TEXT NOT NULL,
  primary_radius_km   REAL NOT NULL,
  secondary_radius_km REAL NOT NULL,
  synodic_period_days REAL,
  source              TEXT NOT NULL
) STRICT;

CREATE TABLE runs (
  id                   INTEGER PRIMARY KEY,
  generator_version    TEXT NOT NULL,
  git_commit           TEXT NOT NULL,
  config_hash          TEXT NOT NULL,
  config_path          TEXT NOT NULL,
  scenario_name        TEXT NOT NULL,
  scenario_description TEXT NOT NULL,
  rtol                 REAL NOT NULL,
  atol                 REAL NOT NULL,
  shard                TEXT NOT NULL,
  started_at           TEXT NOT NULL,
  finished_at          TEXT
) STRICT;

CREATE TABLE families (
  id                  TEXT PRIMARY KEY,
  system_id           TEXT NOT NULL REFERENCES systems (id),
  run_id              INTEGER NOT NULL REFERENCES runs (id),
  config_key          TEXT NOT NULL,
  name                TEXT NOT NULL,
  kind                TEXT NOT NULL CHECK (kind IN ('cycler', 'lyapunov-l1', 'lyapunov-l2', 'retrograde', 'other')),
  signature           TEXT NOT NULL,
  primary_laps        INTEGER NOT NULL,
  secondary_laps      INTEGER NOT NULL,
  seed_segment        TEXT NOT NULL,
  end_reason_start    TEXT NOT NULL,
  end_reason_end      TEXT NOT NULL,
  member_count        INTEGER NOT NULL,
  jacobi_min          REAL NOT NULL,
  jacobi_max          REAL NOT NULL,
  period_days_min     REAL NOT NULL,
  period_days_max     REAL NOT NULL,
  stable_window_count INTEGER NOT NULL
) STRICT;

CREATE TABLE orbits (
  id                       TEXT PRIMARY KEY,
  family_id                TEXT NOT NULL REFERENCES families (id) ON DELETE CASCADE,
  seq                      INTEGER NOT NULL,
  arclength                REAL NOT NULL,
  state0                   TEXT NOT NULL CHECK (json_array_length(state0) = 6),
  jacobi                   REAL NOT NULL,
  period                   REAL NOT NULL,
  period_days              REAL NOT NULL,
  stability_index          REAL NOT NULL,
  vertical_stability_index REAL NOT NULL,
  eigenvalues              TEXT NOT NULL CHECK (json_valid(eigenvalues)),
  monodromy                TEXT NOT NULL CHECK (json_array_length(monodromy) = 36),
  primary_min_radius_km    REAL NOT NULL,
  primary_min_alt_km       REAL NOT NULL,
  secondary_min_radius_km  REAL NOT NULL,
  secondary_min_alt_km     REAL NOT NULL,
  max_distance_km          REAL NOT NULL,
  l1_passages              INTEGER NOT NULL,
  signature                TEXT NOT NULL,
  synodic_p                INTEGER,
  synodic_q                INTEGER,
  synodic_rel_error        REAL,
  closure_error            REAL NOT NULL,
  jacobi_drift             REAL NOT NULL,
  stable                   INTEGER NOT NULL CHECK (stable IN (0, 1))
) STRICT;

CREATE TABLE stable_windows (
  id                        TEXT PRIMARY KEY,
  family_id                 TEXT NOT NULL REFERENCES families (id) ON DELETE CASCADE,
  from_jacobi               REAL NOT NULL,
  to_jacobi                 REAL NOT NULL,
  from_secondary_min_alt_km REAL NOT NULL,
  to_secondary_min_alt_km   REAL NOT NULL,
  width_km                  REAL NOT NULL,
  width_jacobi              REAL NOT NULL,
  from_arclength            REAL NOT NULL,
  to_arclength              REAL NOT NULL,
  -- the member nearest the window's middle; must be an orbit of the catalog (the site links to it)
  mid_orbit_id              TEXT NOT NULL REFERENCES orbits (id) ON DELETE CASCADE,
  mid_period_days           REAL NOT NULL
) STRICT;

CREATE TABLE bifurcations (
  id                   TEXT PRIMARY KEY,
  family_id            TEXT NOT NULL REFERENCES families (id) ON DELETE CASCADE,
  kind                 TEXT NOT NULL CHECK (kind IN ('tangent', 'period-doubling')),
  plane                TEXT NOT NULL CHECK (plane IN ('in-plane', 'vertical')),
  arclength            REAL NOT NULL,
  jacobi               REAL NOT NULL,
  secondary_min_alt_km REAL NOT NULL,
  period_days          REAL NOT NULL,
  state0               TEXT NOT NULL CHECK (json_array_length(state0) = 6)
) STRICT;

-- Hold radius of a screened stable member (our term, DESIGN.md): the largest displacement along its
-- Poincaré section (toward +x) whose return-map points stay on an invariant curve for `returns` returns,
-- with the section points (x, vx; nondimensional, decimated) of the outermost holding curve.
CREATE TABLE hold_radii (
  orbit_id                TEXT PRIMARY KEY REFERENCES orbits (id) ON DELETE CASCADE,
  family_id               TEXT NOT NULL REFERENCES families (id) ON DELETE CASCADE,
  hold_radius_km          REAL NOT NULL CHECK (hold_radius_km >= 0),
  hold_radius_nd          REAL NOT NULL CHECK (hold_radius_nd >= 0),
  failing_displacement_km REAL,
  returns                 INTEGER NOT NULL CHECK (returns > 0),
  curve_x                 TEXT NOT NULL CHECK (json_type(curve_x) = 'array'),
  curve_vx                TEXT NOT NULL CHECK (json_array_length(curve_vx) = json_array_length(curve_x)),
  rotation_per_return_rad REAL
) STRICT;

-- A stable member propagated in a model beyond the CR3BP: 'bicircular' (the Sun) or 'elliptic' (the
-- Moon's eccentricity), once per phase; per phase the first broken period (null: survived the span)
-- and the largest departure from the CR3BP orbit on the section (km).
CREATE TABLE model_screenings (
  orbit_id             TEXT NOT NULL REFERENCES orbits (id) ON DELETE CASCADE,
  family_id            TEXT NOT NULL REFERENCES families (id) ON DELETE CASCADE,
  model                TEXT NOT NULL CHECK (model IN ('bicircular', 'elliptic')),
  span_nd              REAL NOT NULL CHECK (span_nd > 0),
  phases               INTEGER NOT NULL CHECK (phases > 0),
  surviving_fraction   REAL NOT NULL CHECK (surviving_fraction BETWEEN 0 AND 1),
  first_broken_periods TEXT NOT NULL CHECK (json_array_length(first_broken_periods) = phases),
  phase_rad            TEXT NOT NULL CHECK (json_array_length(phase_rad) = phases),
  max_departure_km     TEXT NOT NULL CHECK (json_array_length(max_departure_km) = phases),
  parameters           TEXT NOT NULL CHECK (json_type(parameters) = 'object'),
  PRIMARY KEY (orbit_id, model)
) STRICT;

-- A family end where the lap signature changes: the first corrected orbit past it (it has the new
-- signature) and the catalogued family that orbit lies on (into_family_id; NULL until a run has found or
-- continued it, and again after that family is rewritten: the next run links it anew).
CREATE TABLE signature_changes (
  family_id      TEXT NOT NULL REFERENCES families (id) ON DELETE CASCADE,
  side           TEXT NOT NULL CHECK (side IN ('start', 'end')),
  signature      TEXT NOT NULL,
  state0         TEXT NOT NULL CHECK (json_array_length(state0) = 6),
  jacobi         REAL NOT NULL,
  period         REAL NOT NULL,
  period_days    REAL NOT NULL,
  -- deferred: a merge may write a family before the one it continues into
  into_family_id TEXT REFERENCES families (id) ON DELETE SET NULL DEFERRABLE INITIALLY DEFERRED,
  -- 1 once a run has followed the orbit as a family of the job of its signature (tried once only)
  followed_up    INTEGER NOT NULL CHECK (followed_up IN (0, 1)),
  PRIMARY KEY (family_id, side)
) STRICT;

-- One row per config entry (job) whose families are all written; resume skips these. settings is the
-- job as the generator got it (system constants, seed rule, limits, tolerances, screening; JSON), so a
-- later run or a merge can tell whether the stored results still match what it would compute.
CREATE TABLE jobs (
  job_key  TEXT PRIMARY KEY,
  run_id   INTEGER NOT NULL REFERENCES runs (id),
  done_at  TEXT NOT NULL,
  settings TEXT NOT NULL CHECK (json_type(settings) = 'object')
) STRICT;

-- One row per finished completeness audit (`cycler-atlas audit`): at random Jacobi levels (seeded, per
-- system) that discovery did not use, the symmetric orbits of each lap-signature job found by an
-- independent scan, and those not on any catalogued family of the job (misses, with their states; JSON).
CREATE TABLE audits (
  id                INTEGER PRIMARY KEY,
  finished_at       TEXT NOT NULL,
  seconds           REAL NOT NULL CHECK (seconds >= 0),
  seed              INTEGER NOT NULL,
  levels_per_system INTEGER NOT NULL CHECK (levels_per_system > 0),
  -- the audit's x-axis scan had grid_factor times each job's start points
  grid_factor       REAL NOT NULL CHECK (grid_factor > 0),
  levels            TEXT NOT NULL CHECK (json_type(levels) = 'object'),
  jobs_audited      INTEGER NOT NULL CHECK (jobs_audited >= 0),
  orbits_checked    INTEGER NOT NULL CHECK (orbits_checked >= 0),
  miss_count        INTEGER NOT NULL CHECK (miss_count = json_array_length(misses)),
  misses            TEXT NOT NULL CHECK (json_type(misses) = 'array')
) STRICT;

-- Catalog-wide key/value facts: scenario.name, scenario.description, scenario.team.
CREATE TABLE meta (
  key   TEXT PRIMARY KEY,
  value TEXT NOT NULL
) STRICT;

-- The site lists families by system and signature and reads each family's members in order.
CREATE INDEX families_by_system_signature ON families (system_id, signature, id);
CREATE UNIQUE INDEX orbits_by_family_seq ON orbits (family_id, seq);
CREATE INDEX stable_windows_by_family ON stable_windows (family_id, from_arclength);
-- Without this index every deleted orbit would scan stable_windows for the cascade.
CREATE INDEX stable_windows_by_mid_orbit ON stable_windows (mid_orbit_id);
CREATE INDEX bifurcations_by_family ON bifurcations (family_id, arclength);
CREATE INDEX hold_radii_by_family ON hold_radii (family_id);
CREATE INDEX model_screenings_by_family ON model_screenings (family_id);
-- Without this index every deleted family would scan signature_changes for the SET NULL.
CREATE INDEX signature_changes_by_target ON signature_changes (into_family_id);

-- Vertically critical members (vertical stability index = +1 or -1): the branch points of spatial
-- families off these planar ones. They are the bifurcation rows with plane 'vertical'; the view names
-- the member stored there (same family, same arclength) and the index value it crosses.
CREATE VIEW vertical_branch_points AS
SELECT
  b.id AS bifurcation_id,
  b.family_id,
  o.id AS orbit_id,
  b.kind,
  CASE b.kind WHEN 'tangent' THEN 1 ELSE -1 END AS vertical_index,
  b.jacobi,
  b.period_days,
  b.secondary_min_alt_km,
  b.state0
FROM bifurcations AS b
LEFT JOIN orbits AS o ON o.family_id = b.family_id AND o.arclength = b.arclength
WHERE b.plane = 'vertical';
