// Makes build-time chart pictures interactive: vega-embed (bundled, no CDN) re-renders each spec in place
// with tooltips and clickable points. A host names its spec either inline (data-chart-spec: the id of a
// JSON script element) or by key (data-chart-key) in the specs file the root names (data-specs-src).
// Without JavaScript the static picture stays.
import embed from 'vega-embed';

async function specsFile(root: ParentNode): Promise<Record<string, unknown> | null> {
  const src = root instanceof HTMLElement ? root.dataset.specsSrc : undefined;
  if (!src) return null;
  const response = await fetch(src);
  if (!response.ok) throw new Error(`chart specs: HTTP ${response.status}`);
  return (await response.json()) as Record<string, unknown>;
}

function inlineSpec(host: HTMLElement): unknown {
  const element = document.getElementById(host.dataset.chartSpec ?? '');
  return element?.textContent ? JSON.parse(element.textContent) : undefined;
}

export async function hydrateFamilyCharts(root: ParentNode): Promise<void> {
  const hosts = Array.from(root.querySelectorAll<HTMLElement>('[data-chart-spec], [data-chart-key]'));
  let specs: Record<string, unknown> | null = null;
  try {
    specs = await specsFile(root);
  } catch (error) {
    console.error('chart specs could not be loaded', error);
  }
  for (const host of hosts) {
    const spec = host.dataset.chartSpec ? inlineSpec(host) : specs?.[host.dataset.chartKey ?? ''];
    if (spec === undefined) continue;
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
}
