// Where a finding is fixed: the page and the exact input a builder changes to clear it (its id from field-id.ts),
// found from what the finding names (a stage, rail, winding, transformer, part or line) and the family of its rule
// (fix-fields.ts). Only a finding no single input clears links to a section.
import type { Project, Rail, Stage } from '../../src/core/model';
import type { Finding } from '../../src/core/findings';
import type { Spec } from '../../src/core/spec/field';
import { settingsSpec, rfSettingsSpec, enclosureSpec, costingSpec, paSpec, lpfSpec, relaySpec } from '../../src/core/spec/index';
import { RAIL_SPECS } from '../../src/core/spec/supply-rails';
import { loadFormName } from '../../src/core/spec/stage';
import { fieldId, ITEM, PROJECT_ITEM } from './field-id';
import { LPF_FIELDS, PA_FIELDS, RAIL_FIELDS, RELAY_FIELDS, RF_SETTINGS_FIELDS, SETTINGS_FIELDS } from './fix-fields';

export interface FixLink {
  href: string;
  /** what the link opens, e.g. "stage 30 m low-pass filter" */
  label: string;
}

/** The subject is about this named thing: "16 V winding", "16 V winding: …", "16 V winding (…)", "16 V winding fuse". */
const names = (subject: string, name: string) =>
  subject === name || [':', ' ', ','].some((sep) => subject.startsWith(`${name}${sep}`) || subject.startsWith(`Stage "${name}"${sep}`)) || subject === `Stage "${name}"`;

/** A field named by the subject's tail ("30 m low-pass filter: Cutoff frequency") or by the rule's table. */
function pick(spec: Spec, f: Finding, table: Record<string, string>, key = f.rule): string | undefined {
  const tail = f.subject.includes(': ') ? f.subject.slice(f.subject.lastIndexOf(': ') + 2).toLowerCase() : '';
  const byLabel = Object.entries(spec.fields).find(([, x]) => x.label.toLowerCase() === tail)?.[0];
  const k = byLabel ?? table[key] ?? table['*'];
  return k && spec.fields[k] ? k : undefined;
}

const at = (href: string, id: string | undefined, label: string, field?: string): FixLink =>
  id ? { href: `${href}#${id}`, label: field ? `${label}: ${field}` : label } : { href, label };

function stageLink(base: string, stage: Stage, f: Finding): FixLink {
  const href = `${base}/stages/${stage.id}`;
  const item = ITEM.stage(stage.id);
  const data: [Spec, Record<string, string>] | null = stage.pa ? [paSpec, PA_FIELDS] : stage.lpf ? [lpfSpec, LPF_FIELDS] : stage.relay ? [relaySpec, RELAY_FIELDS] : null;
  if (f.rule === 'budget.no-rail') return at(href, `f-${loadFormName(0, 'railId')}`, `stage ${stage.name}`, 'rail of its load');
  if (f.rule === 'rf.pa-unknown') return at(href, 'f-kind', `stage ${stage.name}`, 'kind');
  if (data) {
    const [spec, table] = data;
    const snapKey = f.rule === 'lpf.snap' ? `lpf.snap:${/: C\d+$/.test(f.subject) ? 'C' : 'L'}` : f.rule;
    const k = pick(spec, f, table, snapKey);
    if (k) return at(href, fieldId(spec.name, item, k), `stage ${stage.name}`, spec.fields[k].label.toLowerCase());
  }
  if (stage.loads.length) return at(href, fieldId('load', item, loadFormName(0, 'currentA.keyDown')), `stage ${stage.name}`, 'key-down current');
  return at(href, fieldId('stage', item, 'name'), `stage ${stage.name}`);
}

function railLink(base: string, rail: Rail, f: Finding): FixLink {
  const spec = RAIL_SPECS[rail.kind];
  const k = pick(spec, f, RAIL_FIELDS[rail.kind]) ?? 'name';
  return at(`${base}/supply`, fieldId(spec.name, ITEM.rail(rail.id), k), `rail ${rail.name}`, spec.fields[k].label.toLowerCase());
}

const primaryFuse = (base: string): FixLink =>
  at(`${base}/supply`, fieldId('primary-fuse', ITEM.primaryFuse, 'primaryFuseA'), 'supply', 'primary fuse rating');

/** Findings on the parts list: a role, a line, a stage without parts, a line without an offer. */
function partsLink(project: Project, base: string, f: Finding): FixLink | null {
  const bom = `${base}/bom`;
  const lineByRefs = (refs: string) => project.bom.find((l) => l.refs === refs || l.id === refs);
  if (f.rule === 'role.gone') {
    const line = lineByRefs(f.subject.replace(/^Parts-list line /, ''));
    if (line) return at(bom, fieldId('bom-line', ITEM.line(line.id), 'roleId'), 'parts list', 'design role of the line');
  }
  if (f.rule === 'role.unbound' || f.rule === 'cost.empty-stage')
    return at(bom, fieldId('bom-line', ITEM.addLine, f.rule === 'role.unbound' ? 'roleId' : 'stageId'), 'parts list', 'a new line');
  if (f.rule.startsWith('role.')) {
    // "<role>: <part description>": the line bound to it takes another part
    const part = project.parts.find((p) => f.subject.endsWith(`: ${p.description}`));
    const line = part && project.bom.find((l) => l.partId === part.id && l.roleId);
    if (line) return at(bom, fieldId('bom-line', ITEM.line(line.id), 'partId'), 'parts list', 'part of the bound line');
    return at(bom, fieldId('bom-line', ITEM.addLine, 'roleId'), 'parts list', 'a new line');
  }
  if (f.rule === 'cost.no-offer' || f.rule === 'cost.no-price') {
    const part = project.parts.find((p) => f.subject.startsWith(p.description));
    if (part) return at(`${base}/parts`, fieldId('offer', `ao-${part.id}`, 'supplier'), 'parts catalog', `an offer for ${part.description}`);
  }
  if (f.rule === 'cost.incomplete') {
    // the totals leave out lines without a usable price: the first such line's part takes an offer
    const part = project.bom.map((l) => project.parts.find((p) => p.id === l.partId)).find((p) => p && !p.offers.length);
    if (part) return at(`${base}/parts`, fieldId('offer', `ao-${part.id}`, 'supplier'), 'parts catalog', `an offer for ${part.description}`);
  }
  if (f.rule === 'cost.attrition') return at(`${base}/parts`, fieldId(costingSpec.name, ITEM.costing, 'attritionFraction'), 'costing', 'attrition');
  if (f.rule === 'cost.shipping') {
    const i = project.costing.suppliers.findIndex((s) => s.name === f.subject);
    if (i >= 0) return at(`${base}/parts`, fieldId('supplier', `s${i}`, 'shippingCents'), `supplier ${f.subject}`, 'shipping');
  }
  if (f.rule.startsWith('cost.')) return { href: bom, label: 'parts list and cost' };
  return null;
}

