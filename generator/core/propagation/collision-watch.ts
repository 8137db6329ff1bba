// Stops a propagation whose accepted step ends within a radius of either primary's centre, then hands the
// step to an inner observer (the event locator). Checks squared distances: Math.hypot costs more than the
// rest of the step's bookkeeping, and only the comparison matters here.
import { IntegrationError, type Dop853Workspace, type StepObserver } from '../dop853/index.ts';

export class CollisionWatch implements StepObserver {
  private readonly radiusSquared: number;

  /** planar: the vector starts x, y, vx, vy; otherwise x, y, z, … */
  constructor(
    private readonly mu: number, private readonly planar: boolean, radiusNd: number,
    private readonly inner: StepObserver | null,
  ) {
    this.radiusSquared = radiusNd * radiusNd;
  }

  afterStep(ws: Dop853Workspace, tOld: number, tNew: number): number {
    const v = ws.y;
    const x = v[0], y = v[1], z = this.planar ? 0 : v[2];
    const dx1 = x + this.mu, dx2 = x - 1 + this.mu; // as in primary-distances.ts
    const rest = y * y + z * z;
    if (dx1 * dx1 + rest < this.radiusSquared || dx2 * dx2 + rest < this.radiusSquared) {
      throw new IntegrationError(`trajectory hits a primary at t = ${tNew}`, 'collision', tNew);
    }
    return this.inner ? this.inner.afterStep(ws, tOld, tNew) : NaN;
  }
}
