// Build-time pictures of one period of an orbit: plain SVG geometry (paths, circles, ticks) for the
// rotating frame and for inertial axes centred on each body. Bodies are drawn to scale; a tick marks
// each elapsed day. Pure: numbers in, geometry out (the page component turns it into SVG markup).
import { bodyX, rotatingToBodyInertial, type FrameCentre } from '../../generator/core/state-export/body-inertial-frame.ts';
import { simplifyPolyline } from './simplify-polyline.ts';
import { polylinePath, roundTenth } from './svg-path.ts';

export interface TrajectorySamples {
  timesNd: Float64Array;
  states: Float64Array; // 6 per sample
}

export interface FigureBodies {
  mu: number;
  lengthUnitKm: number;
  timeUnitS: number;
  primaryName: string;
  secondaryName: string;
  primaryRadiusKm: number;
  secondaryRadiusKm: number;
}

export type FigureFrame = 'rotating' | FrameCentre;

export interface BodyMark {
  name: string;
  cx: number;
  cy: number;
  r: number; // to scale, px
}

export interface TrajectoryFigure {
  frame: FigureFrame;
  width: number;
  height: number;
  pathD: string;
  tickD: string;
  tickCount: number;
  start: [number, number];
  bodies: BodyMark[];
  /** Circle the other body follows (inertial figures only), px. */
  track: { cx: number; cy: number; r: number } | null;
  scaleBar: { x: number; y: number; length: number; label: string };
  planarProjection: boolean;
}

export interface FigureOptions {
  width: number; // px of the viewBox
  tolerancePx: number; // polyline simplification
  tickLengthPx: number; // 0: no day ticks
  minAspect: number;
  maxAspect: number;
  margin: number; // px
}

export const ORBIT_PAGE_FIGURE: FigureOptions = {
  width: 420, tolerancePx: 0.3, tickLengthPx: 7, minAspect: 0.55, maxAspect: 1.05, margin: 14,
};
export const THUMBNAIL_FIGURE: FigureOptions = {
  width: 120, tolerancePx: 0.5, tickLengthPx: 0, minAspect: 0.6, maxAspect: 1, margin: 4,
};

/** Positions (x, y interleaved, LU) of the samples in the chosen frame. */
function framePositions(samples: TrajectorySamples, mu: number, frame: FigureFrame): Float64Array {
  const n = samples.timesNd.length;
  const xy = new Float64Array(2 * n);
  const tmp = new Float64Array(6);
  for (let i = 0; i < n; i++) {
    if (frame === 'rotating') {
      xy[2 * i] = samples.states[6 * i];
      xy[2 * i + 1] = samples.states[6 * i + 1];
    } else {
      rotatingToBodyInertial(mu, frame, samples.timesNd[i], samples.states, 6 * i, tmp, 0);
      xy[2 * i] = tmp[0];
      xy[2 * i + 1] = tmp[1];
    }
  }
  return xy;
}

/** A length of 1, 2 or 5 × 10^k km near a quarter of the span. */
function niceLengthKm(spanKm: number): number {
  const target = spanKm / 4;
  const p = 10 ** Math.floor(Math.log10(target));
  const m = target / p;
  return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * p;
}

