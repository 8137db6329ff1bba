// Entry file of the generator's worker threads. Node 20 does not pass the main thread's module
// hooks (tsx) on to worker threads, so each worker registers tsx itself before importing the
// TypeScript worker. Plain .mjs so that Node can load it without any loader.
import { register } from 'tsx/esm/api';

register();
const worker = await import('./family-worker.ts');

export default worker.default;
