// The parts list against the design's roles: each bound part's ratings, read through its category's fields, rule by
// rule against the role's requirement; a role with no bound line, and a line bound to a role the design no longer
// has, are findings too.
import type { BomLine, Part, Project } from '../model';
import type { Finding, Severity } from '../findings';
import { categoryOf, readRatings } from '../spec/parts-categories';
import { f as formatValue, groupText } from './role-make';
import type { DesignRole, GroupValue, RoleRule, RoleStatus } from './types';

export interface RuleOutcome {
  rule: RoleRule;
  severity: Severity | 'missing';
  value: number | string | null;
}

const sev = (o: RuleOutcome['severity'], required: boolean): Severity | null =>
  o === 'missing' ? (required ? 'caution' : null) : o;

const nearValue = (v: number, target: number, tolerance: number) =>
  Math.abs(v - target) <= tolerance * Math.abs(target);
/**
 * A part's value in a group: near its value, and any text rating the group goes with the same where the part states it.
 */
const inGroup = (g: GroupValue<number>, v: number, tolerance: number, choices: Record<string, string>) =>
  nearValue(v, g.value, tolerance) &&
  Object.entries(g.with ?? {}).every(([k, want]) => choices[k] === undefined || choices[k] === want);

/** One rating of a part against one rule: 'missing' when the part does not state it. */
export function judgeRule(rule: RoleRule, part: Pick<Part, 'category' | 'ratings'>): RuleOutcome {
  const read = readRatings(part);
  if (rule.op === 'oneOf') {
    const v = read.choices[rule.key];
    if (v === undefined) return { rule, severity: 'missing', value: null };
    return { rule, severity: rule.options.includes(v) ? 'ok' : 'fail', value: v };
  }
  const v = read.numbers[rule.key];
  if (v === undefined) return { rule, severity: 'missing', value: null };
  if (rule.op === 'eachOf')
    return {
      rule,
      severity: rule.values.some((g) => inGroup(g, v, rule.tolerance, read.choices)) ? 'ok' : 'fail',
      value: v,
    };
  if (rule.op === 'near')
    return {
      rule,
      severity: Math.abs(v - rule.limit) <= rule.tolerance * Math.abs(rule.limit) ? 'ok' : 'fail',
      value: v,
    };
  if (rule.op === 'max') return { rule, severity: v <= rule.limit ? 'ok' : 'fail', value: v };
  if (v >= rule.limit) return { rule, severity: 'ok', value: v };
  return { rule, severity: rule.hardLimit !== undefined && v >= rule.hardLimit ? 'caution' : 'fail', value: v };
}

/**
 * For a grouped role (a rule asking for several values), the value a part has: the first such rule's value it is
 * within tolerance of, with its count and places; null when the role is not grouped or the part states none of them.
 */
export function groupOf(
  role: DesignRole,
  part: Pick<Part, 'category' | 'ratings'>,
): { key: string; value: number | string; count: number; where: string } | null {
  // values (ratings, resistances, capacitances) before text choices (fuse types): the more specific grouping
  const rules = [...role.rules.filter((r) => r.op === 'eachOf'), ...role.rules.filter((r) => r.op === 'oneOf')];
  for (const r of rules) {
    const groups = r.op === 'eachOf' ? r.values : r.op === 'oneOf' && r.cover ? r.cover : null;
    if (!groups || groups.length < 2) continue;
    const v = judgeRule(r, part).value;
    if (v === null) continue;
    const choices = readRatings(part).choices;
    const g = groups.find((x) =>
      typeof x.value === 'number'
        ? typeof v === 'number' && r.op === 'eachOf' && inGroup(x as GroupValue<number>, v, r.tolerance, choices)
        : x.value === v,
    );
    if (g) return { key: r.key, ...g };
  }
  return null;
}

/**
 * True when the part is of the role's category and meets every rule it states, with every required rating stated and
 * each value a grouped role asks for stated (a generic "values per the RF page" part is no candidate: it cannot be
 * checked).
 */
export function partMeetsRole(part: Pick<Part, 'category' | 'ratings'>, role: DesignRole): boolean {
  if (categoryOf(part.category).id !== role.category) return false;
  return role.rules.every((r) => {
    const o = judgeRule(r, part);
    return o.severity === 'ok' || (o.severity === 'missing' && !r.required && r.op !== 'eachOf');
  });
}

