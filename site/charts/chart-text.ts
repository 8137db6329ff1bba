// Text alternatives for the family charts: what a reader without the picture needs to know.
import { formatStabilityIndex } from '../format/format-stability-index.ts';
import type { FamilyChartInput } from './chart-input.ts';

const fmtKm = (v: number) => `${v.toLocaleString('en-US', { maximumFractionDigits: 0 })} km`;
const fmtG = (v: number) => (Math.abs(v) >= 1e4 || (Math.abs(v) < 1e-3 && v !== 0) ? v.toExponential(2) : String(Number(v.toPrecision(4))));

function span(values: number[], format: (v: number) => string): string {
  if (values.length === 0) return 'none';
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  return lo === hi ? format(lo) : `${format(lo)} to ${format(hi)}`;
}

function windowsText(input: FamilyChartInput, by: 'alt' | 'jacobi'): string {
  if (input.windows.length === 0) return 'No stable window.';
  const parts = input.windows.map((w) =>
    by === 'alt' ? `${fmtKm(w.fromAltKm)} to ${fmtKm(w.toAltKm)}` : `C ${fmtG(w.fromJacobi)} to ${fmtG(w.toJacobi)}`,
  );
  return `${input.windows.length} stable window${input.windows.length > 1 ? 's' : ''} (shaded columns): ${parts.join('; ')}.`;
}

function bifurcationText(input: FamilyChartInput, plane: 'in-plane' | 'vertical' | 'any'): string {
  const list = input.bifurcations.filter((b) => plane === 'any' || b.plane === plane);
  if (list.length === 0) return 'No bifurcation point.';
  return `Bifurcations: ${list.map((b) => `${b.kind} (${b.plane}) at ${fmtKm(b.altKm)}, C ${fmtG(b.jacobi)}`).join('; ')}.`;
}

function membersText(input: FamilyChartInput): string {
  return `${input.members.length} member${input.members.length === 1 ? '' : 's'}, minimum altitude above ${input.secondaryName} ${span(input.members.map((m) => m.altKm), fmtKm)}`;
}

export function stabilityChartText(input: FamilyChartInput): string {
  const stable = input.members.filter((m) => Math.abs(m.nu) < 1).length;
  return `In-plane stability index against minimum altitude. ${membersText(input)}; ν ${span(input.members.map((m) => m.nu), formatStabilityIndex)}; ${stable} member${stable === 1 ? '' : 's'} inside the band |ν| < 1. ${windowsText(input, 'alt')} ${bifurcationText(input, 'in-plane')}`;
}

export function verticalChartText(input: FamilyChartInput): string {
  const stable = input.members.filter((m) => Math.abs(m.nuV) < 1).length;
  return `Vertical stability index against minimum altitude. ${membersText(input)}; ν_z ${span(input.members.map((m) => m.nuV), formatStabilityIndex)}; ${stable} member${stable === 1 ? '' : 's'} with |ν_z| < 1. ${bifurcationText(input, 'vertical')}`;
}

export function jacobiChartText(input: FamilyChartInput): string {
  return `Jacobi constant against minimum altitude. ${membersText(input)}; C ${span(input.members.map((m) => m.jacobi), fmtG)}. ${windowsText(input, 'alt')}`;
}

export function periodChartText(input: FamilyChartInput): string {
  return `Period against Jacobi constant. ${input.members.length} members; C ${span(input.members.map((m) => m.jacobi), fmtG)}; period ${span(input.members.map((m) => m.periodDays), (v) => `${v.toFixed(3)} days`)}. ${windowsText(input, 'jacobi')}`;
}

export function windowZoomText(input: FamilyChartInput): string {
  const n = input.windows.length;
  return `In-plane stability index close up on ${n === 1 ? 'the stable window' : `each of the ${n} stable windows`}, one panel each, the window and a quarter of its width either side. ${windowsText(input, 'alt')}`;
}
