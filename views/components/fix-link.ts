// Where a finding is fixed: the page and the exact input a builder changes to clear it (its id from field-id.ts),
// found from what the finding names (a stage, rail, winding, transformer, part or line) and the family of its rule
// (fix-fields.ts). Only a finding no single input clears links to a section.
import type { Project, Rail, Stage, Winding } from '../../src/core/model';
import type { Finding } from '../../src/core/findings';
import type { Spec } from '../../src/core/spec/field';
import { settingsSpec, rfSettingsSpec, enclosureSpec, costingSpec } from '../../src/core/spec/index';
import { paSpec, lpfSpec, relaySpec } from '../../src/core/spec/index';
import { RAIL_SPECS } from '../../src/core/spec/supply-rails';
import { loadFormName } from '../../src/core/spec/stage';
import { fieldId, ITEM, PROJECT_ITEM } from './field-id';
import { LPF_FIELDS, PA_FIELDS, RAIL_FIELDS, RELAY_FIELDS, RF_SETTINGS_FIELDS, SETTINGS_FIELDS } from './fix-fields';

export interface FixLink {
  href: string;
  /** what the link opens, e.g. "stage 30 m low-pass filter: order" */
  label: string;
}

/** The subject is about this named thing: "16 V winding", "16 V winding: …", "16 V winding (…)",
 * "16 V winding fuse", or a stored-input finding's 'Stage "Driver", …'. */
function names(subject: string, name: string): boolean {
  if (subject === name || subject === `Stage "${name}"`) return true;
  return [':', ' ', ','].some((sep) => [name, `Stage "${name}"`].some((x) => subject.startsWith(`${x}${sep}`)));
}

/** A field named by the subject's tail ("30 m low-pass filter: Cutoff frequency") or by the rule's table. */
function pick(spec: Spec, f: Finding, table: Record<string, string>, key = f.rule): string | undefined {
  const tail = f.subject.includes(': ') ? f.subject.slice(f.subject.lastIndexOf(': ') + 2).toLowerCase() : '';
  const byLabel = Object.entries(spec.fields).find(([, x]) => x.label.toLowerCase() === tail)?.[0];
  const k = byLabel ?? table[key] ?? table['*'];
  return k && spec.fields[k] ? k : undefined;
}

/** The field's label inside a sentence: a leading capital lowered, acronyms kept ("Core AL" → "core AL"). */
const fieldLabel = (spec: Spec, k: string) => spec.fields[k].label.replace(/^[A-Z](?=[a-z])/, (c) => c.toLowerCase());

const at = (href: string, id: string | undefined, label: string, field?: string): FixLink =>
  id ? { href: `${href}#${id}`, label: field ? `${label}: ${field}` : label } : { href, label };

/** The data block a stage's kind owns, with its rule → field table. */
function stageData(stage: Stage): [Spec, Record<string, string>] | null {
  if (stage.pa) return [paSpec, PA_FIELDS];
  if (stage.lpf) return [lpfSpec, LPF_FIELDS];
  if (stage.relay) return [relaySpec, RELAY_FIELDS];
  return null;
}

function stageLink(base: string, stage: Stage, f: Finding): FixLink {
  const href = `${base}/stages/${stage.id}`;
  const item = ITEM.stage(stage.id);
  const where = `stage ${stage.name}`;
  if (f.rule === 'budget.no-rail') return at(href, `f-${loadFormName(0, 'railId')}`, where, 'rail of its load');
  if (f.rule === 'rf.pa-unknown') return at(href, 'f-kind', where, 'kind');
  const data = stageData(stage);
  if (data) {
    const [spec, table] = data;
    const snapKey = f.rule === 'lpf.snap' ? `lpf.snap:${/: C\d+$/.test(f.subject) ? 'C' : 'L'}` : f.rule;
    const k = pick(spec, f, table, snapKey);
    if (k) return at(href, fieldId(spec.name, item, k), where, fieldLabel(spec, k));
  }
  const keyDown = fieldId('load', item, loadFormName(0, 'currentA.keyDown'));
  if (stage.loads.length) return at(href, keyDown, where, 'key-down current');
  return at(href, fieldId('stage', item, 'name'), where);
}

