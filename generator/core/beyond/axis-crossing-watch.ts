// A step observer for DOP853 runs of any model written in the Earth–Moon rotating frame: finds the crossings
// of y = 0 (sign change of y over a step, then Brent on the dense output, as events/event-locator.ts does),
// hands each to a callback, and stops the run at a body impact or a deadline. Allocates nothing per step.
// (events/EventLocator does the crossing part for the CR3BP propagator but allocates two vectors per hit and
// keeps every hit; a later merge could give it a callback mode and use it here.)
import { evaluateDenseOutput } from '../dop853/dense-output.ts';
import type { Dop853Workspace, StepObserver } from '../dop853/index.ts';
import { EVENT_TIME_TOLERANCE } from '../events/event-locator.ts';
import { findRootBrent } from '../events/find-root-brent.ts';

/** Called at each crossing of y = 0 with the time and the 6-state there; true stops the run at that time. */
export type AxisCrossingHandler = (tNd: number, state: Float64Array) => boolean;

export type WatchStop = 'handler' | 'impact-primary' | 'impact-secondary' | 'deadline' | null;

export class AxisCrossingWatch implements StepObserver {
  /** Why the watch stopped the run (null: it did not). */
  stop: WatchStop = null;
  /** The run stops at the first step ending after this time (the handler may move it). */
  deadlineNd = Infinity;
  private previousY = 0;
  private ws: Dop853Workspace | null = null;
  private readonly crossing = new Float64Array(6);
  private readonly probe = new Float64Array(2);
  private readonly yAt = (t: number): number => {
    evaluateDenseOutput(this.ws!, t, this.probe, 2);
    return this.probe[1];
  };

  /**
   * @param mu mass ratio (bodies at (−μ, 0, 0) and (1 − μ, 0, 0))
   * @param primaryRadiusNd, secondaryRadiusNd a step ending closer than this to a body's centre is an impact
   */
  constructor(
    private readonly mu: number, private readonly primaryRadiusNd: number, private readonly secondaryRadiusNd: number,
    private readonly onCrossing: AxisCrossingHandler,
  ) {}

  /** Call before each run with the start vector and the first deadline. */
  start(y0: ArrayLike<number>, deadlineNd = Infinity): void {
    this.previousY = y0[1];
    this.stop = null;
    this.deadlineNd = deadlineNd;
  }

  afterStep(ws: Dop853Workspace, tOld: number, tNew: number): number {
    const y1 = ws.y[1];
    const y0 = this.previousY;
    this.previousY = y1;
    if ((y0 < 0 && y1 >= 0) || (y0 > 0 && y1 <= 0)) {
      this.ws = ws;
      const tolerance = EVENT_TIME_TOLERANCE * Math.max(1, Math.abs(tNew));
      const tRoot = y1 === 0 ? tNew : findRootBrent(this.yAt, tOld, tNew, y0, y1, tolerance);
      evaluateDenseOutput(ws, tRoot, this.crossing, 6);
      this.crossing[1] = 0;
      if (this.onCrossing(tRoot, this.crossing)) {
        this.stop = 'handler';
        return tRoot;
      }
    }
    const s = ws.y;
    const dx1 = s[0] + this.mu, dx2 = s[0] - 1 + this.mu, rest = s[1] * s[1] + s[2] * s[2];
    if (dx1 * dx1 + rest < this.primaryRadiusNd * this.primaryRadiusNd) {
      this.stop = 'impact-primary';
      return tNew;
    }
    if (dx2 * dx2 + rest < this.secondaryRadiusNd * this.secondaryRadiusNd) {
      this.stop = 'impact-secondary';
      return tNew;
    }
    if (tNew > this.deadlineNd) {
      this.stop = 'deadline';
      return tNew;
    }
    return NaN;
  }
}
