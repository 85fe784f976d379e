// The exported project file (JSON): its zod schema, used for import, the CLI and round trips.
// Format: { "format": "rigwright-project", "formatVersion": 1, "exportedAt": ISO date, "project": {...} }
// with every quantity in SI units (V, A, W, Ω, F, H, Hz, s, °C, fractions 0..1) and money in integer cents.
import { z } from 'zod';
import type { BomLine, CatalogCore, Costing, Mains, Part, Project, Rail, RfSettings, StageLoad } from '../core/model';
import { bomLineSpec, costingSpec, offerSpec, partSpec, supplierSpec } from '../core/spec';
import { STAGE_DATA } from '../core/spec/stage-data';
import { loadSpec, stageSpec } from '../core/spec/stage';
import { mainsSpec, projectFieldsSpec } from '../core/spec/settings';
import { enclosureSpec, primaryFuseSpec, transformerSpec, windingSpec } from '../core/spec/supply';
import { supplyChoicesSpec } from '../core/spec/supply-choices';
import { batterySpec, rectifiedSpec, regulatedSpec, withRailDefaults } from '../core/spec/supply-rails';
import { rfSettingsSpec } from '../core/spec/rf-settings';
import { coreSpec } from '../core/spec/cores';
import { specFileSchema, specShape, specValueSchema } from './spec-schema';

export const FORMAT = 'rigwright-project';
export const FORMAT_VERSION = 1;

const id = z.string().min(1).max(80);
// names are one line: no line breaks or control characters (they end up in netlists, CSV and PDF lines)
const name = z
  .string()
  .trim()
  .min(1, 'must not be empty')
  .max(200)
  .regex(/^[^\u0000-\u001f\u007f\u2028\u2029]*$/, 'must be one line of text without control characters');

// the supply's objects: the same specs as the supply page's forms and core's supply check (src/core/spec/supply*.ts)
const railKinds = { rectified: rectifiedSpec, regulated: regulatedSpec, battery: batterySpec } as const;
const rail = z
  .object({ kind: z.enum(['rectified', 'regulated', 'battery']), id })
  .loose()
  .transform((r, ctx): Rail => {
    // a file written before a rail field existed reads it as not stated (the same defaults as old database rows)
    const res = specFileSchema<object>(railKinds[r.kind]).safeParse(withRailDefaults(r as unknown as Rail));
    if (res.success) return { ...res.data, kind: r.kind, id: r.id } as Rail;
    for (const issue of res.error.issues)
      ctx.addIssue({ code: 'custom', path: issue.path as (string | number)[], message: issue.message });
    return z.NEVER;
  });
// Fields added after files were first written may be absent: a winding's leakage (absent = split from the regulation
// figure) and a transformer's secondary tolerance (absent = no tolerance corner), as in the model
const windingShape = specShape(windingSpec);
const winding = z.object({ id, ...windingShape, leakageH: windingShape.leakageH.optional() });
const transformerShape = specShape(transformerSpec);
const transformer = z.object({
  id,
  ...transformerShape,
  secondaryToleranceFraction: transformerShape.secondaryToleranceFraction.optional(),
  windings: z.array(winding).max(20),
});

// stage kinds' data: the same specs as the forms and core's checks, one optional block per registry entry
const stageDataSchemas = Object.fromEntries(STAGE_DATA.map((d) => [d.key, specFileSchema<unknown>(d.spec).optional()]));

const stage = z
  .object({
    id,
    ...specShape(stageSpec),
    loads: z.array(specFileSchema<StageLoad>(loadSpec)).max(20),
    ...stageDataSchemas,
  })
  .superRefine((s, ctx) => {
    // each kind carries only its own data (the database keeps one set per stage; a driver must not carry a hidden PA)
    const o = s as Record<string, unknown>;
    for (const d of STAGE_DATA)
      if (o[d.key] !== undefined && o.kind !== d.kind)
        ctx.addIssue({
          code: 'custom',
          path: [d.key],
          message: `only a stage of kind "${d.kind}" has ${d.key} data; this stage is "${String(o.kind)}"`,
        });
  });

