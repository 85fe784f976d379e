// Supply editor forms, derived from the field specs in src/core/spec (display text -> SI), plus the "what still uses
// this?" checks for deletes. Rail forms are parsed by the rail edit in core (src/core/edits/supply-rails.ts).
import type { Project, Transformer, Winding } from '../core/model';
import { addRailSpec, enclosureSpec, primaryFuseSpec, transformerSpec, windingSpec } from '../core/spec';
import { specFormSchema } from './forms/spec-schema';

export const transformerSchema =
  specFormSchema<Pick<Transformer, 'name' | 'construction' | 'secondaryToleranceFraction'>>(transformerSpec);
export const windingSchema = specFormSchema<Omit<Winding, 'id'>>(windingSpec);
export const fuseSchema = specFormSchema<{ primaryFuseA: number | null }>(primaryFuseSpec);
export const enclosureSchema = specFormSchema<{ enclosureAreaM2: number | null; enclosureUWPerM2K: number | null }>(
  enclosureSpec,
);
export const addRailSchema = specFormSchema<{ name: string; source: string }>(addRailSpec);

export { possibleParents } from '../core/edits/supply-rails';

// ---------------------------------------------------------------- who uses what

/** Sentences naming everything that draws on rail `railId` (empty = free to delete). */
export function railUsers(p: Project, railId: string): string[] {
  const out: string[] = [];
  for (const r of p.supply.rails)
    if (r.kind === 'regulated' && r.parentId === railId) out.push(`rail “${r.name}” is fed from it`);
  for (const s of p.stages) {
    if (s.loads.some((l) => l.railId === railId)) out.push(`stage “${s.name}” draws current from it`);
    if (s.pa?.railId === railId) out.push(`the final amplifier “${s.name}” runs from it`);
    if (s.relay?.coilRailId === railId) out.push(`the relay coil of “${s.name}” is powered from it`);
  }
  return out;
}

export function windingUsers(p: Project, windingId: string): string[] {
  return p.supply.rails
    .filter((r) => r.kind === 'rectified' && r.windingId === windingId)
    .map((r) => `rail “${r.name}” is rectified from it`);
}

export function transformerUsers(p: Project, transformerId: string): string[] {
  const t = p.supply.transformers.find((x) => x.id === transformerId);
  return t ? t.windings.flatMap((w) => windingUsers(p, w.id).map((u) => `${w.name}: ${u}`)) : [];
}

export function refusal(what: string, users: string[]): string {
  return `${what.charAt(0).toUpperCase()}${what.slice(1)} cannot be deleted while it is in use: ` +
    `${users.join('; ')}. Change or delete those first.`;
}
