// The exported project file (JSON): its zod schema, used for import, the CLI and round trips.
// Format: { "format": "rigwright-project", "formatVersion": 1, "exportedAt": ISO date, "project": {...} }
// with every quantity in SI units (V, A, W, Ω, F, H, Hz, s, °C, fractions 0..1) and money in integer cents.
import { z } from 'zod';
import type { LpfParams, Mains, PaParams, Project, RelayParams, RfSettings } from '../core/model';
import { lpfSpec, paSpec, relaySpec } from '../core/spec';
import { mainsSpec, projectFieldsSpec } from '../core/spec/settings';
import { rfSettingsSpec } from '../core/spec/rf-settings';
import { specFileSchema, specShape } from './spec-schema';
import { MODES, STAGE_KINDS } from '../core/model';

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
const pos = (max: number) => z.number().finite().positive().max(max);
const nonneg = (max: number) => z.number().finite().min(0).max(max);
// limits match the web forms, so an imported project can be edited and saved back unchanged
const perMode = z.object({ receive: nonneg(100), keyUp: nonneg(100), keyDown: nonneg(100) });

const mountOf = (tjMinC: number) =>
  z.object({
    thetaJcKPerW: nonneg(100),
    thetaCsKPerW: nonneg(100),
    thetaSaKPerW: pos(1000).nullable(),
    tjMaxC: z.number().finite().min(tjMinC).max(250),
  });
const mount = mountOf(25);

const setting = z.discriminatedUnion('method', [
  z.object({ method: z.literal('fixed'), nominalV: pos(1000) }),
  z.object({ method: z.literal('adjustable'), vrefV: pos(10), adjustA: nonneg(0.01), r1Ohm: pos(1e7), r2Ohm: nonneg(1e7) }),
  z.object({ method: z.literal('raised-diodes'), nominalV: pos(1000), diodes: z.number().int().min(1).max(10), diodeDropV: pos(2) }),
  z.object({ method: z.literal('raised-resistor'), nominalV: pos(1000), r1Ohm: pos(1e7), r2Ohm: nonneg(1e7) }),
]);

const rail = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('rectified'),
    id,
    name,
    windingId: id,
    topology: z.enum(['bridge', 'centre-tap', 'half-wave']),
    diodeDropV: nonneg(5),
    diodeResistanceOhm: nonneg(100),
    reservoirF: pos(10),
    esrOhm: nonneg(100),
    bleederOhm: pos(1e9).nullable(),
    capacitorRatedV: pos(10_000).nullable(),
    capacitorRippleA: pos(1000).nullable(),
    ripplePpTargetV: pos(1000).nullable(),
    marginV: nonneg(100),
    fuseA: pos(63).nullable(),
  }),
  z.object({
    kind: z.literal('regulated'),
    id,
    name,
    parentId: id,
    regulator: z.enum(['linear', 'ldo', 'switching']),
    setting,
    dropoutV: nonneg(50),
    quiescentA: nonneg(1),
    efficiency: z.number().finite().gt(0).max(1).nullable(),
    maxOutputA: pos(100).nullable(),
    maxInputV: pos(1000).nullable(),
    mount: mountOf(50).nullable(),
  }),
  z.object({
    kind: z.literal('battery'),
    id,
    name,
    chemistry: name.pipe(z.string().max(60)),
    nominalV: pos(1000),
    fullV: pos(1000),
    endV: pos(1000),
    capacityAh: pos(10_000),
    usableFraction: z.number().finite().gt(0).max(1),
    internalOhm: nonneg(100),
  }),
]);

// stage kinds' data: the same specs as the forms and core's checks (src/core/spec)
const pa = specFileSchema<PaParams>(paSpec);
const lpf = specFileSchema<LpfParams>(lpfSpec);
const relay = specFileSchema<RelayParams>(relaySpec);

const stage = z.object({
  id,
  kind: z.enum(STAGE_KINDS),
  name,
  notes: z.string().max(5000),
  loads: z.array(z.object({ railId: id, currentA: perMode })).max(20),
  dissipationW: nonneg(10_000).nullable(),
  pa: pa.optional(),
  lpf: lpf.optional(),
  relay: relay.optional(),
}).superRefine((s, ctx) => {
  // each kind carries only its own data (the database keeps one set per stage; a driver must not carry a hidden PA)
  const own = { pa: 'final', lpf: 'lpf', relay: 'tr' } as const;
  for (const key of ['pa', 'lpf', 'relay'] as const)
    if (s[key] !== undefined && s.kind !== own[key]) ctx.addIssue({ code: 'custom', path: [key], message: `only a stage of kind "${own[key]}" has ${key} data; this stage is "${s.kind}"` });
});

