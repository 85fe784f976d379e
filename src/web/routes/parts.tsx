// Placeholder until the parts pages land: the router exists so app.tsx can mount it.
import { Hono } from 'hono';
import type { Deps } from '../deps';

export function partsRoutes(_deps: Deps) {
  return new Hono();
}
