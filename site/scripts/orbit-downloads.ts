// Browser side of an orbit page's downloads: a thin shell that reads the form, asks the core's state
// export (generator/core/state-export/, the module `export-state` uses) for the series and saves it as
// CSV, JSON or CCSDS OEM. The Moon's ephemeris loads only when the EME2000 frame is chosen. Errors show
// next to the buttons, one line each, naming the field.
import { parseEpochMicros } from '../../generator/core/state-export/epoch-text.ts';
import type { ExportOrbit } from '../../generator/core/state-export/export-orbit.ts';
import { formatStateCsv } from '../../generator/core/state-export/format-csv.ts';
import { formatStateJson } from '../../generator/core/state-export/format-json.ts';
import { formatStateOem } from '../../generator/core/state-export/format-oem.ts';
import type { MoonAt } from '../../generator/core/state-export/moon-geometry.ts';
import type { StateFrame, StateUnits } from '../../generator/core/state-export/state-frames.ts';
import { stateSeries } from '../../generator/core/state-export/state-series.ts';
import { STEP_UNITS, stepSeconds, type StepUnit } from '../../generator/core/state-export/step-units.ts';
import { saveTextFile } from './save-text-file.ts';

/** What the page embeds for this script (JSON). */
export interface OrbitDownloadData {
  orbit: ExportOrbit;
  fileStem: string;
}

type Format = 'csv' | 'json' | 'oem';
const MIME: Record<Format, string> = { csv: 'text/csv', json: 'application/json', oem: 'text/plain' };

function readNumber(text: string, field: string, allowed: string, ok: (value: number) => boolean): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || !ok(value)) throw new RangeError(`${field}: "${text}" is not allowed (${allowed})`);
  return value;
}

function withField<T>(field: string, make: () => T): T {
  try {
    return make();
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`${field}: ${error.message}`);
    throw error;
  }
}

async function moonForFrame(frame: StateFrame): Promise<MoonAt | undefined> {
  if (frame !== 'eme2000') return undefined;
  return (await import('../../generator/ephemeris/geocentric-moon.ts')).geocentricMoonAt;
}

export function startOrbitDownloads(form: HTMLFormElement, data: OrbitDownloadData): void {
  const note = form.querySelector<HTMLElement>('[data-role="download-note"]')!;
  const field = (name: string) => (form.elements.namedItem(name) as HTMLInputElement | HTMLSelectElement).value;
  let busy = false;

  const make = async (format: Format) => {
    if (busy) return;
    busy = true;
    form.dataset.busy = 'true';
    note.classList.remove('error');
    try {
      const periods = readNumber(field('periods'), 'span (periods)', 'a number in (0, 1000]', (v) => v > 0 && v <= 1000);
      const step = readNumber(field('step'), 'step', 'a positive number', (v) => v > 0);
      const stepUnit = field('stepUnit') as StepUnit;
      if (!STEP_UNITS.includes(stepUnit)) throw new RangeError(`step unit: "${stepUnit}" is not allowed (allowed: ${STEP_UNITS.join(', ')})`);
      const frame = field('frame') as StateFrame;
      const startEpochMicros = withField('start epoch', () => parseEpochMicros(field('epoch')));
      // OEM and the EME2000 frame are in km and km/s by definition.
      const units = (format === 'oem' || frame === 'eme2000' ? 'km' : field('units')) as StateUnits;
      const t0 = performance.now();
      const moonAt = await moonForFrame(frame);
      const series = withField('step', () => stateSeries(
        data.orbit, { frame, units, startEpochMicros, span: { periods, stepS: stepSeconds(step, stepUnit, data.orbit.timeUnitS) } }, moonAt,
      ));
      const text = format === 'csv' ? formatStateCsv(series) : format === 'json' ? formatStateJson(series) : formatStateOem(series, Date.now() * 1000);
      saveTextFile(`${data.fileStem}-${frame}-${units}.${format}`, MIME[format], text);
      note.textContent = `${series.count.toLocaleString('en-US')} states, ${frame}, ${units === 'km' ? 'km and km/s' : 'LU and LU/TU'}, computed in ${(performance.now() - t0).toFixed(0)} ms.`;
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
