// Layers every family chart is made of: the |ν| < 1 band, stable-window columns, the family line in
// member order, the members (clickable, with tooltips) and the bifurcation points.
import type { ChartBifurcation, ChartMember, ChartWindow } from './chart-input.ts';
import { classColor, classShape, type ChartClasses } from './chart-classes.ts';
import { BAND_FILL, FAMILY_LINE, WINDOW_FILL, memberTooltip, memberValues } from './chart-style.ts';

/** A position channel: field name in the member rows plus the axis (title with units, scale). */
export interface Channel {
  field: keyof ChartMember;
  title: string;
  scale: Record<string, unknown>;
  axis?: Record<string, unknown>;
}

const q = (field: string, channel: Channel) => ({
  field,
  type: 'quantitative' as const,
  title: channel.title,
  scale: channel.scale,
  ...(channel.axis ? { axis: channel.axis } : {}),
});

export function bandLayer(y: Channel) {
  return {
    data: { values: [{ lo: -1, hi: 1 }] },
    mark: { type: 'rect', fill: BAND_FILL, opacity: 0.9, clip: true }, // the axis may end inside the band
    encoding: { y: q('lo', y), y2: { field: 'hi' } },
  };
}

/** Stable windows as columns across the whole height; from/to read from the window rows. */
export function windowLayer(windows: ChartWindow[], x: Channel, from: keyof ChartWindow, to: keyof ChartWindow) {
  return {
    data: { values: windows.map((w) => ({ lo: Math.min(w[from], w[to]), hi: Math.max(w[from], w[to]) })) },
    mark: { type: 'rect', fill: WINDOW_FILL, opacity: 0.45 },
    encoding: { x: q('lo', x), x2: { field: 'hi' } },
  };
}

export function familyLineLayer(members: ChartMember[], x: Channel, y: Channel) {
  return {
    data: { values: members.map((m) => ({ [x.field]: m[x.field], [y.field]: m[y.field], seq: m.seq })) },
    mark: { type: 'line', stroke: FAMILY_LINE, strokeWidth: 1, interpolate: 'linear' },
    encoding: { x: q(x.field, x), y: q(y.field, y), order: { field: 'seq', type: 'quantitative' } },
  };
}

export function memberLayer(
  members: ChartMember[], x: Channel, y: Channel, classes: ChartClasses, secondaryName: string,
) {
  return {
    data: { values: memberValues(members, classes) },
    mark: { type: 'point', filled: true, size: 38, opacity: 1, cursor: 'pointer' },
    encoding: {
      x: q(x.field, x),
      y: q(y.field, y),
      color: classColor(classes),
      shape: classShape(classes),
      href: { field: 'href', type: 'nominal' },
      tooltip: memberTooltip(secondaryName),
    },
  };
}

/** Bifurcation points at their own x, with y taken from `yOf` (e.g. ν = ±1 on the index charts); null
 *  when the chart draws none of them. */
export function bifurcationLayer(
  all: ChartBifurcation[], xField: keyof ChartBifurcation, x: Channel, y: Channel,
  yOf: (b: ChartBifurcation) => number, classes: ChartClasses,
) {
  const bifurcations = all.filter(classes.showsBifurcation);
  if (bifurcations.length === 0) return null;
  return {
    data: {
      values: bifurcations.map((b) => ({
        bx: b[xField], by: yOf(b), cls: b.kind === 'tangent' ? classes.tangent : classes.doubling,
        kind: b.kind, plane: b.plane, jacobi: b.jacobi, altKm: b.altKm, periodDays: b.periodDays,
      })),
    },
    mark: { type: 'point', filled: true, size: 70, stroke: '#ffffff', strokeWidth: 0.8 },
    encoding: {
      x: q('bx', x),
      y: q('by', y),
      color: classColor(classes),
      shape: classShape(classes),
      tooltip: [
        { field: 'kind', title: 'bifurcation' },
        { field: 'plane', title: 'index' },
        { field: 'altKm', type: 'quantitative', title: 'min. altitude (km)', format: ',.1f' },
        { field: 'jacobi', type: 'quantitative', title: 'Jacobi constant C', format: '.8~f' },
        { field: 'periodDays', type: 'quantitative', title: 'period (days)', format: '.4f' },
      ],
    },
  };
}
