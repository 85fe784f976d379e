// Parts catalog forms, derived from the field specs in src/core/spec (parts.ts, costing.ts): form text -> model values.
import type { Project, Supplier } from '../core/model';
import { costingSpec, offerSpec, partSpec, supplierSpec } from '../core/spec';
import type { CostingFields, OfferFields, PartFields } from '../core/edits/catalog';
import { specFormSchema } from './forms/spec-schema';

export const partSchema = specFormSchema<PartFields>(partSpec);
export const offerSchema = specFormSchema<OfferFields>(offerSpec);
export const supplierSchema = specFormSchema<Supplier>(supplierSpec);
export const costingSchema = specFormSchema<CostingFields>(costingSpec);

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
