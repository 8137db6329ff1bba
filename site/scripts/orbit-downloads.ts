// Browser side of an orbit page's downloads: reads the form, propagates with the generator's own
// propagator and saves CSV, JSON or CCSDS OEM. Errors show next to the buttons, one line each.
import { saveTextFile } from './save-text-file.ts';
import { seriesToCsv } from './state-vectors/format-csv.ts';
import { seriesToJson } from './state-vectors/format-json.ts';
import { seriesToOem } from './state-vectors/format-oem.ts';
import type { OrbitDownloadData } from './state-vectors/orbit-download-data.ts';
import { stateSeries, type SeriesFrame, type SeriesUnits } from './state-vectors/state-series.ts';

const STEP_UNIT_S: Record<string, number> = { s: 1, min: 60, h: 3600, d: 86400 };

type Format = 'csv' | 'json' | 'oem';

function readNumber(form: HTMLFormElement, name: string, label: string): number {
  const input = form.elements.namedItem(name) as HTMLInputElement;
  const value = Number(input.value);
  if (input.value.trim() === '' || !Number.isFinite(value)) throw new RangeError(`${label} must be a number, got ${JSON.stringify(input.value)}`);
  return value;
}

export function startOrbitDownloads(form: HTMLFormElement, orbit: OrbitDownloadData): void {
  const note = form.querySelector<HTMLElement>('[data-role="download-note"]')!;
  const field = (name: string) => (form.elements.namedItem(name) as HTMLInputElement | HTMLSelectElement).value;

  const make = (format: Format) => {
    note.classList.remove('error');
    try {
      const periods = readNumber(form, 'periods', 'span (periods)');
      const step = readNumber(form, 'step', 'step');
      const stepUnit = field('stepUnit');
      const stepNd = stepUnit === 'tu' ? step : (step * (STEP_UNIT_S[stepUnit] ?? NaN)) / orbit.timeUnitS;
      const frame = field('frame') as SeriesFrame;
      // OEM carries km and km/s by the standard, whatever the units field says.
      const units = (format === 'oem' ? 'km' : field('units')) as SeriesUnits;
      const t0 = performance.now();
      const series = stateSeries(orbit, { periods, stepNd, frame, units });
      const frameTag = frame === 'rotating' ? 'rot' : frame === 'primary' ? 'inertial-primary' : 'inertial-secondary';
      const name = `${orbit.fileStem}-${frameTag}-${units}`;
      if (format === 'csv') saveTextFile(`${name}.csv`, 'text/csv', seriesToCsv(series));
      else if (format === 'json') saveTextFile(`${name}.json`, 'application/json', seriesToJson(orbit, series));
      else {
        const creationDate = new Date().toISOString().replace('Z', '');
        saveTextFile(`${name}.oem`, 'text/plain', seriesToOem(orbit, series, { startEpoch: field('epoch'), creationDate }));
      }
      note.textContent = `${series.count.toLocaleString('en-US')} states, step ${series.stepNd.toPrecision(6)} TU (${(series.stepNd * orbit.timeUnitS).toPrecision(6)} s), computed in ${(performance.now() - t0).toFixed(0)} ms.`;
    } catch (error) {
      note.textContent = (error as Error).message;
      note.classList.add('error');
    }
  };
  for (const format of ['csv', 'json', 'oem'] as const) {
    form.querySelector(`button[data-format="${format}"]`)?.addEventListener('click', () => make(format));
  }
  form.addEventListener('submit', (event) => event.preventDefault());
}
