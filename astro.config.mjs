import { defineConfig } from 'astro/config';

// The site's source lives in site/; the catalog database is read at build time through catalog-db/.
export default defineConfig({
  srcDir: './site',
  publicDir: './site/public',
  outDir: './dist',
  base: process.env.CYCLER_ATLAS_BASE ?? '/',
  trailingSlash: 'ignore',
  build: { format: 'directory' },
});
