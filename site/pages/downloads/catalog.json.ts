// downloads/catalog.json: the whole catalog through catalog-db's JSON export.
import type { APIRoute } from 'astro';
import { catalogJsonText } from '../../lib/catalog-json-text.ts';

export const GET: APIRoute = () => new Response(catalogJsonText(), { headers: { 'Content-Type': 'application/json' } });