const show = (v: number | string, unit: string) => (typeof v === 'number' ? formatValue(v, unit) : v);
const pct = (t: number) => `±${Math.round(t * 1000) / 10} %`;
const limitText = (r: RoleRule) =>
  r.op === 'oneOf'
    ? r.options.join(' or ')
    : r.op === 'eachOf'
      ? `one of ${r.values.map((g) => groupText(g, r.unit)).join(', ')} (${pct(r.tolerance)})`
      : r.op === 'near'
        ? `${formatValue(r.limit, r.unit)} ${pct(r.tolerance)}`
        : `${r.op === 'min' ? 'at least' : 'at most'} ${formatValue(r.limit, r.unit)}`;

/** The line as a message names it: its designators, else its id, with the part. */
const lineName = (line: BomLine, part: Part) => `line ${line.refs.trim() || line.id} (${part.description})`;

/** "a", "a or b", "a, b or c". */
const orList = (xs: string[]) =>
  xs.length < 2 ? xs.join('') : `${xs.slice(0, -1).join(', ')} or ${xs[xs.length - 1]}`;

/**
 * The values a grouped role asks each line for (fuse ratings, capacitances) that a bound line's part does not state,
 * as one caution naming the line: a generic line ("values per the RF page") is never a silent pass. Required ratings
 * that are missing have their own caution per rating; other optional ratings (a core's size) stay unchecked.
 */
function unstatedFinding(role: DesignRole, line: BomLine, part: Part): Finding[] {
  const missing = role.rules.filter(
    (r) => r.op === 'eachOf' && !r.required && judgeRule(r, part).severity === 'missing',
  );
  if (!missing.length) return [];
  const names = orList(missing.map((r) => r.label.toLowerCase()));
  const needs = missing.map((r) => `${r.label.toLowerCase()} ${limitText(r)}`).join('; ');
  return [
    {
      severity: 'caution',
      rule: 'role.unstated',
      subject: `${role.label}: ${part.description}`,
      value: null,
      limit: null,
      unit: '',
      source: 'roles.binding',
      message: `The ${lineName(line, part)} does not state ${names}, so it cannot be checked against the design ` +
        `(${needs}): enter the ratings on the part or bind a candidate that states them.`,
    },
  ];
}

function lineFindings(role: DesignRole, part: Part, line: BomLine): Finding[] {
  const subject = `${role.label}: ${part.description}`;
  const def = categoryOf(part.category);
  if (def.id !== role.category)
    return [
      {
        severity: 'fail',
        rule: 'role.category',
        subject,
        value: null,
        limit: null,
        unit: '',
        source: 'roles.binding',
        message: `The bound part is in category "${part.category || 'none'}" (${def.label}); this role needs a ` +
          `${role.category}. Bind a ${role.category} from the candidates.`,
      },
    ];
  const out: Finding[] = [];
  for (const e of readRatings(part).errors)
    out.push({
      severity: 'caution',
      rule: 'role.rating-range',
      subject,
      value: null,
      limit: null,
      unit: '',
      source: 'design.input',
      message: `${e.message}; the rating is not used.`,
    });
  for (const r of role.rules) {
    const o = judgeRule(r, part);
    const s = sev(o.severity, r.required);
    if (s === null) continue;
    const rule = `role.${role.category}.${r.key}`;
    const value = typeof o.value === 'number' ? o.value : null;
    const limit = r.op === 'oneOf' || r.op === 'eachOf' ? null : r.limit;
    const message =
      o.severity === 'missing'
        ? `Enter the part's ${r.label.toLowerCase()} (${r.key}) so it can be checked: the design needs ` +
          `${limitText(r)} (${r.why}).`
        : o.severity === 'ok'
          ? `${r.label} ${show(o.value as number | string, r.unit)} meets ${limitText(r)} (${r.why}).`
          : `${r.label} ${show(o.value as number | string, r.unit)} does not meet ${limitText(r)} (${r.why}): choose ` +
            `a candidate that does.`;
    out.push({
      severity: s,
      rule,
      subject,
      value,
      limit,
      unit: r.unit,
      source: o.severity === 'missing' ? 'roles.binding' : r.source,
      message,
    });
  }
  out.push(...unstatedFinding(role, line, part));
  return out;
}

/**
 * A grouped role's bound lines together against each value it needs: the pieces per rig of the lines whose part has
 * that value, against the count. Checked once any bound part states the rating (a generic line "values per the RF
 * page" states none and is not counted against each value).
 */
