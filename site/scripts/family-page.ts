// The family page's scripts: the chart runtime loads on the first pointer, touch or focus on a chart, or
// on a zoom button; the zoom buttons (shown only with JavaScript) redraw the charts over one stable window.
import { onFirstInteraction } from './on-first-interaction.ts';

type ChartsClient = typeof import('./family-charts-client.ts');

export function startFamilyPage(grid: HTMLElement, zoomBar: HTMLElement | null): void {
  let client: Promise<ChartsClient> | null = null;
  const load = () => (client ??= import('./family-charts-client.ts').then(async (m) => {
    await m.hydrateFamilyCharts(grid);
    return m;
  }));
  onFirstInteraction(grid, () => void load());
  if (!zoomBar) return;
  zoomBar.hidden = false;
  zoomBar.addEventListener('click', (event) => {
    const button = (event.target as HTMLElement).closest<HTMLButtonElement>('button[data-zoom]');
    if (!button) return;
    const index = button.dataset.zoom === 'family' ? null : Number(button.dataset.zoom);
    for (const b of Array.from(zoomBar.querySelectorAll('button[data-zoom]'))) b.setAttribute('aria-pressed', String(b === button));
    void load().then((m) => m.zoomFamilyCharts(grid, index));
  });
}
