// SVG plot of a rectified rail over two mains cycles at its worst voltage corner: reservoir (rail) voltage on
// the left axis, winding current on the right axis, the minimum the regulators need as a dashed line.
// Pure: data in, SVG text out; no arithmetic beyond placing points and choosing tick steps. Self-contained
// (inline styles, no external CSS).
import type { RectifiedRailReport } from '../../src/core/power/report-types';
import { formatValue } from '../../src/core/units';
import { esc } from './svg-text';
import { r1, ticks } from './ticks';

export interface RectifierPlotData {
  title: string;
  /** Time from the start of the window (s). */
  timeS: number[];
  /** Rail voltage (V). */
  outputV: number[];
  /** Winding current, signed (A). */
  windingA: number[];
  /** Minimum rail voltage needed (V), drawn dashed; null = none. */
  minimumV: number | null;
  minimumLabel: string;
}

/** Pick the plot data for one rectified rail out of the supply report. */
export function rectifierPlotData(rail: RectifiedRailReport): RectifierPlotData {
  const corner = rail.corners.find((c) => c.id === rail.worstVoltageCornerId);
  return {
    title: `${rail.railName}: ${corner ? corner.label.toLowerCase() : 'worst corner'}`,
    timeS: rail.waveform.timeS,
    outputV: rail.waveform.outputV,
    windingA: rail.waveform.windingA,
    minimumV: rail.requiredMinV > 0 ? rail.requiredMinV : null,
    minimumLabel: `needed minimum ${formatValue(rail.requiredMinV, 'V')}`,
  };
}

function range(values: number[], extra: (number | null)[], padFraction: number): [number, number] {
  const all = [...values, ...extra.filter((x): x is number => x !== null)].filter(Number.isFinite);
  if (!all.length) return [0, 1];
  let lo = Math.min(...all);
  let hi = Math.max(...all);
  if (hi - lo < 1e-9) {
    lo -= 0.5;
    hi += 0.5;
  }
  const pad = (hi - lo) * padFraction;
  return [lo - pad, hi + pad];
}

