// Every link and asset goes through here so the site works under any base path (CYCLER_ATLAS_BASE).

/** The configured base path, always ending with '/'. */
export function basePath(): string {
  // import.meta.env exists under Vite/Astro; plain Node (scripts, benches) gets the root.
  const base = import.meta.env?.BASE_URL ?? '/';
  return base.endsWith('/') ? base : `${base}/`;
}

/** `relative` (no leading slash) joined to the base path. */
export function withBase(relative: string): string {
  return basePath() + relative.replace(/^\/+/, '');
}