// parts, offers, suppliers, parts-list lines and costing settings: the same specs as the catalog and parts-list forms
// (a spec's shape checks values, not TypeScript types: the model types are stated here)
const offer = z.object({ id, ...specShape(offerSpec) });
const part = z.object({ id, ...specShape(partSpec), offers: z.array(offer).max(50) }) as unknown as z.ZodType<Part>;
const supplier = z.object(specShape(supplierSpec));
// files written before lines were bound to design roles have no roleId: read as not bound
const bomLine = z.object({
  id,
  ...specShape(bomLineSpec),
  roleId: specValueSchema(bomLineSpec.fields.roleId).optional(),
}) as unknown as z.ZodType<BomLine>;
// the core catalog: the same spec as the cores page's forms; files written before it existed have none
const core = z
  .object({ id })
  .loose()
  .transform((c, ctx): CatalogCore => {
    const res = specFileSchema<object>(coreSpec).safeParse(c);
    if (res.success) return { ...res.data, id: c.id } as CatalogCore;
    for (const issue of res.error.issues)
      ctx.addIssue({ code: 'custom', path: issue.path as (string | number)[], message: issue.message });
    return z.NEVER;
  });
const costing = z.object({
  ...specShape(costingSpec),
  suppliers: z.array(supplier).max(200),
}) as unknown as z.ZodType<Costing>;

// the project's own values, its mains and its RF settings: the same specs as the settings forms and core's checks
const projectFields = specShape(projectFieldsSpec);
const mains = specFileSchema<Mains>(mainsSpec);
const rf = specFileSchema<RfSettings>(rfSettingsSpec);

export const projectSchema = z.object({
  id,
  ...projectFields,
  mains: mains.nullable(),
  // the project this one is a variant of (an id in the database it came from; dropped on import when absent there)
  variantOf: id.optional(),
  version: z.number().int().min(0).optional().default(1),
  supply: z.object({
    transformers: z.array(transformer).max(10),
    rails: z.array(rail).max(50),
    ...specShape(primaryFuseSpec),
    // files written before the enclosure existed have neither key: read as not stated
    ...Object.fromEntries(
      Object.entries(specShape(enclosureSpec)).map(([k, s]) => [k, s.optional().transform((v) => v ?? null)]),
    ),
    // the primary fuse's sheet and the sizing basis: files written before them have neither key (read as T3, duty)
    ...Object.fromEntries(Object.entries(specShape(supplyChoicesSpec)).map(([k, s]) => [k, s.optional()])),
  }),
  stages: z.array(stage).max(100),
  rf,
  parts: z.array(part).max(5000),
  bom: z.array(bomLine).max(5000),
  costing,
  cores: z.array(core).max(200).optional(),
});

export const projectFileSchema = z.object({
  format: z.literal(FORMAT, { message: `is not "${FORMAT}": this is not a project file exported by this program` }),
  formatVersion: z.literal(FORMAT_VERSION, { message: `must be ${FORMAT_VERSION}` }),
  exportedAt: z.string().optional(),
  project: projectSchema,
});

export type ProjectFileResult = { ok: true; project: Project } | { ok: false; errors: string[] };

/** Where-and-what messages for a zod error: "project.stages[2].loads[0].currentA.keyDown: too big ...". */
export function describeIssues(error: z.ZodError, prefix = ''): string[] {
  return error.issues.slice(0, 50).map((i) => {
    const path = i.path.reduce<string>(
      (acc, seg) => (typeof seg === 'number' ? `${acc}[${seg}]` : acc ? `${acc}.${String(seg)}` : String(seg)),
      prefix,
    );
    return `${path || '(file)'}: ${i.message}`;
  });
}

/** Cross-references a schema cannot express: rails, windings, stages and parts named by id must exist, and
 *  the ids others refer to must be unique (offer and parts-list line ids are renewed on import, so may repeat). */
