// Parts catalog forms: ratings lists, price breaks, money and exchange rates as typed -> model values.
import { z } from 'zod';
import type { PriceBreak, Project } from '../core/model';
import { parseValue } from '../core/units';
import { num, pct, text } from './form';

const bad = (ctx: z.RefinementCtx, message: string) => {
  ctx.addIssue({ code: 'custom', message });
  return z.NEVER;
};

export const currencyCode = (label: string) =>
  z
    .string({ message: `${label}: missing` })
    .transform((s) => s.trim().toUpperCase())
    .pipe(z.string().regex(/^[A-Z]{3}$/, `${label} must be a three-letter code such as USD or EUR`));

/** "0.95", "12", "0,95" -> cents; more than two decimals is refused (prices are kept in whole cents). */
export function moneyToCents(input: string): { ok: true; cents: number } | { ok: false; message: string } {
  const t = input.trim().replace(',', '.');
  const m = /^(\d+)(?:\.(\d*))?$/.exec(t);
  if (!m) return { ok: false, message: `"${input.trim()}" is not an amount (write e.g. 0.95)` };
  if ((m[2] ?? '').length > 2) return { ok: false, message: `"${input.trim()}" has more than two decimals; amounts are kept in whole cents` };
  const cents = Number(m[1]) * 100 + Number((m[2] ?? '').padEnd(2, '0'));
  return Number.isSafeInteger(cents) ? { ok: true, cents } : { ok: false, message: `"${input.trim()}" is too large` };
}


/** Split a list on newlines and ";", and on "," only where `next` starts the following item. */
function splitList(s: string, next: RegExp): string[] {
  return s
    .split(new RegExp(`[;\\n]|,(?=${next.source})`))
    .map((x) => x.trim())
    .filter((x) => x !== '');
}

// ------------------------------------------------------------ ratings: "va=70; ratedA=10; type=T"

// One rating: key = "quoted text" (JSON string, may hold ; , or look like a number) or plain text up to the next
// ";", newline or ", key=".
const RATING = /([A-Za-z][\w.-]*)\s*=\s*("(?:[^"\\\n]|\\.)*"|(?:(?!,\s*[A-Za-z][\w.-]*\s*=)[^;\n])*)/y;

export function parseRatings(s: string): { ok: true; ratings: Record<string, number | string> } | { ok: false; message: string } {
  const ratings: Record<string, number | string> = {};
  const text = s.trim();
  let i = 0;
  while (i < text.length) {
    i += /^[\s;,]*/.exec(text.slice(i))![0].length;
    if (i >= text.length) break;
    RATING.lastIndex = i;
    const m = RATING.exec(text);
    if (!m) return { ok: false, message: `"${text.slice(i).split(/[;\n]/)[0].trim()}" is not key=value (e.g. voltageV=35)` };
    i = RATING.lastIndex;
    const key = m[1];
    const raw = m[2].trim();
    if (key in ratings) return { ok: false, message: `"${key}" is given twice` };
    if (raw === '') return { ok: false, message: `"${key}" has no value` };
    if (raw.startsWith('"')) {
      ratings[key] = JSON.parse(raw) as string;
      continue;
    }
    const n = parseValue(raw, '');
    ratings[key] = n.ok ? n.value : raw;
  }
  return { ok: true, ratings };
}

// ------------------------------------------------------------ price breaks: "1: 0.95, 10: 0.78, 100: 0.52"

