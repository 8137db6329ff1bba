// Makes build-time chart pictures interactive: vega-embed (bundled, no CDN) re-renders each spec in place
// with tooltips and clickable points. A host names its spec either inline (data-chart-spec: the id of a
// JSON script element) or by key (data-chart-key) in the specs file the root names (data-specs-src), which
// also lists the stable windows the family charts can be zoomed onto. Without JavaScript the picture stays.
import embed from 'vega-embed';
import { zoomAxisOf, zoomSpec } from '../charts/zoom-spec.ts';
import type { FamilyChartsFile } from '../lib/family-charts-file.ts';

const loaded = new WeakMap<object, FamilyChartsFile | null>();

async function specsFile(root: ParentNode): Promise<FamilyChartsFile | null> {
  if (loaded.has(root)) return loaded.get(root)!;
  const src = root instanceof HTMLElement ? root.dataset.specsSrc : undefined;
  let file: FamilyChartsFile | null = null;
  if (src) {
    try {
      const response = await fetch(src);
      if (!response.ok) throw new Error(`HTTP ${response.status}`);
      file = (await response.json()) as FamilyChartsFile;
    } catch (error) {
      console.error('chart specs could not be loaded', error);
    }
  }
  loaded.set(root, file);
  return file;
}

function inlineSpec(host: HTMLElement): Record<string, unknown> | undefined {
  const element = document.getElementById(host.dataset.chartSpec ?? '');
  return element?.textContent ? JSON.parse(element.textContent) : undefined;
}

async function draw(host: HTMLElement, spec: Record<string, unknown>): Promise<void> {
  const target = document.createElement('div');
  try {
    await embed(target, spec as never, { actions: false, renderer: 'svg', mode: 'vega-lite' });
    host.replaceChildren(target);
    host.dataset.interactive = 'true';
  } catch (error) {
    host.dataset.interactive = 'failed';
    console.error('chart could not be made interactive', error);
  }
}

export async function hydrateFamilyCharts(root: ParentNode): Promise<void> {
  const file = await specsFile(root);
  for (const host of Array.from(root.querySelectorAll<HTMLElement>('[data-chart-spec], [data-chart-key]'))) {
    const spec = host.dataset.chartSpec ? inlineSpec(host) : file?.specs[host.dataset.chartKey ?? ''];
    if (spec !== undefined) await draw(host, spec);
  }
}

/** Redraws every zoomable chart over stable window `index` (its span on each chart's x axis), or the
 *  whole family for null. */
export async function zoomFamilyCharts(root: ParentNode, index: number | null): Promise<void> {
  const file = await specsFile(root);
  const window = index === null ? undefined : file?.windows[index];
  for (const host of Array.from(root.querySelectorAll<HTMLElement>('[data-chart-key]'))) {
    const spec = file?.specs[host.dataset.chartKey ?? ''];
    const axis = spec ? zoomAxisOf(spec) : null;
    if (!spec || axis === null) continue;
    await draw(host, window ? zoomSpec(spec, window[axis]) : spec);
    host.dataset.zoom = index === null ? 'family' : String(index);
  }
}
