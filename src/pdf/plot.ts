// Vector line plots drawn with pdf-lib paths (no bitmaps): axes, a light grid, tick labels, one or more
// series. Reads finished data points only; it computes nothing but the mapping to the page.
import { rgb, type RGB } from 'pdf-lib';
import { GREY, INK, RULE, type Layout } from './layout';

export interface Series {
  label: string;
  xs: number[];
  ys: number[];
  color: RGB;
}

export interface PlotSpec {
  title: string;
  xLabel: string;
  yLabel: string;
  series: Series[];
  xLog?: boolean;
  /** fixed y range; otherwise from the data */
  yMin?: number;
  yMax?: number;
  /** format a tick value for the axis */
  xTick: (v: number) => string;
  yTick: (v: number) => string;
  /** vertical marker lines (e.g. the operating frequency) */
  markers?: { x: number; label: string }[];
  heightPt?: number;
}

export const BLUE = rgb(0.1, 0.3, 0.7);
export const ORANGE = rgb(0.85, 0.4, 0.05);

function niceStep(span: number, target: number): number {
  const raw = span / target;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const n = raw / mag;
  return (n < 1.5 ? 1 : n < 3 ? 2 : n < 7 ? 5 : 10) * mag;
}

export function plot(l: Layout, spec: PlotSpec): void {
  const finite = spec.series.map((s) =>
    s.xs
      .map((x, i) => [x, s.ys[i]] as const)
      .filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y) && (!spec.xLog || x > 0)),
  );
  const pts = finite.flat();
  if (pts.length < 2) {
    l.text(`${spec.title}: no data to plot.`, { color: GREY });
    return;
  }
  const heightPt = spec.heightPt ?? 170;
  l.ensure(heightPt + 50);
  if (spec.title) l.text(spec.title, { bold: true, sizePt: 9.5, afterPt: 2 });
  const tx = (x: number) => (spec.xLog ? Math.log10(x) : x);
  let x0 = Math.min(...pts.map(([x]) => tx(x)));
  let x1 = Math.max(...pts.map(([x]) => tx(x)));
  let y0 = spec.yMin ?? Math.min(...pts.map(([, y]) => y));
  let y1 = spec.yMax ?? Math.max(...pts.map(([, y]) => y));
  if (x1 - x0 < 1e-12) x1 = x0 + 1;
  if (y1 - y0 < 1e-12) {
    y0 -= 0.5;
    y1 += 0.5;
  }
  const yStep = niceStep(y1 - y0, 5);
  if (spec.yMin === undefined) y0 = Math.floor(y0 / yStep) * yStep;
  if (spec.yMax === undefined) y1 = Math.ceil(y1 / yStep) * yStep;

  const leftPt = l.leftPt + 46;
  const widthPt = l.contentWidthPt - 56;
  const topPt = l.yPt - 18;
  const bottomPt = topPt - heightPt;
  const px = (x: number) => leftPt + ((tx(x) - x0) / (x1 - x0)) * widthPt;
  const py = (y: number) => bottomPt + ((Math.min(y1, Math.max(y0, y)) - y0) / (y1 - y0)) * heightPt;
  const page = l.page;

  for (let y = y0; y <= y1 + yStep * 1e-6; y += yStep) {
    page.drawLine({
      start: { x: leftPt, y: py(y) },
      end: { x: leftPt + widthPt, y: py(y) },
      thickness: 0.3,
      color: RULE,
    });
    const label = spec.yTick(y);
    l.drawAt(label, leftPt - 4 - l.textWidth(label, 7), py(y) - 2.5, 7, false, GREY);
  }
  const xTicks: number[] = [];
  if (spec.xLog) {
    for (let d = Math.floor(x0); d <= Math.ceil(x1); d++) for (const m of [1, 2, 5]) {
      const v = Math.log10(m) + d;
      if (v >= x0 - 1e-9 && v <= x1 + 1e-9) xTicks.push(10 ** v);
    }
  } else {
    const step = niceStep(x1 - x0, 6);
    for (let v = Math.ceil(x0 / step) * step; v <= x1 + step * 1e-6; v += step) xTicks.push(v);
  }
  for (const v of xTicks) {
    page.drawLine({
      start: { x: px(v), y: bottomPt },
      end: { x: px(v), y: bottomPt + heightPt },
      thickness: 0.3,
      color: RULE,
    });
    const label = spec.xTick(v);
    l.drawAt(label, px(v) - l.textWidth(label, 7) / 2, bottomPt - 10, 7, false, GREY);
  }
  page.drawRectangle({ x: leftPt, y: bottomPt, width: widthPt, height: heightPt, borderColor: GREY, borderWidth: 0.7 });
  for (const m of spec.markers ?? []) {
    if (tx(m.x) < x0 || tx(m.x) > x1) continue;
    page.drawLine({
      start: { x: px(m.x), y: bottomPt },
      end: { x: px(m.x), y: bottomPt + heightPt },
      thickness: 0.6,
      color: GREY,
      dashArray: [3, 2],
    });
    l.drawAt(m.label, px(m.x) + 2, bottomPt + heightPt - 9, 7, false, GREY);
  }
  finite.forEach((points, si) => {
    if (points.length < 2) return;
    // one SVG path per series; drawSvgPath's y axis points down from the given origin
    const d = points
      .map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${(px(x) - leftPt).toFixed(2)} ${(topPt - py(y)).toFixed(2)}`)
      .join(' ');
    page.drawSvgPath(d, { x: leftPt, y: topPt, borderColor: spec.series[si].color, borderWidth: 1.1 });
  });
  // legend and axis labels
  let lx = leftPt;
  const ly = bottomPt - 24;
  l.drawAt(spec.xLabel, leftPt + widthPt - l.textWidth(spec.xLabel, 7.5), ly, 7.5, false, INK);
  for (const s of spec.series) {
    page.drawLine({ start: { x: lx, y: ly + 3 }, end: { x: lx + 14, y: ly + 3 }, thickness: 1.4, color: s.color });
    l.drawAt(s.label, lx + 18, ly, 7.5, false, INK);
    lx += 18 + l.textWidth(s.label, 7.5) + 16;
  }
  l.drawAt(spec.yLabel, l.leftPt, topPt + 7, 7.5, false, INK);
  l.yPt = ly - 12;
}
