// The supply's stored inputs checked against their field specs (src/core/spec/supply*.ts), the same definitions the
// forms and the project file use. A transformer, winding or rail that fails gets a fail finding naming the item and
// the field, and is left out of the design; everything that depends on it says so. Nothing is replaced by 0.
import type { Finding } from '../findings';
import type { Rail, Supply } from '../model';
import type { FieldError, Spec } from '../spec/field';
import { validate } from '../spec/derive';
import { primaryFuseSpec, transformerSpec, windingSpec } from '../spec/supply';
import { RAIL_SPECS } from '../spec/supply-rails';

export interface SupplyInputs {
  findings: Finding[];
  /** rail id -> why it is not designed (refused itself, or it depends on a refused item) */
  leftOut: Map<string, string>;
  /** transformer id -> why it is not sized (refused itself, or a winding of it was refused) */
  unsized: Map<string, string>;
  /** false when the fitted primary fuse value was refused (it is then not checked) */
  primaryFuseOk: boolean;
}

const SOURCE = 'design.input' as const;

function refusals(
  spec: Spec | undefined,
  value: unknown,
  subject: string,
  what: string,
): { findings: Finding[]; ok: boolean } {
  const errors: FieldError[] = spec
    ? validate(spec, value)
    : [{ field: 'kind', label: 'Kind', message: 'Kind must be rectified, regulated or battery' }];
  const findings = errors.map((e): Finding => ({
    severity: 'fail',
    rule: 'input.supply',
    subject: `${subject}: ${e.label}`,
    value: null,
    limit: null,
    unit: '',
    source: SOURCE,
    message: `Stored value refused: ${e.message}. ${what} is left out of the supply design until it is corrected.`,
  }));
  return { findings, ok: errors.length === 0 };
}

const quoted = (name: unknown, fallback: string) => (typeof name === 'string' && name.trim() ? `“${name}` +
  `”` : fallback);

export function checkSupplyInputs(supply: Supply): SupplyInputs {
  const findings: Finding[] = [];
  const badWindings = new Map<string, string>(); // winding id -> words naming the refused item
  const unsized = new Map<string, string>();
  for (const t of supply.transformers) {
    const tName = `transformer ${quoted(t.name, t.id)}`;
    const own = refusals(transformerSpec, t, `Transformer ${quoted(t.name, t.id)}`, `The ${tName}`);
    findings.push(...own.findings);
    if (!own.ok) unsized.set(t.id, `the ${tName} was refused`);
    for (const w of t.windings) {
      const wName = `winding ${quoted(w.name, w.id)} of ${tName}`;
      const r = refusals(windingSpec, w, `Winding ${quoted(w.name, w.id)} (${quoted(t.name, t.id)})`, `The ${wName}`);
      findings.push(...r.findings);
      if (!own.ok) badWindings.set(w.id, `the ${tName}`);
      else if (!r.ok) {
        badWindings.set(w.id, `the ${wName}`);
        if (!unsized.has(t.id)) unsized.set(t.id, `its ${wName.replace(` of ${tName}`, '')} was refused`);
      }
    }
  }

  // a refused rail, or a rectified rail on a refused winding, takes its whole supply tree out: the source's voltage
  // feeds every rail below it and the regulators below set what the source must give (as for an unknown load)
  const refused = new Set<string>();
  const fromBadWinding = new Map<string, string>(); // rail id -> words naming the refused winding or transformer
  for (const r of supply.rails) {
    const res = refusals(RAIL_SPECS[r.kind], r, `Rail ${quoted(r.name, r.id)}`, `The rail ${quoted(r.name, r.id)}`);
    findings.push(...res.findings);
    if (!res.ok) refused.add(r.id);
    else if (r.kind === 'rectified' && badWindings.has(r.windingId))
      fromBadWinding.set(r.id, badWindings.get(r.windingId)!);
  }
  const rootOf = treeRoots(supply.rails);
  const firstCause = new Map<string, string>(); // tree root -> the first rail of that tree with a cause
  for (const r of supply.rails)
    if ((refused.has(r.id) || fromBadWinding.has(r.id)) && !firstCause.has(rootOf(r.id)))
      firstCause.set(rootOf(r.id), r.id);
  const leftOut = new Map<string, string>();
  for (const r of supply.rails) {
    const causeId = firstCause.get(rootOf(r.id));
    if (causeId === undefined) continue;
    if (refused.has(r.id)) leftOut.set(r.id, 'its stored inputs were refused (see the findings naming its fields).');
    else if (fromBadWinding.has(r.id))
      leftOut.set(r.id, `it is rectified from ${fromBadWinding.get(r.id)}, which was refused.`);
    else {
      const what = refused.has(causeId)
        ? 'whose inputs were refused'
        : `which is rectified from ${fromBadWinding.get(causeId)}, refused`;
      leftOut.set(
        r.id,
        `it shares its supply tree with ${railWords(supply.rails, causeId)}, ${what}; its voltages and needs are ` +
          `unknown too.`,
      );
    }
  }
  // a transformer whose winding feeds a left-out rail is unsized by the caller (as for an unknown load)

  const fuse = refusals(
    primaryFuseSpec,
    { primaryFuseA: supply.primaryFuseA },
    'Primary fuse',
    'The fitted primary fuse',
  );
  findings.push(...fuse.findings);
  return { findings, leftOut, unsized, primaryFuseOk: fuse.ok };
}

function railWords(rails: Rail[], id: string): string {
  const r = rails.find((x) => x.id === id);
  return `rail ${quoted(r?.name, id)}`;
}

/** The root of each rail's supply tree (following regulated rails to their source; loops stop where they close). */
export function treeRoots(rails: Rail[]): (id: string) => string {
  const byId = new Map(rails.map((r) => [r.id, r]));
  return (id: string) => {
    const seen = new Set<string>();
    let r = byId.get(id);
    while (r && r.kind === 'regulated' && byId.has(r.parentId) && !seen.has(r.id)) {
      seen.add(r.id);
      r = byId.get(r.parentId);
    }
    return r?.id ?? id;
  };
}
