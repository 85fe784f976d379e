// A new project from a station template (pure: ids come from the caller's makeId).
import type { Mains, Project } from '../model';
import { bandOf } from '../rf/bands';
import { cloneProject, newProject } from '../new-project';
import { TEMPLATE_INFO, type TemplateKey } from './choices';
import { STARTER_SUPPLIERS, starterParts } from './parts';
import { STATIONS } from './stations';

export interface TemplateInput {
  name: string;
  frequencyHz: number;
  targetPowerW: number;
  mains: Mains | null;
}

/**
 * The template's stages, supply tree and starter parts list for the chosen band, power and mains. A battery template
 * gets no mains; a mains template needs mains (the new-project form refuses the combination before this is called).
 */
export function projectFromTemplate(
  key: TemplateKey,
  input: TemplateInput,
  id: string,
  makeId: (prefix: string) => string,
): Project {
  const info = TEMPLATE_INFO[key];
  if (info.mains && !input.mains) throw new Error(`template ${key} needs a mains supply`);
  const base = newProject(id, input.name, input.frequencyHz, input.targetPowerW, info.mains ? input.mains : null);
  const station = STATIONS[key](bandOf(input.frequencyHz)?.name ?? '', input.targetPowerW);
  const catalog = starterParts(input.frequencyHz);
  const used = [...new Set(station.lines.map((l) => l.partId))];
  const project: Project = {
    ...base,
    notes: `Started from the "${info.label}" template: typical values and invented suppliers and prices. ` +
      'Replace them with your own circuit, measurements and offers.',
    supply: station.supply,
    stages: station.stages,
    parts: used.map((p) => structuredClone(catalog[p]!)),
    bom: station.lines.map((l, i) => ({
      id: `bl-${i}`,
      stageId: l.stageId,
      partId: l.partId,
      qtyPerRig: l.qty,
      refs: l.refs,
      notes: l.notes ?? '',
      roleId: l.role ?? null,
    })),
    costing: { ...base.costing, suppliers: structuredClone(STARTER_SUPPLIERS) },
  };
  // fresh ids for every row, as a clone gets, so two projects from one template never share one
  const copy = cloneProject(project, id, input.name, makeId);
  return {
    ...copy,
    bom: copy.bom.map((l) => ({ ...l, roleId: l.roleId ? renamedRole(l.roleId, idMap(project, copy)) : null })),
  };
}

/** Old id -> new id of every transformer, rail and stage (the clone keeps their order). */
function idMap(from: Project, to: Project): Map<string, string> {
  const pairs = (a: { id: string }[], b: { id: string }[]) => a.map((x, i): [string, string] => [x.id, b[i]!.id]);
  return new Map([
    ...pairs(from.supply.transformers, to.supply.transformers),
    ...pairs(from.supply.rails, to.supply.rails),
    ...pairs(from.stages, to.stages),
  ]);
}

/** A role id is "<kind>:<design id>" or a bare kind ("fuses"): its design id follows the clone's new ids. */
function renamedRole(roleId: string, ids: Map<string, string>): string {
  const at = roleId.indexOf(':');
  return at < 0 ? roleId : `${roleId.slice(0, at + 1)}${ids.get(roleId.slice(at + 1)) ?? roleId.slice(at + 1)}`;
}
