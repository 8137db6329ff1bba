import { createDop853Workspace, type Dop853Workspace } from '../dop853/index.ts';

// One workspace per dimension, reused across calls: correctors call the propagator thousands of times.
// Propagation is synchronous, so a shared workspace is never used by two calls at once.
const cache = new Map<number, Dop853Workspace>();

export function workspaceFor(n: number): Dop853Workspace {
  let ws = cache.get(n);
  if (!ws) {
    ws = createDop853Workspace(n);
    cache.set(n, ws);
  }
  return ws;
}
