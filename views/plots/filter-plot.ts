// SVG plot of the as-built low-pass filter: |S21| (dB) against frequency (log axis), with the band
// shaded, harmonics marked, the attenuation the spurious rule needs (limit line) and the Monte Carlo
// worst case. Pure: data in, SVG text out; no arithmetic beyond placing points.
import type { RfReport } from '../../src/core/rf/report';
import { esc } from './svg-text';

export interface FilterPlotData {
  title: string;
  /** Sweep points: frequency (Hz) and 20 log10 |S21| (dB, negative = loss). */
  sweep: { frequencyHz: number; s21Db: number }[];
  bandLowHz: number;
  bandHighHz: number;
  cutoffHz: number;
  /** Per harmonic: nominal |S21| (dB), the |S21| the rule allows at most (dB), Monte Carlo worst |S21| (dB). */
  harmonics: { n: number; frequencyHz: number; s21Db: number; limitS21Db: number | null; worstS21Db: number | null }[];
  ruleLabel: string;
}

/** Pick the data for one filter stage out of the report (the report's main filter by default). */
export function filterPlotData(report: RfReport, lpfStageId?: string): FilterPlotData | null {
  const id = lpfStageId ?? report.lpfStageId;
  const st = report.stages.find((s) => s.stageId === id && s.lpf?.analysis && s.lpf.design);
  if (!st?.lpf?.analysis || !st.lpf.design) return null;
  const a = st.lpf.analysis;
  const d = st.lpf.design;
  const rows = id === report.lpfStageId ? report.harmonics?.rows ?? [] : [];
  const il = a.atOperating.lossDb;
  return {
    title: `${st.stageName}: ${
      d.response === 'chebyshev' ? `Chebyshev ${d.rippleDb} dB` : 'Butterworth'
    }, order ${d.order}`,
    sweep: a.sweep.map((p) => ({ frequencyHz: p.frequencyHz, s21Db: p.s21Db })),
    bandLowHz: a.bandLowHz,
    bandHighHz: a.bandHighHz,
    cutoffHz: d.cutoffHz,
    harmonics: a.harmonics.map((h) => {
      const row = rows.find((r) => r.n === h.n);
      const mc = st.lpf?.monteCarlo?.harmonics.find((m) => m.n === h.n);
      return {
        n: h.n,
        frequencyHz: h.frequencyHz,
        s21Db: -h.attenuationDb,
        limitS21Db: row ? -(row.neededFilterAttenuationDb + il) : null,
        worstS21Db: mc ? -mc.worstAttenuationDb : null,
      };
    }),
    ruleLabel: report.harmonics
      ? `${report.harmonics.requiredDb.toFixed(0)} dB rule ` +
        `(${report.harmonics.rule === 'us-97-307' ? '47 CFR 97.307(d)' : 'ITU RR Appendix 3'})`
      : 'rule',
  };
}

const fmt = (x: number) => (Math.round(x * 10) / 10).toString();

function mhzLabel(hz: number): string {
  const m = hz / 1e6;
  return `${m >= 10 ? m.toFixed(0) : m.toPrecision(2).replace(/\.0$/, '')}`;
}

