// The builder's parts list: what one rig needs, by stage, with quantities and references; no prices or orders
// (those are on the organiser's pages).
import type { Project } from '../../core/model';
import { GREY, type Layout, type Row } from '../layout';
import { lineRoleText, rolesTable, stateColor, type PackRoles } from './roles';

export function rigPartsList(l: Layout, project: Project, report: PackRoles = {}): void {
  const roleOf = lineRoleText(report);
  l.heading('Parts for one rig');
  l.text('By stage, in build order; quantities per rig. Check each part against its references before you fit it.', {
    sizePt: 8.5,
    color: GREY,
    afterPt: 6,
  });
  const partById = new Map(project.parts.map((p) => [p.id, p]));
  const groups: { title: string; stageId: string | null }[] = [
    ...project.stages.map((s) => ({ title: s.name, stageId: s.id as string | null })),
    { title: 'General', stageId: null },
  ];
  const rows: Row[] = [];
  for (const g of groups) {
    const lines = project.bom.filter((b) => b.stageId === g.stageId && b.qtyPerRig > 0);
    if (!lines.length) continue;
    rows.push({ cells: [g.title], bold: true, shade: true, span: true });
    for (const b of lines) {
      const role = roleOf.get(b.id);
      const part = partById.get(b.partId)?.description ?? b.partId;
      rows.push({
        cells: [b.refs, role ? `${part}. ${role.text}` : part, String(b.qtyPerRig), b.notes],
        color: stateColor(role?.state),
      });
    }
  }
  if (!rows.length) {
    l.text('The parts list is empty.', { sizePt: 9 });
    rolesTable(l, project, report);
    return;
  }
  l.table(
    [
      { header: 'Refs', width: 0.14 },
      { header: 'Part', width: 0.5 },
      { header: 'Qty', width: 0.07, align: 'right' },
      { header: 'Notes', width: 0.29 },
    ],
    rows,
    8.5,
    'Parts for one rig',
  );
  rolesTable(l, project, report);
}
