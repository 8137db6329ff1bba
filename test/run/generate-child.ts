// Child process of the resume test: one generate run, plain progress lines, default Ctrl-C handling.
// Usage: node --import tsx test/run/generate-child.ts CONFIG DB WORKERS
import { generateCatalog } from '../../generator/run/generate-catalog.ts';

const [configPath, dbPath, workers] = process.argv.slice(2) as [string, string, string];
const summary = await generateCatalog({ configPath, dbPath, workers: Number(workers), progress: 'lines' });
console.log(JSON.stringify(summary));
process.exitCode = summary.interrupted ? 130 : 0;