function railLink(base: string, rail: Rail, f: Finding): FixLink {
  const spec = RAIL_SPECS[rail.kind];
  const k = pick(spec, f, RAIL_FIELDS[rail.kind]) ?? 'name';
  return at(`${base}/supply`, fieldId(spec.name, ITEM.rail(rail.id), k), `rail ${rail.name}`, fieldLabel(spec, k));
}

const WINDING_WORDS: Record<string, string> = {
  ratedVrms: 'rated voltage',
  ratedA: 'rated current',
  regulationFraction: 'regulation',
};

const windingLink = (base: string, w: Winding, transformer: string, k: string): FixLink =>
  at(`${base}/supply`, fieldId('winding', ITEM.winding(w.id), k), `${w.name} of ${transformer}`, WINDING_WORDS[k]);

const primaryFuse = (base: string): FixLink =>
  at(`${base}/supply`, fieldId('primary-fuse', ITEM.primaryFuse, 'primaryFuseA'), 'supply', 'primary fuse rating');

/** The first box of a part's "add an offer" row on the parts catalog. */
const offerFor = (base: string, part: { id: string; description: string }): FixLink =>
  at(`${base}/parts`, fieldId('offer', `ao-${part.id}`, 'supplier'), 'parts catalog', `offer for ${part.description}`);

/** Findings on the parts list: a role, a line, a stage without parts, a line without an offer. */
function partsLink(project: Project, base: string, f: Finding): FixLink | null {
  const bom = `${base}/bom`;
  const line = (id: string, k: string, words: string) => at(bom, fieldId('bom-line', id, k), 'parts list', words);
  if (f.rule === 'role.gone') {
    const refs = f.subject.replace(/^Parts-list line /, '');
    const l = project.bom.find((x) => x.refs === refs || x.id === refs);
    if (l) return line(ITEM.line(l.id), 'roleId', 'design role of the line');
  }
  if (f.rule === 'cost.empty-stage') return line(ITEM.addLine, 'stageId', 'add a line on this stage');
  if (f.rule.startsWith('role.') && f.rule !== 'role.unbound') {
    // "<role>: <part description>": the line bound to it takes another part
    const part = project.parts.find((p) => f.subject.endsWith(`: ${p.description}`));
    const l = part && project.bom.find((x) => x.partId === part.id && x.roleId);
    if (l) return line(ITEM.line(l.id), 'partId', 'part of the bound line');
  }
  if (f.rule.startsWith('role.')) return line(ITEM.addLine, 'roleId', 'add a line for this role');
  if (f.rule === 'cost.no-offer' || f.rule === 'cost.no-price') {
    const part = project.parts.find((p) => f.subject.startsWith(p.description));
    if (part) return offerFor(base, part);
  }
  if (f.rule === 'cost.incomplete') {
    // the totals leave out lines without a usable price: the first such line's part takes an offer
    const parts = project.bom.map((l) => project.parts.find((p) => p.id === l.partId));
    const part = parts.find((p) => p && !p.offers.length);
    if (part) return offerFor(base, part);
  }
  if (f.rule === 'cost.attrition')
    return at(`${base}/parts`, fieldId(costingSpec.name, ITEM.costing, 'attritionFraction'), 'costing', 'attrition');
  if (f.rule === 'cost.shipping') {
    const i = project.costing.suppliers.findIndex((s) => s.name === f.subject);
    const id = fieldId('supplier', `s${i}`, 'shippingCents');
    if (i >= 0) return at(`${base}/parts`, id, `supplier ${f.subject}`, 'shipping');
  }
  if (f.rule.startsWith('cost.')) return { href: bom, label: 'parts list and cost' };
  return null;
}

