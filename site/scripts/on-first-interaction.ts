// Runs `start` once, the first time a reader points at, touches or focuses `element`: the family page
// loads the chart runtime (vega, ~880 KB) only then, so the first load stays small.
const EVENTS = ['pointerover', 'touchstart', 'focusin'] as const;

export function onFirstInteraction(element: HTMLElement, start: () => void): void {
  const once = () => {
    for (const type of EVENTS) element.removeEventListener(type, once);
    start();
  };
  for (const type of EVENTS) element.addEventListener(type, once, { passive: true });
}
