// Placeholder until the supply pages land: the router exists so app.tsx can mount it.
import { Hono } from 'hono';
import type { Deps } from '../deps';

export function supplyRoutes(_deps: Deps) {
  return new Hono();
}