export function fixLink(project: Project, f: Finding): FixLink {
  const base = `/projects/${project.id}`;
  if (f.rule.startsWith('role.') || f.rule.startsWith('cost.')) {
    const p = partsLink(project, base, f);
    if (p) return p;
  }
  if (f.rule === 'fuse.primary-fault' || f.rule === 'fuse.inrush' || f.rule === 'transformer.inrush') return primaryFuse(base);
  if (f.rule === 'enclosure.rise' || f.subject === 'Enclosure' || f.subject.startsWith('Enclosure:')) {
    const k = pick(enclosureSpec, f, { '*': 'enclosureAreaM2' })!;
    return at(`${base}/supply`, fieldId(enclosureSpec.name, ITEM.enclosure, k), 'supply', (enclosureSpec as Spec).fields[k].label.toLowerCase());
  }
  const stage = project.stages.find((s) => names(f.subject, s.name));
  if (stage) return stageLink(base, stage, f);
  const label = (spec: Spec, k: string) => spec.fields[k].label.toLowerCase();
  const rail = project.supply.rails.find((r) => names(f.subject, r.name) || (f.rule === 'transformer.shared-winding' && f.subject.includes(r.name)));
  if (rail) return railLink(base, rail, f);
  for (const t of project.supply.transformers) {
    const w = t.windings.find((x) => names(f.subject, x.name));
    if (w) {
      // a winding's fuse is a field of the rectified rail it feeds
      const fed = project.supply.rails.find((r) => r.kind === 'rectified' && r.windingId === w.id);
      if (f.rule === 'fuse.fault-clearing' && fed) return railLink(base, fed, f);
      const k = f.rule === 'transformer.recommended-pa' ? 'ratedVrms' : f.rule === 'transformer.cross-regulation' ? 'regulationFraction' : 'ratedA';
      return at(`${base}/supply`, fieldId('winding', ITEM.winding(w.id), k), `${w.name} of ${t.name}`, k === 'ratedVrms' ? 'rated voltage' : k === 'ratedA' ? 'rated current' : 'regulation');
    }
    if (names(f.subject, t.name)) {
      // the transformer's size is its windings' ratings: the largest winding's current (or its regulation)
      const first = [...t.windings].sort((a, b) => b.ratedVrms * b.ratedA - a.ratedVrms * a.ratedA)[0];
      const k = f.rule === 'transformer.cross-regulation' ? 'regulationFraction' : 'ratedA';
      if (first) return at(`${base}/supply`, fieldId('winding', ITEM.winding(first.id), k), `${first.name} of ${t.name}`, k === 'ratedA' ? 'rated current' : 'regulation');
      return at(`${base}/supply`, fieldId('transformer', ITEM.transformer(t.id), 'name'), t.name);
    }
  }
  const settings = pick(settingsSpec, f, SETTINGS_FIELDS);
  if (f.rule in SETTINGS_FIELDS || f.subject.startsWith('Project settings:'))
    return at(base, fieldId(settingsSpec.name, PROJECT_ITEM, settings ?? 'name'), 'project settings', label(settingsSpec, settings ?? 'name'));
  if (/^(rf\.settings|rf\.input|spurious\.(range|rule-source)|exposure\.)/.test(f.rule) || f.subject.startsWith('RF settings:')) {
    const k = pick(rfSettingsSpec, f, RF_SETTINGS_FIELDS) ?? 'worstSwr';
    return at(`${base}/rf`, fieldId(rfSettingsSpec.name, PROJECT_ITEM, k), 'RF settings', label(rfSettingsSpec, k));
  }
  if (f.rule === 'spurious.harmonic') {
    const lpf = project.stages.find((s) => s.lpf);
    if (lpf) return stageLink(base, lpf, f);
  }
  if (f.rule === 'rf.no-pa') return at(base, 'f-kind', 'stages', 'add a stage');
  if (f.rule.startsWith('budget.')) return { href: `${base}#stages`, label: 'stage currents' };
  if (/^(lpf|pa|relay|spurious|rf)\./.test(f.rule)) return { href: `${base}/rf`, label: 'RF checks' };
  if (/^(rail|regulator|reservoir|rectifier|bleeder|fuse|transformer|supply|battery|catalog|thermal)/.test(f.rule)) return { href: `${base}/supply`, label: 'supply' };
  return { href: `${base}#checks`, label: 'all checks' };
}
