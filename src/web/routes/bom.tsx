// Placeholder until the bom pages land: the router exists so app.tsx can mount it.
import { Hono } from 'hono';
import type { Deps } from '../deps';

export function bomRoutes(_deps: Deps) {
  return new Hono();
}