export function parseBreaks(s: string): { ok: true; breaks: PriceBreak[] } | { ok: false; message: string } {
  const items = splitList(s, /[^,:;=@\n]+[:=@]/);
  if (!items.length) return { ok: false, message: 'Price breaks: enter at least one "quantity: unit price", e.g. 1: 0.95, 10: 0.78' };
  const breaks: PriceBreak[] = [];
  for (const item of items) {
    const m = /^(\d+)\s*(?:\+|pcs)?\s*[:=@]\s*(.+)$/.exec(item);
    if (!m) return { ok: false, message: `Price breaks: "${item}" is not "quantity: unit price" (e.g. 10: 0.78)` };
    const minQty = Number(m[1]);
    if (!Number.isSafeInteger(minQty) || minQty < 1) return { ok: false, message: `Price breaks: quantity "${m[1]}" must be a whole number of at least 1` };
    const price = moneyToCents(m[2]);
    if (!price.ok) return { ok: false, message: `Price breaks: ${price.message}` };
    if (breaks.some((b) => b.minQty === minQty)) return { ok: false, message: `Price breaks: quantity ${minQty} is given twice` };
    breaks.push({ minQty, unitPriceCents: price.cents });
  }
  return { ok: true, breaks: breaks.sort((a, b) => a.minQty - b.minQty) };
}


// ------------------------------------------------------------ exchange rates: "EUR = 1.08"

export function parseRates(s: string): { ok: true; rates: Record<string, number> } | { ok: false; message: string } {
  const rates: Record<string, number> = {};
  for (const item of splitList(s, /\s*[A-Za-z]{3}\s*=/)) {
    const m = /^([A-Za-z]{3})\s*=\s*([0-9]*[.,]?[0-9]+(?:[eE][+-]?\d+)?)$/.exec(item);
    if (!m) return { ok: false, message: `"${item}" is not CODE = rate (e.g. EUR = 1.08)` };
    const code = m[1].toUpperCase();
    const rate = Number(m[2].replace(',', '.'));
    if (!(rate > 0) || !Number.isFinite(rate)) return { ok: false, message: `${code}: the rate must be more than 0` };
    if (code in rates) return { ok: false, message: `${code} is given twice` };
    rates[code] = rate;
  }
  return { ok: true, rates };
}


// ------------------------------------------------------------ schemas

const refine = <T>(parse: (s: string) => ({ ok: true } & T) | { ok: false; message: string }) =>
  z.string().default('').transform((s, ctx) => {
    const r = parse(s);
    return r.ok ? r : bad(ctx, r.message);
  });

export const partSchema = z.object({
  description: text('Description', 300),
  category: text('Category', 60),
  ratings: refine(parseRatings).transform((r) => r.ratings),
});

const wholeCount = (label: string) => num('', { label, min: 1, max: 1_000_000, integer: true });

export const offerSchema = z.object({
  supplier: text('Supplier', 120),
  sku: text('SKU', 120, false),
  currency: currencyCode('Currency'),
  breaks: refine(parseBreaks).transform((r) => r.breaks),
  minOrder: wholeCount('Minimum order'),
  orderMultiple: wholeCount('Order multiple'),
  stockNote: text('Stock note', 200, false),
});

export const supplierSchema = z.object({
  name: text('Supplier name', 120),
  shipping: z.string({ message: 'Shipping: missing' }).transform((s, ctx) => {
    const r = moneyToCents(s);
    return r.ok ? r.cents : bad(ctx, `Shipping: ${r.message}`);
  }),
  currency: currencyCode('Currency'),
});

export const costingSchema = z.object({
  attrition: pct({ label: 'Attrition allowance', min: 0, max: 100 }),
  spares: num('', { label: 'Spares per line', min: 0, max: 10_000, integer: true }),
  rates: refine(parseRates).transform((r) => r.rates),
});

// ------------------------------------------------------------ who uses what

/** Parts-list lines that use part `partId`, in words. */
export function partUsers(p: Project, partId: string): string[] {
  const stageName = (id: string | null) => (id === null ? 'General' : (p.stages.find((s) => s.id === id)?.name ?? 'a deleted stage'));
  return p.bom
    .filter((l) => l.partId === partId)
    .map((l) => `parts-list line ${l.refs ? `“${l.refs}”` : '(no designators)'} in ${stageName(l.stageId)}, ${l.qtyPerRig} per rig`);
}

export function supplierUsers(p: Project, name: string): string[] {
  const key = name.trim().toLowerCase();
  return p.parts.flatMap((part) => part.offers.filter((o) => o.supplier.trim().toLowerCase() === key).map((o) => `offer ${o.sku ? `“${o.sku}” ` : ''}for “${part.description}”`));
}
