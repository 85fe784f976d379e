// Shared pieces of the pack's sections: key/value blocks, findings lists, "not computed" notes.
import type { Finding } from '../../core/findings';
import { actionable, sortFindings } from '../../core/findings';
import { sourceText } from '../../core/sources/registry';
import { formatValue } from '../../core/units';
import { withSubject } from '../../core/checklists';
import { CAUTION, FAIL, GREY, INK, type Layout } from '../layout';

export const fv = formatValue;

/** Two-column key/value block without rules. */
export function keyValues(l: Layout, rows: [string, string][], keyWidthPt = 170, sizePt = 9.5): void {
  const lineH = sizePt * 1.35;
  for (const [k, v] of rows) {
    const keys = l.wrap(k, keyWidthPt - 10, sizePt);
    const lines = l.wrap(v, l.contentWidthPt - keyWidthPt, sizePt);
    const n = Math.max(keys.length, lines.length);
    l.ensure(n * lineH);
    l.yPt -= lineH;
    keys.forEach((line, i) => l.drawAt(line, l.leftPt, l.yPt - i * lineH + sizePt * 0.28, sizePt, false, GREY));
    lines.forEach((line, i) =>
      l.drawAt(line, l.leftPt + keyWidthPt, l.yPt - i * lineH + sizePt * 0.28, sizePt, false, INK),
    );
    l.yPt -= (n - 1) * lineH + 1.5;
  }
  l.yPt -= 6;
}

const SEV_LABEL = { fail: 'FAIL', caution: 'CAUTION', ok: 'ok' } as const;

/**
 * Findings a design change can clear, as a list, most severe first; `onlyProblems` hides the ok ones. Standing
 * cautions are printed once, in the safety checklist, not in every section.
 */
export function findingsList(l: Layout, findings: readonly Finding[], onlyProblems = false, max = Infinity): void {
  const list = sortFindings(actionable(findings)).filter((f) => !onlyProblems || f.severity !== 'ok');
  if (list.length === 0) {
    l.text(onlyProblems ? 'No cautions or failures.' : 'No findings.', { color: GREY });
    return;
  }
  const shown = list.slice(0, max);
  const size = 8.5;
  const lineH = size * 1.3;
  const tagW = 52;
  for (const f of shown) {
    const color = f.severity === 'fail' ? FAIL : f.severity === 'caution' ? CAUTION : GREY;
    const body = withSubject(f.subject, f.message);
    const lines = l.wrap(body, l.contentWidthPt - tagW, size);
    l.ensure(lines.length * lineH + 2);
    l.yPt -= lineH;
    l.drawAt(SEV_LABEL[f.severity], l.leftPt, l.yPt + size * 0.28, size, true, color);
    lines.forEach((line, i) => l.drawAt(line, l.leftPt + tagW, l.yPt - i * lineH + size * 0.28, size, false, INK));
    l.yPt -= (lines.length - 1) * lineH + 2;
    const src = `Source: ${sourceText(f.source)}`;
    if (src) {
      const srcLines = l.wrap(src, l.contentWidthPt - tagW, 7);
      for (const s of srcLines) {
        l.ensure(9);
        l.yPt -= 9;
        l.drawAt(s, l.leftPt + tagW, l.yPt + 2, 7, false, GREY);
      }
      l.yPt -= 2;
    }
  }
  if (list.length > shown.length)
    l.text(`… and ${list.length - shown.length} more in the sections that follow.`, { color: GREY, sizePt: 8.5 });
  l.yPt -= 4;
}

export function notComputed(l: Layout, what: string): void {
  l.text(`${what}: not computed.`, { color: GREY });
}
