// Finds events over each accepted step: a sign change of g between the step's ends, then the root of
// g along the dense output (Hairer, Nørsett & Wanner 1993, §II.6) by Brent's method.
import { evaluateDenseOutput } from '../dop853/dense-output.ts';
import type { Dop853Workspace, StepObserver } from '../dop853/index.ts';
import type { EventHit, EventSpec } from './event-spec.ts';
import { findRootBrent } from './find-root-brent.ts';

export const EVENT_TIME_TOLERANCE = 1e-14;

/** Copies an integrated vector's physical part into a spatial 6-state. */
export function toSpatialState(v: ArrayLike<number>, planar: boolean, out: Float64Array): Float64Array {
  if (planar) {
    out[0] = v[0]; out[1] = v[1]; out[2] = 0; out[3] = v[2]; out[4] = v[3]; out[5] = 0;
  } else {
    for (let i = 0; i < 6; i++) out[i] = v[i];
  }
  return out;
}

export class EventLocator implements StepObserver {
  readonly hits: EventHit[] = [];
  private readonly previousG: Float64Array;
  private readonly counts: Int32Array;
  private readonly stateDim: number;
  private readonly scratchVector: Float64Array;
  private readonly scratchState = new Float64Array(6);
  /** Separate from scratchState: the root search must not overwrite the step-end state other events read. */
  private readonly searchState = new Float64Array(6);

  constructor(private readonly specs: readonly EventSpec[], private readonly planar: boolean, n: number) {
    this.previousG = new Float64Array(specs.length);
    this.counts = new Int32Array(specs.length);
    this.stateDim = planar ? 4 : 6;
    this.scratchVector = new Float64Array(n);
  }

  /** Call once with the initial time and vector before integrating. */
  start(t0: number, y0: ArrayLike<number>): void {
    const s = toSpatialState(y0, this.planar, this.scratchState);
    for (let e = 0; e < this.specs.length; e++) this.previousG[e] = this.specs[e].g(t0, s);
    this.counts.fill(0);
    this.hits.length = 0;
  }

  afterStep(ws: Dop853Workspace, tOld: number, tNew: number): number {
    const specs = this.specs;
    let tStop = NaN;
    const s = toSpatialState(ws.y, this.planar, this.scratchState);
    // Find, per event, the first root in this step; handle them in time order so that a terminal
    // event cuts off later ones.
    const firstHit = this.hits.length;
    for (let e = 0; e < specs.length; e++) {
      const spec = specs[e];
      const g0 = this.previousG[e];
      const g1 = spec.g(tNew, s);
      this.previousG[e] = g1;
      const rising = g0 < 0 && g1 >= 0;
      const falling = g0 > 0 && g1 <= 0;
      if (!(rising || falling)) continue;
      if ((spec.direction === 1 && !rising) || (spec.direction === -1 && !falling)) continue;
      const tRoot = g1 === 0 ? tNew : this.locate(ws, spec, tOld, tNew, g0, g1);
      const vector = new Float64Array(ws.n);
      evaluateDenseOutput(ws, tRoot, vector);
      const state = toSpatialState(vector, this.planar, new Float64Array(6));
      if (spec.accept && !spec.accept(tRoot, state)) continue;
      this.hits.push({ eventIndex: e, label: spec.label, count: 0, tNd: tRoot, state, vector });
    }
    if (this.hits.length === firstHit) return tStop;
    const fresh = this.hits.splice(firstHit).sort((a, b) => (a.tNd - b.tNd) * (tNew >= tOld ? 1 : -1));
    for (const hit of fresh) {
      const count = ++this.counts[hit.eventIndex];
      hit.count = count;
      this.hits.push(hit);
      const terminal = specs[hit.eventIndex].terminalCount;
      if (terminal && count >= terminal) {
        tStop = hit.tNd;
        break;
      }
    }
    return tStop;
  }

  private locate(ws: Dop853Workspace, spec: EventSpec, tOld: number, tNew: number, g0: number, g1: number): number {
    const v = this.scratchVector;
    const s = this.searchState;
    const dim = this.stateDim;
    const planar = this.planar;
    const gAt = (t: number): number => {
      evaluateDenseOutput(ws, t, v, dim);
      return spec.g(t, toSpatialState(v, planar, s));
    };
    const tolerance = EVENT_TIME_TOLERANCE * Math.max(1, Math.abs(tNew));
    return findRootBrent(gAt, tOld, tNew, g0, g1, tolerance);
  }
}
