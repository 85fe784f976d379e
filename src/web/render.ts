// Rendering helpers: full pages carry a doctype; htmx requests get the partial alone.
import type { Context } from 'hono';
import { html } from 'hono/html';
import type { Child } from 'hono/jsx';
import type { ContentfulStatusCode } from 'hono/utils/http-status';

export const isHtmx = (c: Context) => c.req.header('HX-Request') === 'true';

export function sendPage(c: Context, node: Child, status: ContentfulStatusCode = 200) {
  return c.html(html`<!DOCTYPE html>${node}`, status);
}

export function sendPartial(c: Context, node: Child, status: ContentfulStatusCode = 200) {
  return c.html(html`${node}`, status);
}

/** Form body as plain strings (files are dropped; multi-valued fields keep the last value). */
export async function formValues(c: Context): Promise<Record<string, string>> {
  const body = await c.req.parseBody();
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(body)) {
    const last = Array.isArray(v) ? v[v.length - 1] : v;
    if (typeof last === 'string') out[k] = last;
  }
  return out;
}