const money = z.number().int().min(0).max(1e12);
const currency = z.string().regex(/^[A-Z]{3}$/, 'must be a three-letter currency code such as USD');

const part = z.object({
  id,
  description: name,
  category: name.pipe(z.string().max(60)),
  ratings: z.record(z.string().max(80), z.union([z.number().finite(), z.string().max(200)])),
  offers: z
    .array(
      z.object({
        id,
        supplier: name.pipe(z.string().max(120)),
        sku: z.string().max(120),
        currency,
        breaks: z
          .array(z.object({ minQty: z.number().int().min(1), unitPriceCents: money }))
          .min(1)
          .max(50)
          .refine((b) => new Set(b.map((x) => x.minQty)).size === b.length, 'a quantity is given twice'),
        minOrder: z.number().int().min(1).max(1e6),
        orderMultiple: z.number().int().min(1).max(1e6),
        stockNote: z.string().max(200),
      }),
    )
    .max(50),
});

// the project's own values, its mains and its RF settings: the same specs as the settings forms and core's checks
const projectFields = specShape(projectFieldsSpec);
const mains = specFileSchema<Mains>(mainsSpec);
const rf = specFileSchema<RfSettings>(rfSettingsSpec);

export const projectSchema = z.object({
  id,
  ...projectFields,
  mains: mains.nullable(),
  version: z.number().int().min(0).optional().default(1),
  supply: z.object({
    transformers: z
      .array(
        z.object({
          id,
          name,
          construction: z.enum(['laminated', 'toroidal']),
          windings: z.array(
            z.object({ id, name, ratedVrms: pos(1000), ratedA: pos(100), regulationFraction: z.number().finite().min(0).max(1), resistanceOhm: pos(1000).nullable() }),
          ),
        }),
      )
      .max(10),
    rails: z.array(rail).max(50),
    primaryFuseA: pos(63).nullable(),
  }),
  stages: z.array(stage).max(100),
  rf,
  parts: z.array(part).max(5000),
  bom: z
    .array(z.object({ id, stageId: id.nullable(), partId: id, qtyPerRig: pos(100_000), refs: z.string().max(300), notes: z.string().max(500) }))
    .max(5000),
  costing: z.object({
    attritionFraction: z.number().finite().min(0).max(1),
    sparesPerLine: z.number().int().min(0).max(1000),
    exchangeRates: z.record(currency, z.number().finite().positive()),
    suppliers: z.array(z.object({ name: name.pipe(z.string().max(120)), shippingCents: money, currency })).max(200),
  }),
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
    const path = i.path.reduce<string>((acc, seg) => (typeof seg === 'number' ? `${acc}[${seg}]` : acc ? `${acc}.${String(seg)}` : String(seg)), prefix);
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
  p.supply.rails.forEach((r, i) => {
    if (r.kind === 'rectified' && !windingIds.has(r.windingId)) errors.push(`project.supply.rails[${i}].windingId: no winding "${r.windingId}"`);
    if (r.kind === 'regulated' && !railIds.has(r.parentId)) errors.push(`project.supply.rails[${i}].parentId: no rail "${r.parentId}"`);
    if (r.kind === 'regulated' && r.parentId === r.id) errors.push(`project.supply.rails[${i}].parentId: a rail cannot feed itself`);
  });
  p.stages.forEach((s, i) => {
    s.loads.forEach((l, j) => {
      if (!railIds.has(l.railId)) errors.push(`project.stages[${i}].loads[${j}].railId: no rail "${l.railId}"`);
    });
    if (s.pa && !railIds.has(s.pa.railId)) errors.push(`project.stages[${i}].pa.railId: no rail "${s.pa.railId}"`);
    if (s.relay?.coilRailId && !railIds.has(s.relay.coilRailId)) errors.push(`project.stages[${i}].relay.coilRailId: no rail "${s.relay.coilRailId}"`);
  });
  p.bom.forEach((b, i) => {
    if (!partIds.has(b.partId)) errors.push(`project.bom[${i}].partId: no part "${b.partId}"`);
    if (b.stageId !== null && !stageIds.has(b.stageId)) errors.push(`project.bom[${i}].stageId: no stage "${b.stageId}"`);
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
