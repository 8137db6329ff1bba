// The numerical core: numbers in, numbers out; no I/O, runs unchanged in Node and in the browser.
export * from './dop853/index.ts';
export * from './cr3bp/index.ts';
export * from './events/index.ts';
export * from './propagation/index.ts';
export * from './orbits/index.ts';
export * from './beyond/index.ts';