export function trajectoryFigure(
  samples: TrajectorySamples, bodies: FigureBodies, frame: FigureFrame, options: FigureOptions = ORBIT_PAGE_FIGURE,
): TrajectoryFigure {
  const { mu, lengthUnitKm } = bodies;
  const n = samples.timesNd.length;
  const xy = framePositions(samples, mu, frame);
  const bodyList = (['primary', 'secondary'] as const).map((key) => ({
    key,
    name: key === 'primary' ? bodies.primaryName : bodies.secondaryName,
    // In an inertial figure the centre body sits at the origin.
    x: frame === 'rotating' ? bodyX(mu, key) : 0,
    rLu: (key === 'primary' ? bodies.primaryRadiusKm : bodies.secondaryRadiusKm) / lengthUnitKm,
  }));
  // Inertial figures show the centre body; the other body moves on a unit circle, drawn as its track.
  const shown = frame === 'rotating' ? bodyList : bodyList.filter((b) => b.key === frame);

  let minX = Infinity, maxX = -Infinity, minY = Infinity, maxY = -Infinity;
  for (let i = 0; i < n; i++) {
    const x = xy[2 * i], y = xy[2 * i + 1];
    if (x < minX) minX = x;
    if (x > maxX) maxX = x;
    if (y < minY) minY = y;
    if (y > maxY) maxY = y;
  }
  for (const b of shown) {
    minX = Math.min(minX, b.x - b.rLu);
    maxX = Math.max(maxX, b.x + b.rLu);
    minY = Math.min(minY, -b.rLu);
    maxY = Math.max(maxY, b.rLu);
  }
  let spanX = Math.max(maxX - minX, 1e-9);
  let spanY = Math.max(maxY - minY, 1e-9);
  // Equal scales on both axes; pad the narrow direction so the aspect stays in [minAspect, maxAspect].
  const aspect = Math.min(options.maxAspect, Math.max(options.minAspect, spanY / spanX));
  if (spanY / spanX < aspect) {
    const grow = spanX * aspect - spanY;
    minY -= grow / 2;
    spanY += grow;
  } else if (spanY / spanX > aspect) {
    const grow = spanY / aspect - spanX;
    minX -= grow / 2;
    spanX += grow;
  }
  const width = options.width;
  const inner = width - 2 * options.margin;
  const scale = inner / spanX; // px per LU
  const height = Math.round(spanY * scale + 2 * options.margin);
  const px = (x: number) => options.margin + (x - minX) * scale;
  const py = (y: number) => height - options.margin - (y - minY) * scale; // y up

  const screen = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    screen[2 * i] = px(xy[2 * i]);
    screen[2 * i + 1] = py(xy[2 * i + 1]);
  }
  const pathD = polylinePath(simplifyPolyline(screen, options.tolerancePx));

  // One tick per elapsed day, across the path, at positions interpolated between samples.
  let tickD = '';
  let tickCount = 0;
  if (options.tickLengthPx > 0 && n > 1) {
    const dayNd = 86400 / bodies.timeUnitS;
    const tEnd = samples.timesNd[n - 1];
    let j = 0;
    for (let k = 1; k * dayNd < tEnd; k++) {
      const t = k * dayNd;
      while (j < n - 2 && samples.timesNd[j + 1] < t) j++;
      const t0 = samples.timesNd[j], t1 = samples.timesNd[j + 1];
      const f = (t - t0) / (t1 - t0);
      const ax = screen[2 * j], ay = screen[2 * j + 1], bx = screen[2 * j + 2], by = screen[2 * j + 3];
      const cx = ax + f * (bx - ax), cy = ay + f * (by - ay);
      const len = Math.hypot(bx - ax, by - ay) || 1;
      const nx = (-(by - ay) / len) * (options.tickLengthPx / 2);
      const ny = ((bx - ax) / len) * (options.tickLengthPx / 2);
      tickD += `M${roundTenth(cx - nx)} ${roundTenth(cy - ny)}L${roundTenth(cx + nx)} ${roundTenth(cy + ny)}`;
      tickCount++;
    }
  }

  const bodyMarks = shown.map((b) => ({ name: b.name, cx: roundTenth(px(b.x)), cy: roundTenth(py(0)), r: Math.max(0.01, roundTenth(b.rLu * scale * 10) / 10) }));
  const track = frame === 'rotating' ? null : { cx: roundTenth(px(0)), cy: roundTenth(py(0)), r: roundTenth(scale) };
  const spanKm = spanX * lengthUnitKm;
  const barKm = niceLengthKm(spanKm);
  let planar = true;
  for (let i = 0; i < n && planar; i++) if (samples.states[6 * i + 2] !== 0) planar = false;
  return {
    frame,
    width,
    height,
    pathD,
    tickD,
    tickCount,
    start: [roundTenth(screen[0]), roundTenth(screen[1])],
    bodies: bodyMarks,
    track,
    scaleBar: {
      x: options.margin,
      y: height - options.margin / 2 - 2,
      length: roundTenth((barKm / lengthUnitKm) * scale),
      label: `${barKm.toLocaleString('en-US')} km`,
    },
    planarProjection: !planar,
  };
}

export { bodyX };
