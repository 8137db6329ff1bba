// Entry file of the audit's worker threads: Node 20 does not hand tsx on to worker threads, so the worker
// registers it before importing the TypeScript task handler (as family-worker-entry.mjs does).
import { register } from 'tsx/esm/api';

register();
export default (await import('./audit-worker.ts')).default;
