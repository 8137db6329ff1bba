// `npm run bench` runs every bench module below; `npm run bench -- core` runs only those whose name
// contains "core". Each module exports run(): Promise<void> and prints its own figures.
export {}; // a module: top-level await below

interface BenchModule {
  name: string;
  load: () => Promise<{ run: () => Promise<void> }>;
}

// Add new benches here (one line each).
const BENCHES: BenchModule[] = [
  { name: 'core-integrator', load: () => import('./core-integrator.ts') },
  { name: 'generator-demo', load: () => import('./generator-demo.ts') },
  { name: 'generator-numerics', load: () => import('./generator-numerics.ts') },
  { name: 'discovery', load: () => import('./discovery.ts') },
  { name: 'beyond-screenings', load: () => import('./beyond-screenings.ts') },
  { name: 'beyond-demo', load: () => import('./beyond-demo.ts') },
  { name: 'site-build', load: () => import('./site-build.ts') },
  { name: 'audit', load: () => import('./audit.ts') },
];

const filters = process.argv.slice(2).filter((a) => a !== '--');
const selected = filters.length === 0 ? BENCHES : BENCHES.filter((b) => filters.some((f) => b.name.includes(f)));
if (selected.length === 0) {
  console.error(`bench: no bench matches ${filters.join(', ')}; known: ${BENCHES.map((b) => b.name).join(', ')}`);
  process.exit(2);
}
for (const bench of selected) {
  console.log(`\n## ${bench.name}`);
  const module = await bench.load();
  await module.run();
}
