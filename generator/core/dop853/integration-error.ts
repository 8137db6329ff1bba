/** A propagation that cannot go on: step-size underflow, step limit, collision, non-finite state. */
export class IntegrationError extends Error {
  constructor(message: string, readonly reason: 'step-underflow' | 'step-limit' | 'collision' | 'non-finite', readonly timeNd: number) {
    super(message);
    this.name = 'IntegrationError';
  }
}