/** Render the plot as an SVG string (viewBox widthPx x heightPx). */
export function rectifierPlotSvg(d: RectifierPlotData, widthPx = 720, heightPx = 360): string {
  const m = { l: 60, r: 60, t: 30, b: 70 };
  const w = widthPx - m.l - m.r;
  const h = heightPx - m.t - m.b;
  const n = Math.min(d.timeS.length, d.outputV.length, d.windingA.length);
  const head = `<svg xmlns="http://www.w3.org/2000/svg" class="plot" viewBox="0 0 ` +
    `${widthPx} ${heightPx}" role="img" aria-label="${esc(d.title)}" font-family="sans-serif" font-size="11">`;
  const title = `<text x="${m.l}" y="18" font-size="13" font-weight="bold" fill="#222">${esc(d.title)}</text>`;
  if (n < 2)
    return `${head}${title}<text x="${m.l}" y="${m.t + h / 2}" fill="#666">No waveform: the rail could not be ` +
      `simulated.</text></svg>`;
  const t0 = d.timeS[0];
  const t1 = d.timeS[n - 1];
  const [vLo, vHi] = range(d.outputV.slice(0, n), [d.minimumV], 0.08);
  const [aLoRaw, aHiRaw] = range(d.windingA.slice(0, n), [0], 0.08);
  const aMax = Math.max(Math.abs(aLoRaw), Math.abs(aHiRaw));
  const [aLo, aHi] = [-aMax, aMax];
  const x = (t: number) => m.l + ((t - t0) / (t1 - t0 || 1)) * w;
  const yV = (v: number) => m.t + (1 - (v - vLo) / (vHi - vLo)) * h;
  const yA = (a: number) => m.t + (1 - (a - aLo) / (aHi - aLo)) * h;
  const parts: string[] = [head, title];
  parts.push(`<rect x="${m.l}" y="${m.t}" width="${w}" height="${h}" fill="#fff" stroke="#999"/>`);
  for (const tv of ticks(t0, t1, 8)) {
    const px = r1(x(tv));
    parts.push(`<line x1="${px}" y1="${m.t}" x2="${px}" y2="${m.t + h}" stroke="#eee"/>`);
    parts.push(
      `<text x="${px}" y="${m.t + h + 14}" text-anchor="middle" fill="#333">${esc(formatValue(tv, 's', 2))}</text>`,
    );
  }
  for (const vv of ticks(vLo, vHi, 6)) {
    const py = r1(yV(vv));
    parts.push(`<line x1="${m.l}" y1="${py}" x2="${m.l + w}" y2="${py}" stroke="#eee"/>`);
    parts.push(
      `<text x="${m.l - 6}" y="${py}" text-anchor="end" dominant-baseline="middle" ` +
        `fill="#1f5fa8">${esc(formatValue(vv, 'V', 3))}</text>`,
    );
  }
  for (const av of ticks(aLo, aHi, 6)) {
    parts.push(
      `<text x="${m.l + w + 6}" y="${r1(yA(av))}" dominant-baseline="middle" ` +
        `fill="#b5541c">${esc(formatValue(av, 'A', 2))}</text>`,
    );
  }
  parts.push(
    `<line x1="${m.l}" y1="${r1(yA(0))}" x2="${m.l + w}" y2="${r1(yA(0))}" stroke="#ccc" stroke-dasharray="2 3"/>`,
  );
  const poly = (ys: number[], y: (v: number) => number) =>
    ys
      .slice(0, n)
      .map((v, i) => `${r1(x(d.timeS[i]))},${r1(y(v))}`)
      .join(' ');
  parts.push(`<polyline fill="none" stroke="#b5541c" stroke-width="1.2" points="${poly(d.windingA, yA)}"/>`);
  parts.push(`<polyline fill="none" stroke="#1f5fa8" stroke-width="2" points="${poly(d.outputV, yV)}"/>`);
  if (d.minimumV !== null) {
    const py = r1(yV(d.minimumV));
    parts.push(
      `<line x1="${m.l}" y1="${py}" x2="${m.l + w}" y2="${py}" stroke="#c0392b" stroke-width="1.5" ` +
        `stroke-dasharray="6 4"/>`,
    );
  }
  // axis titles
  parts.push(
    `<text x="${m.l + w / 2}" y="${m.t + h + 32}" text-anchor="middle" fill="#222">time (two mains cycles)</text>`,
  );
  parts.push(
    `<text transform="translate(14 ${m.t + h / 2}) rotate(-90)" text-anchor="middle" fill="#1f5fa8">rail voltage ` +
      `(V)</text>`,
  );
  parts.push(
    `<text transform="translate(${widthPx - 10} ${m.t + h / 2}) rotate(90)" text-anchor="middle" ` +
      `fill="#b5541c">winding current (A)</text>`,
  );
  // legend
  const ly = heightPx - 14;
  parts.push(
    `<line x1="${m.l}" y1="${ly}" x2="${m.l + 24}" y2="${ly}" stroke="#1f5fa8" stroke-width="2"/><text ` +
      `x="${m.l + 30}" y="${ly + 4}" fill="#222">reservoir voltage</text>`,
  );
  parts.push(
    `<line x1="${m.l + 160}" y1="${ly}" x2="${m.l + 184}" y2="${ly}" stroke="#b5541c" stroke-width="1.2"/><text ` +
      `x="${m.l + 190}" y="${ly + 4}" fill="#222">winding current</text>`,
  );
  if (d.minimumV !== null) {
    parts.push(
      `<line x1="${m.l + 310}" y1="${ly}" x2="${m.l + 334}" y2="${ly}" stroke="#c0392b" stroke-width="1.5" ` +
        `stroke-dasharray="6 4"/><text x="${m.l + 340}" y="${ly + 4}" fill="#222">${esc(d.minimumLabel)}</text>`,
    );
  }
  parts.push('</svg>');
  return parts.join('');
}
