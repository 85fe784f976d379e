// Binding a catalog part to a design role as a pure edit: the line bound to the role takes the part (quantity,
// stage and designators kept); with no bound line, a new line is added for the role with its pieces per rig.
import type { Project } from '../model';
import type { DesignRole } from '../roles/types';
import type { EditResult } from './catalog';

export function bindCandidate(p: Project, role: DesignRole | undefined, partId: string, newLineId: string): EditResult {
  if (!role) return { errors: { _form: 'That part of the design no longer exists (the design changed?). The page now shows the current roles.' } };
  if (!p.parts.some((x) => x.id === partId)) return { errors: { partId: 'Part: that part is not in the catalog (deleted?); choose another candidate' } };
  const bound = p.bom.filter((l) => l.roleId === role.id);
  if (bound.length === 0) {
    const line = { id: newLineId, stageId: role.stageId, partId, qtyPerRig: role.qtyPerRig, refs: '', notes: '', roleId: role.id };
    return { ...p, bom: [...p.bom, line] };
  }
  const first = bound[0].id;
  return { ...p, bom: p.bom.map((l) => (l.id === first ? { ...l, partId } : l)) };
}