function coverFindings(role: DesignRole, lines: readonly BomLine[], parts: ReadonlyMap<string, Part>): Finding[] {
  const out: Finding[] = [];
  const stated = lines
    .map((l) => ({ l, part: parts.get(l.partId) }))
    .filter((x): x is { l: BomLine; part: Part } => x.part !== undefined);
  for (const r of role.rules) {
    const groups: GroupValue<number | string>[] | null =
      r.op === 'eachOf' ? [...r.values] : r.op === 'oneOf' && r.cover ? [...r.cover] : null;
    if (groups === null || groups.length < 2) continue;
    const values = stated.map(({ l, part }) => ({
      qty: l.qtyPerRig,
      v: judgeRule(r, part).value,
      choices: readRatings(part).choices,
    }));
    if (values.every((x) => x.v === null)) continue;
    for (const g of groups) {
      const matches = (v: number | string | null, choices: Record<string, string>) =>
        v !== null &&
        (typeof g.value === 'number'
          ? typeof v === 'number' && r.op === 'eachOf' && inGroup(g as GroupValue<number>, v, r.tolerance, choices)
          : v === g.value);
      const have = values.filter((x) => matches(x.v, x.choices)).reduce((t, x) => t + x.qty, 0);
      if (have >= g.count) continue;
      const shown = groupText(g, r.unit);
      out.push({
        severity: 'caution',
        rule: `role.${role.category}.${r.key}.cover`,
        subject: `${role.label}: ${shown}`,
        value: have,
        limit: g.count,
        unit: 'pieces',
        source: 'roles.group-cover',
        message: `The design needs ${g.count} × ${r.label.toLowerCase()} ${shown} (${g.where}); the bound lines ` +
          `give ${have}: bind a line with that ${r.label.toLowerCase()} for each value.`,
      });
    }
  }
  return out;
}

export interface RoleCheck {
  statuses: RoleStatus[];
  findings: Finding[];
}

const worst = (fs: Finding[]): RoleStatus['state'] =>
  fs.some((f) => f.severity === 'fail') ? 'fail' : fs.some((f) => f.severity === 'caution') ? 'caution' : 'ok';

/** Every role's bound lines checked; unbound roles and lines bound to a role that is gone reported. */
export function checkRoles(project: Pick<Project, 'bom' | 'parts'>, roles: readonly DesignRole[]): RoleCheck {
  const parts = new Map(project.parts.map((p) => [p.id, p]));
  const findings: Finding[] = [];
  const statuses: RoleStatus[] = [];
  for (const role of roles) {
    const lines = project.bom.filter((b) => b.roleId === role.id);
    if (!lines.length) {
      const f: Finding = {
        severity: 'caution',
        rule: 'role.unbound',
        subject: role.label,
        value: null,
        limit: null,
        unit: '',
        source: 'roles.binding',
        message: `No parts-list line is bound to this part of the design (needs ${role.requirement}): bind a line or ` +
          `a candidate on the parts list.`,
      };
      findings.push(f);
      statuses.push({ role, lineIds: [], state: 'unbound', bound: [], problems: [f.message] });
      continue;
    }
    const fs = lines.flatMap((l) => {
      const part = parts.get(l.partId);
      return part ? lineFindings(role, part, l) : [];
    });
    fs.push(...coverFindings(role, lines, parts));
    findings.push(...fs);
    const bound = lines.map((l) => ({
      lineId: l.id,
      refs: l.refs,
      qtyPerRig: l.qtyPerRig,
      partId: l.partId,
      part: parts.get(l.partId)?.description ?? '',
    }));
    const problems = [...fs.filter((f) => f.severity === 'fail'), ...fs.filter((f) => f.severity === 'caution')].map(
      (f) => f.message,
    );
    statuses.push({ role, lineIds: lines.map((l) => l.id), state: worst(fs), bound, problems });
  }
  const ids = new Set(roles.map((r) => r.id));
  for (const l of project.bom as BomLine[]) {
    if (!l.roleId || ids.has(l.roleId)) continue;
    findings.push({
      severity: 'caution',
      rule: 'role.gone',
      subject: `Parts-list line ${l.refs || l.id}`,
      value: null,
      limit: null,
      unit: '',
      source: 'roles.binding',
      message: `This line is bound to "${l.roleId}", which the design no longer has (a rail, stage or transformer ` +
        `was removed or the supply is not designed): bind it to another role or clear the binding.`,
    });
  }
  return { statuses, findings };
}
