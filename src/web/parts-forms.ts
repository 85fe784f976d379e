// Parts catalog forms, derived from the field specs in src/core/spec (parts.ts, costing.ts): form text -> model values.
import type { Project, Supplier } from '../core/model';
import { costingSpec, offerSpec, partSpec, supplierSpec } from '../core/spec';
import type { CostingFields, OfferFields, PartFields } from '../core/edits/catalog';
import { labelFormSchema, specFormSchema } from './forms/spec-schema';
import { z } from 'zod';
import { parseForm } from '../core/spec/derive';
import { allRatingBoxSpecs, readRatingBoxes } from '../core/spec/rating-boxes';

// the part's own boxes from its spec, and one box per rating (r.<key>, rating-boxes.ts) merged into its ratings
const partBoxesSchema = z.record(z.string(), z.string()).transform((values, ctx): PartFields => {
  const r = parseForm(partSpec, values);
  const boxes = readRatingBoxes(values);
  if (!r.ok)
    for (const [path, message] of Object.entries(r.errors)) ctx.addIssue({ code: 'custom', path: [path], message });
  for (const e of boxes.errors) ctx.addIssue({ code: 'custom', path: [e.field], message: e.message });
  if (!r.ok || boxes.errors.length) return z.NEVER;
  const v = r.value as PartFields;
  // a rating typed both in its box and in the other-ratings text: the box is the one the form shows for it
  return { ...v, ratings: { ...v.ratings, ...boxes.ratings } };
});
// labels for messages about its fields (a stale-version conflict names "Rated voltage", not "r.voltageV")
export const partSchema = labelFormSchema(partBoxesSchema, {
  ...partSpec,
  fields: Object.assign({}, partSpec.fields, ...allRatingBoxSpecs().map((s) => s.fields)),
});
export const offerSchema = specFormSchema<OfferFields>(offerSpec);
export const supplierSchema = specFormSchema<Supplier>(supplierSpec);
export const costingSchema = specFormSchema<CostingFields>(costingSpec);

// ------------------------------------------------------------ who uses what

/** Parts-list lines that use part `partId`, in words. */
export function partUsers(p: Project, partId: string): string[] {
  const stageName = (id: string | null) =>
    id === null ? 'General' : (p.stages.find((s) => s.id === id)?.name ?? 'a deleted stage');
  return p.bom
    .filter((l) => l.partId === partId)
    .map(
      (l) =>
        `parts-list line ${l.refs ? `“${l.refs}”` : '(no designators)'}` +
          ` in ${stageName(l.stageId)}, ${l.qtyPerRig} per rig`,
    );
}

export function supplierUsers(p: Project, name: string): string[] {
  const key = name.trim().toLowerCase();
  return p.parts.flatMap((part) =>
    part.offers
      .filter((o) => o.supplier.trim().toLowerCase() === key)
      .map((o) => `offer ${o.sku ? `“${o.sku}” ` : ''}for “${part.description}”`),
  );
}
