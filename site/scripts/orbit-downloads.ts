// Browser side of an orbit page's downloads: reads the form, propagates with the generator's own
// propagator and saves CSV, JSON or CCSDS OEM. The epoch-dated Earth-centred frame loads its two modules
// (the frame map and the bundled ephemeris) only when chosen. Errors show next to the buttons, one line each.
import { saveTextFile } from './save-text-file.ts';
import { parseEpochMicros } from './state-vectors/epoch-text.ts';
import { seriesToCsv } from './state-vectors/format-csv.ts';
import { seriesToJson } from './state-vectors/format-json.ts';
import { seriesToOem } from './state-vectors/format-oem.ts';
import type { OrbitDownloadData } from './state-vectors/orbit-download-data.ts';
import { stateSeries, type SeriesFrame, type SeriesUnits, type StateSeries } from './state-vectors/state-series.ts';

const STEP_UNIT_S: Record<string, number> = { s: 1, min: 60, h: 3600, d: 86400 };
const FRAME_TAG: Record<SeriesFrame, string> = {
  rotating: 'rot', primary: 'inertial-primary', secondary: 'inertial-secondary', eme2000: 'eme2000',
};

type Format = 'csv' | 'json' | 'oem';

function readNumber(form: HTMLFormElement, name: string, label: string): number {
  const input = form.elements.namedItem(name) as HTMLInputElement;
  const value = Number(input.value);
  if (input.value.trim() === '' || !Number.isFinite(value)) throw new RangeError(`${label} must be a number, got ${JSON.stringify(input.value)}`);
  return value;
}

async function datedSeries(orbit: OrbitDownloadData, periods: number, stepNd: number, startMicros: number): Promise<StateSeries> {
  const [{ epochDatedSeries }, { geocentricMoonAt }] = await Promise.all([
    import('./state-vectors/epoch-dated-series.ts'),
    import('./state-vectors/moon-ephemeris.ts'),
  ]);
  return epochDatedSeries(orbit, { periods, stepNd, startMicros }, geocentricMoonAt);
}

export function startOrbitDownloads(form: HTMLFormElement, orbit: OrbitDownloadData): void {
  const note = form.querySelector<HTMLElement>('[data-role="download-note"]')!;
  const field = (name: string) => (form.elements.namedItem(name) as HTMLInputElement | HTMLSelectElement).value;
  let busy = false;

  const make = async (format: Format) => {
    if (busy) return;
    busy = true;
    form.dataset.busy = 'true';
    note.classList.remove('error');
    try {
      const periods = readNumber(form, 'periods', 'span (periods)');
      const step = readNumber(form, 'step', 'step');
      const stepUnit = field('stepUnit');
      const stepNd = stepUnit === 'tu' ? step : (step * (STEP_UNIT_S[stepUnit] ?? NaN)) / orbit.timeUnitS;
      const frame = field('frame') as SeriesFrame;
      if (frame === 'eme2000' && !orbit.earthMoon) throw new RangeError('frame: the Earth-centred EME2000 frame is offered for Earth–Moon orbits only');
      const epochText = field('epoch');
      // Checked only where an epoch is used: the dated frame and the OEM of the model frames.
      const startMicros = frame === 'eme2000' || format === 'oem' ? parseEpochMicros(epochText) : NaN;
      // OEM carries km and km/s by the standard; the dated frame is in km and km/s only.
      const units = (format === 'oem' || frame === 'eme2000' ? 'km' : field('units')) as SeriesUnits;
      const t0 = performance.now();
      const series = frame === 'eme2000'
        ? await datedSeries(orbit, periods, stepNd, startMicros)
        : stateSeries(orbit, { periods, stepNd, frame, units });
      const name = `${orbit.fileStem}-${FRAME_TAG[frame]}-${units}`;
      if (format === 'csv') saveTextFile(`${name}.csv`, 'text/csv', seriesToCsv(series));
      else if (format === 'json') saveTextFile(`${name}.json`, 'application/json', seriesToJson(orbit, series));
      else {
        const creationDate = new Date().toISOString().replace('Z', '');
        saveTextFile(`${name}.oem`, 'text/plain', seriesToOem(orbit, series, { startEpoch: epochText, creationDate }));
      }
      note.textContent = `${series.count.toLocaleString('en-US')} states, step ${series.stepNd.toPrecision(6)} TU (${(series.stepNd * orbit.timeUnitS).toPrecision(6)} s), computed in ${(performance.now() - t0).toFixed(0)} ms.` +
        (frame === 'eme2000' ? ' Earth-centred EME2000 states in km, km/s (dated frame; see the approximation above).' : '');
    } catch (error) {
      note.textContent = (error as Error).message;
      note.classList.add('error');
    } finally {
      busy = false;
      delete form.dataset.busy;
    }
  };
  for (const format of ['csv', 'json', 'oem'] as const) {
    form.querySelector(`button[data-format="${format}"]`)?.addEventListener('click', () => void make(format));
  }
  form.addEventListener('submit', (event) => event.preventDefault());
}
