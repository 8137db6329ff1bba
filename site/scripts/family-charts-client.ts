// Makes the family page's build-time SVG charts interactive: vega-embed (bundled, no CDN) re-renders each
// spec in place with tooltips and clickable points. Without JavaScript the static SVG stays.
import embed from 'vega-embed';

export async function hydrateFamilyCharts(root: ParentNode): Promise<void> {
  const hosts = Array.from(root.querySelectorAll<HTMLElement>('[data-chart-spec]'));
  for (const host of hosts) {
    const specElement = document.getElementById(host.dataset.chartSpec ?? '');
    if (!specElement?.textContent) continue;
    const target = document.createElement('div');
    try {
      await embed(target, JSON.parse(specElement.textContent), { actions: false, renderer: 'svg', mode: 'vega-lite' });
      host.replaceChildren(target);
      host.dataset.interactive = 'true';
    } catch (error) {
      host.dataset.interactive = 'failed';
      console.error('chart could not be made interactive', error);
    }
  }
}
