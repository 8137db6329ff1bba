// What the section plot of a screened orbit is drawn from, and the data window both renderings share
// (the build's plain SVG and the Vega-Lite spec used in the browser), so the two show the same picture.

export interface SectionPlotPoint {
  xKm: number; // x on the section (rotating frame, from the barycentre)
  vxMS: number; // ẋ on the section (m/s)
}

export interface SectionPlotInput {
  points: SectionPlotPoint[];
  fixedPoint: SectionPlotPoint;
  /** The hold radius is a displacement along +x from the fixed point (ẋ unchanged). */
  holdRadiusKm: number;
  returns: number;
  memberLabel: string; // e.g. "member #12"
}

export interface SectionPlotDomain {
  x: [number, number];
  y: [number, number];
}

function padded(values: number[], minHalfWidth: number): [number, number] {
  const finite = values.filter(Number.isFinite);
  let lo = Math.min(...finite);
  let hi = Math.max(...finite);
  const half = Math.max((hi - lo) / 2, minHalfWidth);
  const mid = (hi + lo) / 2;
  lo = mid - half * 1.08;
  hi = mid + half * 1.08;
  return [Number(lo.toPrecision(10)), Number(hi.toPrecision(10))];
}

export function sectionPlotDomain(input: SectionPlotInput): SectionPlotDomain {
  const xs = [...input.points.map((p) => p.xKm), input.fixedPoint.xKm, input.fixedPoint.xKm + input.holdRadiusKm];
  const ys = [...input.points.map((p) => p.vxMS), input.fixedPoint.vxMS];
  // A degenerate window (no curve) still gets some width: 1 km and 1 m/s either side, or 1e-6 of the value.
  return {
    x: padded(xs, Math.max(1, 1e-6 * Math.abs(input.fixedPoint.xKm))),
    y: padded(ys, Math.max(0.01, 1e-6 * Math.abs(input.fixedPoint.vxMS))),
  };
}