export function checkReferences(p: Project): string[] {
  const errors: string[] = [];
  const windingIds = new Set(p.supply.transformers.flatMap((t) => t.windings.map((w) => w.id)));
  const railIds = new Set(p.supply.rails.map((r) => r.id));
  const stageIds = new Set(p.stages.map((s) => s.id));
  const partIds = new Set(p.parts.map((x) => x.id));
  const dupes = (ids: string[], what: string) => {
    const seen = new Set<string>();
    for (const i of ids) {
      if (seen.has(i)) errors.push(`${what} id "${i}" is used twice`);
      seen.add(i);
    }
  };
  dupes([...p.supply.rails.map((r) => r.id), ...windingIds], 'rail/winding');
  dupes(p.supply.transformers.map((t) => t.id), 'transformer');
  dupes(p.stages.map((s) => s.id), 'stage');
  dupes(p.parts.map((x) => x.id), 'part');
  dupes((p.cores ?? []).map((c) => c.id), 'core');
  const coreIds = new Set((p.cores ?? []).map((c) => c.id));
  p.supply.rails.forEach((r, i) => {
    if (r.kind === 'rectified' && !windingIds.has(r.windingId))
      errors.push(`project.supply.rails[${i}].windingId: no winding "${r.windingId}"`);
    if (r.kind === 'regulated' && !railIds.has(r.parentId))
      errors.push(`project.supply.rails[${i}].parentId: no rail "${r.parentId}"`);
    if (r.kind === 'regulated' && r.parentId === r.id)
      errors.push(`project.supply.rails[${i}].parentId: a rail cannot feed itself`);
  });
  p.stages.forEach((s, i) => {
    s.loads.forEach((l, j) => {
      if (!railIds.has(l.railId)) errors.push(`project.stages[${i}].loads[${j}].railId: no rail "${l.railId}"`);
    });
    if (s.pa && !railIds.has(s.pa.railId)) errors.push(`project.stages[${i}].pa.railId: no rail "${s.pa.railId}"`);
    if (s.relay?.coilRailId && !railIds.has(s.relay.coilRailId))
      errors.push(`project.stages[${i}].relay.coilRailId: no rail "${s.relay.coilRailId}"`);
    if (s.lpf?.coreId && !coreIds.has(s.lpf.coreId))
      errors.push(`project.stages[${i}].lpf.coreId: no core "${s.lpf.coreId}"`);
    if (s.pa?.outputCoreId && !coreIds.has(s.pa.outputCoreId))
      errors.push(`project.stages[${i}].pa.outputCoreId: no core "${s.pa.outputCoreId}"`);
  });
  p.bom.forEach((b, i) => {
    if (!partIds.has(b.partId)) errors.push(`project.bom[${i}].partId: no part "${b.partId}"`);
    if (b.stageId !== null && !stageIds.has(b.stageId))
      errors.push(`project.bom[${i}].stageId: no stage "${b.stageId}"`);
  });
  return errors;
}

/** Parse and validate a project file's text. Never throws for bad input. */
export function parseProjectFile(textIn: string): ProjectFileResult {
  let json: unknown;
  try {
    // a byte-order mark (some editors on Windows save one) is not part of the JSON
    json = JSON.parse(textIn.replace(/^\uFEFF/, ''));
  } catch (e) {
    return { ok: false, errors: [`The file is not valid JSON: ${(e as Error).message}`] };
  }
  const head = projectFileSchema.pick({ format: true, formatVersion: true }).safeParse(json);
  if (!head.success) return { ok: false, errors: describeIssues(head.error) };
  const parsed = projectFileSchema.safeParse(json);
  if (!parsed.success) return { ok: false, errors: describeIssues(parsed.error) };
  const project = parsed.data.project as Project;
  const refErrors = checkReferences(project);
  return refErrors.length ? { ok: false, errors: refErrors } : { ok: true, project };
}

export function toProjectFile(project: Project, exportedAtIso: string): string {
  return JSON.stringify({ format: FORMAT, formatVersion: FORMAT_VERSION, exportedAt: exportedAtIso, project }, null, 2);
}
