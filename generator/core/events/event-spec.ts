/** A scalar function of time and state whose sign changes mark events (section crossings, close approaches). */
export interface EventSpec {
  /** Short name carried into the results, e.g. "y=0". */
  label: string;
  /** g(t, s) with s the spatial state x, y, z, vx, vy, vz (z = vz = 0 for planar runs). */
  g(t: number, s: Float64Array): number;
  /** +1: only where g goes from negative to positive; −1: positive to negative; 0: both. */
  direction: -1 | 0 | 1;
  /** Keeps only the crossings where this holds (a region filter such as x < −μ). */
  accept?(t: number, s: Float64Array): boolean;
  /** Stop the integration at the k-th accepted crossing; absent or 0: only record. */
  terminalCount?: number;
}

export interface EventHit {
  /** Position of the event in the list given to the propagator. */
  eventIndex: number;
  label: string;
  /** How many accepted crossings of this event so far, this one included. */
  count: number;
  tNd: number;
  /** Spatial state at the event (6 numbers). */
  state: Float64Array;
  /** The whole integrated vector at the event (state and STM), as integrated. */
  vector: Float64Array;
}
