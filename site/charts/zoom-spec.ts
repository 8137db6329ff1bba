// A family chart zoomed onto a stretch of its x axis (a stable window and its margins): the same spec
// with a linear x scale over that span, every layer clipped to the plot so what lies outside is not drawn
// over the axes. Runs in the browser (the zoom buttons) and in tests; the spec given is not changed.
type Layer = { mark?: unknown; encoding?: Record<string, unknown> };

export type ZoomAxis = 'altKm' | 'jacobi';

/** Which field a chart's x axis shows, so the zoom can pick the window's span on it; null: not zoomable. */
export function zoomAxisOf(spec: Record<string, unknown>): ZoomAxis | null {
  const layers = (spec.layer as Layer[] | undefined) ?? [];
  for (const layer of layers) {
    const field = (layer.encoding?.x as { field?: string } | undefined)?.field;
    if (field === 'altKm' || field === 'jacobi') return field;
  }
  return null;
}

export function zoomSpec(spec: Record<string, unknown>, span: [number, number]): Record<string, unknown> {
  const copy = structuredClone(spec) as Record<string, unknown> & { layer?: Layer[] };
  for (const layer of copy.layer ?? []) {
    const x = layer.encoding?.x as { scale?: Record<string, unknown>; axis?: Record<string, unknown> } | undefined;
    if (x) {
      x.scale = { type: 'linear', domain: span, nice: false, zero: false };
      x.axis = { ...(x.axis ?? {}), format: ',~r', tickCount: 5, labelOverlap: 'greedy' };
    }
    const mark = typeof layer.mark === 'string' ? { type: layer.mark } : (layer.mark as Record<string, unknown> | undefined);
    if (mark) layer.mark = { ...mark, clip: true };
  }
  return copy;
}
