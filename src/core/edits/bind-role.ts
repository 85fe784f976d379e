// Binding a catalog part to a design role as a pure edit: the line bound to the role takes the part (quantity,
// stage and designators kept); with no bound line, a new line is added for the role with its pieces per rig. For a
// grouped role (fuses, bleeders, filter capacitors: one line per value) the candidate takes the line whose part has
// the same value, or a new line is added for that value with the design's count of it.
import type { Project } from '../model';
import type { DesignRole } from '../roles/types';
import { groupOf } from '../roles/role-checks';
import type { EditResult } from './catalog';
import { formatValue } from '../units';

export function bindCandidate(p: Project, role: DesignRole | undefined, partId: string, newLineId: string): EditResult {
  if (!role)
    return {
      errors: {
        _form: 'That part of the design no longer exists (the design changed?). The page now shows the current roles.',
      },
    };
  const part = p.parts.find((x) => x.id === partId);
  if (!part)
    return { errors: { partId: 'Part: that part is not in the catalog (deleted?); choose another candidate' } };
  const bound = p.bom.filter((l) => l.roleId === role.id);
  const group = groupOf(role, part);
  if (group) {
    const same = bound.find((l) => {
      const q = p.parts.find((x) => x.id === l.partId);
      const g = q ? groupOf(role, q) : null;
      return g !== null && g.key === group.key && g.value === group.value;
    });
    if (same) return { ...p, bom: p.bom.map((l) => (l.id === same.id ? { ...l, partId } : l)) };
    const unit = role.rules.find((r) => r.key === group.key)?.unit ?? '';
    const what = typeof group.value === 'number' ? formatValue(group.value, unit) : group.value;
    const line = {
      id: newLineId,
      stageId: role.stageId,
      partId,
      qtyPerRig: group.count,
      refs: '',
      notes: `${role.label}: ${what} (${group.where})`,
      roleId: role.id,
    };
    return { ...p, bom: [...p.bom, line] };
  }
  if (bound.length === 0) {
    const line = {
      id: newLineId,
      stageId: role.stageId,
      partId,
      qtyPerRig: role.qtyPerRig,
      refs: '',
      notes: '',
      roleId: role.id,
    };
    return { ...p, bom: [...p.bom, line] };
  }
  const first = bound[0].id;
  return { ...p, bom: p.bom.map((l) => (l.id === first ? { ...l, partId } : l)) };
}