/** A winding or transformer named by the finding: the winding's rating (or the fuse of the rail it feeds). */
function supplyItemLink(project: Project, base: string, f: Finding): FixLink | null {
  for (const t of project.supply.transformers) {
    const w = t.windings.find((x) => names(f.subject, x.name));
    if (w) {
      // a winding's fuse is a field of the rectified rail it feeds
      const fed = project.supply.rails.find((r) => r.kind === 'rectified' && r.windingId === w.id);
      if (f.rule === 'fuse.fault-clearing' && fed) return railLink(base, fed, f);
      if (f.rule === 'transformer.recommended-pa') return windingLink(base, w, t.name, 'ratedVrms');
      return windingLink(base, w, t.name, f.rule === 'transformer.cross-regulation' ? 'regulationFraction' : 'ratedA');
    }
    if (names(f.subject, t.name)) {
      // the transformer's size is its windings' ratings: the largest winding's current (or its regulation)
      const largest = [...t.windings].sort((a, b) => b.ratedVrms * b.ratedA - a.ratedVrms * a.ratedA)[0];
      const k = f.rule === 'transformer.cross-regulation' ? 'regulationFraction' : 'ratedA';
      if (largest) return windingLink(base, largest, t.name, k);
      return at(`${base}/supply`, fieldId('transformer', ITEM.transformer(t.id), 'name'), t.name);
    }
  }
  return null;
}

const RF_SETTINGS_RULES = /^(rf\.settings|rf\.input|spurious\.(range|rule-source)|exposure\.)/;
const RF_RULES = /^(lpf|pa|relay|spurious|rf)\./;
const SUPPLY_RULES = /^(rail|regulator|reservoir|rectifier|bleeder|fuse|transformer|supply|battery|catalog|thermal)/;

export function fixLink(project: Project, f: Finding): FixLink {
  const base = `/projects/${project.id}`;
  if (f.rule.startsWith('role.') || f.rule.startsWith('cost.')) {
    const p = partsLink(project, base, f);
    if (p) return p;
  }
  if (['fuse.primary-fault', 'fuse.inrush', 'transformer.inrush'].includes(f.rule)) return primaryFuse(base);
  if (f.rule === 'enclosure.rise' || f.subject === 'Enclosure' || f.subject.startsWith('Enclosure:')) {
    const k = pick(enclosureSpec, f, { '*': 'enclosureAreaM2' })!;
    return at(`${base}/supply`, fieldId(enclosureSpec.name, ITEM.enclosure, k), 'supply', fieldLabel(enclosureSpec, k));
  }
  const stage = project.stages.find((s) => names(f.subject, s.name));
  if (stage) return stageLink(base, stage, f);
  const shared = (r: Rail) => f.rule === 'transformer.shared-winding' && f.subject.includes(r.name);
  const rail = project.supply.rails.find((r) => names(f.subject, r.name) || shared(r));
  if (rail) return railLink(base, rail, f);
  const item = supplyItemLink(project, base, f);
  if (item) return item;
  if (f.rule in SETTINGS_FIELDS || f.subject.startsWith('Project settings:')) {
    const k = pick(settingsSpec, f, SETTINGS_FIELDS) ?? 'name';
    return at(base, fieldId(settingsSpec.name, PROJECT_ITEM, k), 'project settings', fieldLabel(settingsSpec, k));
  }
  if (RF_SETTINGS_RULES.test(f.rule) || f.subject.startsWith('RF settings:')) {
    const k = pick(rfSettingsSpec, f, RF_SETTINGS_FIELDS) ?? 'worstSwr';
    const id = fieldId(rfSettingsSpec.name, PROJECT_ITEM, k);
    return at(`${base}/rf`, id, 'RF settings', fieldLabel(rfSettingsSpec, k));
  }
  if (f.rule === 'spurious.harmonic') {
    const lpf = project.stages.find((s) => s.lpf);
    if (lpf) return stageLink(base, lpf, f);
  }
  if (f.rule === 'rf.no-pa') return at(base, 'f-kind', 'stages', 'add a stage');
  if (f.rule.startsWith('budget.')) return { href: `${base}#stages`, label: 'stage currents' };
  if (RF_RULES.test(f.rule)) return { href: `${base}/rf`, label: 'RF checks' };
  if (SUPPLY_RULES.test(f.rule)) return { href: `${base}/supply`, label: 'supply' };
  return { href: `${base}#checks`, label: 'all checks' };
}