/** Render the plot. Width/height in CSS pixels of the viewBox. */
export function renderFilterPlot(d: FilterPlotData, widthPx = 720, heightPx = 380): string {
  const m = { l: 56, r: 16, t: 30, b: 64 };
  const w = widthPx - m.l - m.r;
  const h = heightPx - m.t - m.b;
  const fs = d.sweep.map((p) => p.frequencyHz).filter((f) => f > 0);
  if (fs.length < 2) return '';
  const f0 = Math.min(...fs),
    f1 = Math.max(...fs);
  const lo = Math.log10(f0),
    hi = Math.log10(f1);
  const values = [
    ...d.sweep.map((p) => p.s21Db),
    ...d.harmonics.flatMap((x) => [x.limitS21Db ?? 0, x.worstS21Db ?? 0]),
  ];
  const yMin = Math.max(-140, Math.min(-60, Math.floor(Math.min(...values) / 20) * 20));
  const x = (f: number) => m.l + ((Math.log10(f) - lo) / (hi - lo)) * w;
  const y = (db: number) => m.t + (Math.min(0, Math.max(yMin, db)) / yMin) * h;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot filter-plot" viewBox="0 0 ` +
      `${widthPx} ${heightPx}" font-family="sans-serif" role="img" aria-label="${esc(d.title)}: |S21| in dB against ` +
      `frequency">`,
  );
  out.push(`<title>${esc(d.title)}</title>`);
  out.push(`<text x="${m.l}" y="18" font-size="13" font-weight="600">${esc(d.title)}</text>`);
  // band shading
  const bx0 = x(Math.max(f0, d.bandLowHz)),
    bx1 = x(Math.min(f1, d.bandHighHz));
  out.push(
    `<rect class="band" x="${fmt(bx0)}" y="${m.t}" width="${fmt(Math.max(1, bx1 - bx0))}" height="` +
      `${h}" fill="#cfe8d5" />`,
  );
  // grid and y axis
  for (let db = 0; db >= yMin; db -= 20) {
    out.push(`<line x1="${m.l}" x2="${m.l + w}" y1="${fmt(y(db))}" y2="${fmt(y(db))}" stroke="#e3e7ea" />`);
    out.push(`<text x="${m.l - 6}" y="${fmt(y(db) + 4)}" font-size="11" text-anchor="end">${db}</text>`);
  }
  // x ticks: 1-2-5 sequence
  for (let dec = Math.floor(lo); dec <= Math.ceil(hi); dec++) {
    for (const k of [1, 2, 5]) {
      const f = k * 10 ** dec;
      if (f < f0 || f > f1) continue;
      out.push(`<line x1="${fmt(x(f))}" x2="${fmt(x(f))}" y1="${m.t}" y2="${m.t + h}" stroke="#e3e7ea" />`);
      out.push(`<text x="${fmt(x(f))}" y="${m.t + h + 15}" font-size="11" text-anchor="middle">${mhzLabel(f)}</text>`);
    }
  }
  out.push(`<rect x="${m.l}" y="${m.t}" width="${w}" height="${h}" fill="none" stroke="#555" />`);
  out.push(
    `<text x="${m.l + w / 2}" y="${m.t + h + 32}" font-size="12" text-anchor="middle">Frequency (MHz, log ` +
      `scale)</text>`,
  );
  out.push(
    `<text transform="translate(14 ${m.t + h / 2}) rotate(-90)" font-size="12" text-anchor="middle">|S21| (dB)</text>`,
  );
  // cutoff marker
  if (d.cutoffHz > f0 && d.cutoffHz < f1) {
    out.push(
      `<line class="cutoff" x1="${fmt(x(d.cutoffHz))}" x2="${fmt(x(d.cutoffHz))}" y1="${m.t}" y2="` +
        `${m.t + h}" stroke="#888" stroke-dasharray="2 3" />`,
    );
    out.push(`<text x="${fmt(x(d.cutoffHz) + 3)}" y="${m.t + 12}" font-size="10" fill="#555">fc</text>`);
  }
  // harmonic markers, limit line (step per harmonic), worst-case marks
  const limitPts: string[] = [];
  for (const hm of d.harmonics) {
    if (hm.frequencyHz < f0 || hm.frequencyHz > f1) continue;
    const hx = x(hm.frequencyHz);
    out.push(
      `<line class="harmonic" x1="${fmt(hx)}" x2="${fmt(hx)}" y1="${m.t}" y2="${m.t + h}" stroke="#7a5cc7" ` +
        `stroke-dasharray="5 4" />`,
    );
    out.push(`<text x="${fmt(hx)}" y="${m.t - 4}" font-size="11" text-anchor="middle" fill="#7a5cc7">${hm.n}f</text>`);
    if (hm.limitS21Db !== null) {
      const xa = x(Math.max(f0, hm.frequencyHz * (1 - 0.5 / hm.n))),
        xb = x(Math.min(f1, hm.frequencyHz * (1 + 0.5 / hm.n)));
      limitPts.push(`${fmt(xa)},${fmt(y(hm.limitS21Db))} ${fmt(xb)},${fmt(y(hm.limitS21Db))}`);
    }
    if (hm.worstS21Db !== null) {
      const wy = y(hm.worstS21Db);
      out.push(
        `<path class="mc-worst" d="M${fmt(hx - 5)} ${fmt(wy - 5)}` +
          ` L${fmt(hx + 5)} ${fmt(wy - 5)} L${fmt(hx)} ${fmt(wy + 4)} Z" fill="#d9822b" />`,
      );
    }
  }
  if (limitPts.length)
    out.push(`<polyline class="limit" points="${limitPts.join(' ')}" fill="none" stroke="#c0392b" stroke-width="2" />`);
  // response curve
  const pts = d.sweep
    .filter((p) => p.frequencyHz > 0)
    .map((p) => `${fmt(x(p.frequencyHz))},${fmt(y(p.s21Db))}`)
    .join(' ');
  out.push(`<polyline class="response" points="${pts}" fill="none" stroke="#1f5f99" stroke-width="2" />`);
  // legend
  const ly = heightPx - 14;
  const legend: [string, string][] = [
    ['<line x1="0" x2="18" y1="0" y2="0" stroke="#1f5f99" stroke-width="2" />', '|S21| as built (with Q)'],
    ['<rect x="0" y="-6" width="18" height="10" fill="#cfe8d5" />', 'band'],
    ['<line x1="0" x2="18" y1="0" y2="0" stroke="#c0392b" stroke-width="2" />', `limit: ${d.ruleLabel}`],
    ['<path d="M4 -5 L14 -5 L9 4 Z" fill="#d9822b" />', 'Monte Carlo worst'],
  ];
  let lx = m.l;
  for (const [sym, label] of legend) {
    out.push(
      `<g transform="translate(${fmt(lx)} ${ly})">${sym}<text x="22" y="4" font-size="11">${esc(label)}</text></g>`,
    );
    lx += 30 + label.length * 5.6;
  }
  out.push('</svg>');
  return out.join('');
}

/** Convenience: the SVG for the report's filter ('' when there is no analysed filter). */
export function filterPlotSvg(report: RfReport, lpfStageId?: string): string {
  const d = filterPlotData(report, lpfStageId);
  return d ? renderFilterPlot(d) : '';
}
