// Checklists with tick boxes; caution lines stand out. The numbers are already in the item text.
import type { ChecklistSection } from '../../core/checklists';
import { CAUTION, INK, type Layout } from '../layout';

export function checklistPages(l: Layout, title: string, intro: string, sections: ChecklistSection[]): void {
  l.newPage();
  l.heading(title);
  if (intro) l.text(intro, { sizePt: 9, afterPt: 6 });
  const size = 9;
  const lineH = size * 1.32;
  const boxPt = 8;
  const textX = l.leftPt + boxPt + 8;
  const textW = l.contentWidthPt - boxPt - 8;
  for (const s of sections) {
    if (s.items.length === 0) continue;
    l.heading(s.title, 2, 40);
    for (const item of s.items) {
      const lines = l.wrap(item.text, textW, size);
      l.ensure(lines.length * lineH + 3);
      l.yPt -= lineH;
      l.tickBox(l.leftPt, l.yPt + 1, boxPt);
      lines.forEach((line, i) =>
        l.drawAt(
          line,
          textX,
          l.yPt - i * lineH + size * 0.28,
          size,
          false,
          item.emphasis === 'caution' ? CAUTION : INK,
        ),
      );
      l.yPt -= (lines.length - 1) * lineH + 3.5;
    }
    l.gap(3);
  }
}
