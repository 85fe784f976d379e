// A one-parameter sweep as small charts, one per margin (each rail's trough margin, the harmonic margin): the margin
// against the swept value, the limit (margin 0) as a labelled line, the project's own value as a labelled dashed
// line. Readable without colour: a passing point is a circle, a failing one a cross, and every point's value is
// written in the table beside the chart on the page. Pure: data in, SVG text out.
import type { SweepResult } from '../../src/core/compare/sweep';
import type { DisplayUnit } from '../../src/core/spec/field';
import { esc } from './svg-text';

const W = 640;
const PANEL_H = 150;
const LEFT = 56;
const RIGHT = 150;
const TOP = 22;
const BOTTOM = 30;
const f1 = (x: number) => (Math.round(x * 10) / 10).toString();

/** A tidy number for axis labels (three significant digits). */
const tidy = (x: number) => (Math.abs(x) >= 100 ? x.toFixed(0) : Number(x.toPrecision(3)).toString());

/** The margin series of a sweep: one per metric marked as a margin, in the order the metrics come. */
export function marginSeries(
  r: SweepResult,
): { key: string; label: string; unit: string; values: (number | null)[] }[] {
  const first = r.points[0]?.metrics ?? [];
  return first
    .filter((m) => m.margin)
    .map((m) => ({
      key: m.key,
      label: m.label,
      unit: m.unit,
      values: r.points.map((p) => p.metrics.find((x) => x.key === m.key)?.value ?? null),
    }));
}

export function sweepPlotSvg(r: SweepResult, display: DisplayUnit): string {
  const series = marginSeries(r).filter((s) => s.values.some((v) => v !== null));
  const xs = r.points.map((p) => p.value / display.scale);
  const unit = display.symbol ? ` ${display.symbol}` : '';
  const h = Math.max(1, series.length) * PANEL_H + 4;
  const out = [
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot sweep" viewBox="0 0 ${W} ${h}" role="img" ` +
      `aria-labelledby="sw-title" ` +
      `font-family="sans-serif" font-size="11"><title ` +
      `id="sw-title">${esc(`Margins against ${r.label.toLowerCase()} of ${r.target.name}`)}` +
      `: circles pass, crosses fail; the line at 0 is the limit</title>`,
  ];
  if (!series.length) {
    out.push('<text x="0" y="16">No margin could be computed at any point (see the table).</text></svg>');
    return out.join('');
  }
  const [xLo, xHi] = [Math.min(...xs), Math.max(...xs)];
  const plotW = W - LEFT - RIGHT;
  const x = (v: number) => LEFT + (xHi > xLo ? ((v - xLo) / (xHi - xLo)) * plotW : plotW / 2);
  const nowX = r.target.currentValue / display.scale;
  series.forEach((s, i) => {
    const top = i * PANEL_H + TOP;
    const plotH = PANEL_H - TOP - BOTTOM;
    const vals = s.values.filter((v): v is number => v !== null);
    const lo = Math.min(0, ...vals);
    const hi = Math.max(0, ...vals);
    const pad = Math.max((hi - lo) * 0.1, 0.1);
    const [yLo, yHi] = [lo - pad, hi + pad];
    const y = (v: number) => top + plotH - ((v - yLo) / (yHi - yLo)) * plotH;
    const name = s.label.length > 90 ? `${s.label.slice(0, 89)}…` : s.label;
    out.push(`<text x="0" y="${top - 8}" font-weight="bold">${esc(name)} (${esc(s.unit)})</text>`);
    out.push(`<rect x="${LEFT}" y="${top}" width="${plotW}" height="${plotH}" fill="none" stroke="#c8d0d6"/>`);
    // the limit: margin 0
    out.push(
      `<line x1="${LEFT}" y1="${f1(y(0))}" x2="${LEFT + plotW}" y2="${f1(y(0))}" stroke="#1d2327" stroke-width="1.5"/>`,
    );
    out.push(`<text x="${LEFT + plotW + 6}" y="${f1(y(0) + 4)}">limit (0 ${esc(s.unit)})</text>`);
    for (const v of [yHi - pad, yLo + pad])
      out.push(`<text x="${LEFT - 6}" y="${f1(y(v) + 4)}" text-anchor="end">${tidy(v)}</text>`);
    // the project as it stands
    if (nowX >= xLo && nowX <= xHi) {
      out.push(
        `<line x1="${f1(x(nowX))}" y1="${top}" x2="${f1(x(nowX))}" y2="${top + plotH}" stroke="#5b6770" ` +
          `stroke-dasharray="4 3"/>`,
      );
      out.push(`<text x="${f1(x(nowX) + 3)}" y="${top + plotH - 4}" fill="#5b6770">now</text>`);
    }
    // the line through computed points (a gap where a point could not be computed)
    let path = '';
    s.values.forEach((v, j) => {
      if (v === null) return void (path += ' ');
      path += `${path.endsWith(' ') || path === '' ? 'M' : 'L'}${f1(x(xs[j]))},${f1(y(v))}`;
    });
    out.push(`<path d="${path.trim().replace(/ +/g, ' ')}" fill="none" stroke="#1f5fa8" stroke-width="1.5"/>`);
    s.values.forEach((v, j) => {
      if (v === null) return;
      const [px, py] = [x(xs[j]), y(v)];
      if (v >= 0)
        out.push(
          `<circle cx="${f1(px)}" cy="${f1(py)}" r="4" fill="#1f5fa8"><title>` +
            `${tidy(xs[j])}${esc(unit)}: ${tidy(v)} ${esc(s.unit)}, passes</title></circle>`,
        );
      else
        out.push(
          `<path d="M${f1(px - 4)},${f1(py - 4)}L${f1(px + 4)},${f1(py + 4)}` +
            `M${f1(px - 4)},${f1(py + 4)}L${f1(px + 4)},${f1(py - 4)}" ` +
            `stroke="#b3261e" stroke-width="2.5"><title>${tidy(xs[j])}${esc(unit)}` +
            `: ${tidy(v)} ${esc(s.unit)}, fails</title></path>`,
        );
    });
    const last = vals.length ? vals[vals.length - 1] : null;
    const worst = vals.length ? Math.min(...vals) : null;
    if (worst !== null)
      out.push(
        `<text x="${LEFT + plotW + 6}" y="${top + 12}` +
          `">${worst < 0 ? '✗ fails at some points' : '✓ passes throughout'}</text>`,
      );
    if (last !== null)
      out.push(`<text x="${LEFT + plotW + 6}" y="${top + 26}">last: ${tidy(last)} ${esc(s.unit)}</text>`);
    // x axis: the ends and the unit
    out.push(`<text x="${LEFT}" y="${top + plotH + 14}" text-anchor="middle">${tidy(xLo)}</text>`);
    out.push(`<text x="${LEFT + plotW}" y="${top + plotH + 14}" text-anchor="middle">${tidy(xHi)}</text>`);
    out.push(
      `<text x="${LEFT + plotW / 2}" y="${top + plotH + 14}" text-anchor="middle">` +
        `${esc(r.label)}${esc(unit ? ` (${display.symbol})` : '')}</text>`,
    );
  });
  out.push('</svg>');
  return out.join('');
}
