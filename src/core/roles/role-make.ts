// Building design roles: the requirement line from the rules, and values grouped for the grouped roles.
import { formatValue } from '../units';
import type { DesignRole, GroupValue, RoleRule } from './types';

/** A rating for messages: SI prefixes, except fractions shown in per cent (0.05 -> "5 %"). */
export const f = (v: number, unit: string) =>
  unit === '%' ? `${Number((v * 100).toPrecision(4))} %` : formatValue(v, unit);

const ruleText = (r: RoleRule): string => {
  if (r.op === 'oneOf')
    return `${r.label} ${
      r.cover && r.cover.length > 1 ? r.cover.map((g) => `${g.count} × ${g.value}`).join(' + ') : r.options.join('/')
    }`;
  if (r.op === 'eachOf')
    return `${r.label} ${r.values.map((g) => `${g.count} × ${groupText(g, r.unit)}`).join(' + ')} ±` +
      `${Math.round(r.tolerance * 1000) / 10} %`;
  if (r.op === 'near') return `${r.label} ${f(r.limit, r.unit)} ±${Math.round(r.tolerance * 100)} %`;
  return `${r.label} ${r.op === 'min' ? '≥' : '≤'} ${f(r.limit, r.unit)}`;
};
const text = (rules: RoleRule[]) => rules.map(ruleText).join(', ');

/** A group's value with the text ratings that go with it: "2.5 A T". */
export function groupText(g: GroupValue<number | string>, unit: string): string {
  return [typeof g.value === 'number' ? f(g.value, unit) : g.value, ...Object.values(g.with ?? {})].join(' ');
}

export const role = (
  id: string,
  label: string,
  category: DesignRole['category'],
  stageId: string | null,
  qtyPerRig: number,
  rules: RoleRule[],
  extra = '',
): DesignRole => ({
  id,
  label,
  category,
  stageId,
  qtyPerRig,
  rules,
  requirement: [text(rules), extra].filter(Boolean).join('; '),
});

export const finite = (v: number | null | undefined): v is number =>
  typeof v === 'number' && Number.isFinite(v) && v > 0;

/** Values grouped with their count and places, in the order first met (numbers grouped to 6 significant digits). */
export function groupValues<T extends number | string>(
  items: readonly { value: T; where: string; with?: Record<string, string> }[],
): GroupValue<T>[] {
  const out = new Map<string, GroupValue<T>>();
  for (const it of items) {
    const key = `${typeof it.value === 'number' ? it.value.toPrecision(6) : String(it.value)}\u0000` +
      `${JSON.stringify(it.with ?? {})}`;
    const g = out.get(key);
    if (g) out.set(key, { ...g, count: g.count + 1, where: `${g.where}, ${it.where}` });
    else out.set(key, { value: it.value, count: 1, where: it.where, ...(it.with ? { with: it.with } : {}) });
  }
  return [...out.values()];
}
