// How a stable window is named on the charts, their panels, tooltips and zoom buttons: "window 1", and with
// its altitude span "window 1: 400–590 km" (counted from 1 in the family's window order).
import type { ChartWindow } from './chart-input.ts';

const km = (v: number) => Math.round(v).toLocaleString('en-US');

export function windowLabel(index: number | null): string {
  return index === null ? 'outside the listed windows' : `window ${index + 1}`;
}

export function windowSpanLabel(w: ChartWindow, index: number): string {
  return `${windowLabel(index)}: ${km(Math.min(w.fromAltKm, w.toAltKm))}–${km(Math.max(w.fromAltKm, w.toAltKm))} km`;
}
