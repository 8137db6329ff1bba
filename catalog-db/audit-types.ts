// Row types of the audits table (schema.sql): one finished completeness audit (`cycler-atlas audit`).

/** A symmetric orbit the audit found that lies on no catalogued family of its job. */
export interface AuditMiss {
  jobKey: string;
  systemId: string;
  signature: string;
  segment: string; // x-axis segment of the scan that found it
  direction: 1 | -1; // sign of ẏ at the start
  halfCrossings: number; // crossings of y = 0 up to the half period
  jacobi: number;
  periodNd: number;
  /** Perpendicular start [x, y, z, vx, vy, vz], rotating frame, nondimensional. */
  state0: [number, number, number, number, number, number];
  /** x of the other perpendicular crossing (at half the period). */
  xHalf: number;
}

export interface AuditRow {
  id: number;
  finishedAt: string; // ISO 8601
  seconds: number;
  /** Seed of the level draw (the same seed and catalog give the same levels). */
  seed: number;
  levelsPerSystem: number;
  /** The audit's scan grid was this many times as dense as each job's. */
  gridFactor: number;
  /** Jacobi levels scanned, per system id. */
  levels: Record<string, number[]>;
  jobsAudited: number;
  orbitsChecked: number;
  misses: AuditMiss[];
}
