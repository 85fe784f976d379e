// SVG plot of the keyed carrier's spectrum: each spectral line of a steady dot train (dBc against offset from the
// carrier, one side), the key-click levels at the reported offsets, the necessary bandwidth's edge (K = 5) and the
// 99 % occupied bandwidth's edge. Pure: data in, SVG text out; no arithmetic beyond placing points.
import type { KeyingResult } from '../../src/core/rf/keying-eval';
import { esc } from './svg-text';

const fmt = (x: number) => (Math.round(x * 10) / 10).toString();

/** Render the keyed spectrum of one T/R stage ('' when there is nothing to draw). */
export function keyingPlotSvg(title: string, k: KeyingResult, widthPx = 720, heightPx = 320): string {
  const s = k.spectrum;
  if (s.offsetsHz.length < 2) return '';
  const m = { l: 56, r: 16, t: 30, b: 64 };
  const w = widthPx - m.l - m.r;
  const h = heightPx - m.t - m.b;
  const fMax = s.offsetsHz[s.offsetsHz.length - 1];
  const yMin = -120;
  const x = (f: number) => m.l + (f / fMax) * w;
  const y = (db: number) => m.t + (Math.min(0, Math.max(yMin, db)) / yMin) * h;
  const out: string[] = [];
  const label = `${title}: keyed spectrum at ${s.wpm} WPM, rise ${(k.riseS * 1e3).toFixed(1)} ms, fall ` +
    `${(k.fallS * 1e3).toFixed(1)} ms`;
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot keying-plot" viewBox="0 0 ` +
      `${widthPx} ${heightPx}" font-family="sans-serif" role="img" aria-label="${esc(label)}: level in dBc against ` +
      `offset from the carrier">`,
  );
  out.push(`<title>${esc(label)}</title>`);
  out.push(`<text x="${m.l}" y="18" font-size="13" font-weight="600">${esc(label)}</text>`);
  const nb = Math.min(fMax, k.necessaryFadingHz / 2);
  out.push(`<rect class="necessary" x="${m.l}" y="${m.t}" width="${fmt(x(nb) - m.l)}" height="${h}" fill="#cfe8d5" />`);
  for (let db = 0; db >= yMin; db -= 20) {
    out.push(`<line x1="${m.l}" x2="${m.l + w}" y1="${fmt(y(db))}" y2="${fmt(y(db))}" stroke="#e3e7ea" />`);
    out.push(`<text x="${m.l - 6}" y="${fmt(y(db) + 4)}" font-size="11" text-anchor="end">${db}</text>`);
  }
  for (let f = 0; f <= fMax + 1e-9; f += 500) {
    out.push(`<line x1="${fmt(x(f))}" x2="${fmt(x(f))}" y1="${m.t}" y2="${m.t + h}" stroke="#e3e7ea" />`);
    out.push(`<text x="${fmt(x(f))}" y="${m.t + h + 15}" font-size="11" text-anchor="middle">${f}</text>`);
  }
  out.push(`<rect x="${m.l}" y="${m.t}" width="${w}" height="${h}" fill="none" stroke="#555" />`);
  out.push(
    `<text x="${m.l + w / 2}" y="${m.t + h + 32}" font-size="12" text-anchor="middle">Offset from the carrier ` +
      `(Hz)</text>`,
  );
  out.push(
    `<text transform="translate(14 ${m.t + h / 2}) rotate(-90)" font-size="12" text-anchor="middle">Line level ` +
      `(dBc)</text>`,
  );
  // spectral lines as stems from the floor of the plot
  const stems = s.offsetsHz
    .map((f, i) => (s.levelsDbc[i] > yMin ? `M${fmt(x(f))} ${fmt(y(yMin))}V${fmt(y(s.levelsDbc[i]))}` : ''))
    .filter((d) => d !== '')
    .join('');
  out.push(`<path class="lines" d="${stems}" stroke="#1f5f99" stroke-width="1" fill="none" />`);
  const ob = k.spectrum.occupiedBandwidthHz / 2;
  if (ob <= fMax)
    out.push(
      `<line class="occupied" x1="${fmt(x(ob))}" x2="${fmt(x(ob))}" y1="${m.t}" y2="${m.t + h}" stroke="#7a5cc7" ` +
        `stroke-dasharray="5 4" />`,
    );
  for (const c of s.clicks) {
    const cy = y(c.levelDbc);
    out.push(
      `<path class="click" d="M${fmt(x(c.offsetHz) - 5)} ${fmt(cy - 5)}` +
        ` L${fmt(x(c.offsetHz) + 5)} ${fmt(cy - 5)} L${fmt(x(c.offsetHz))} ${fmt(cy + 4)} Z" fill="#d9822b" />`,
    );
  }
  const ly = heightPx - 14;
  const legend: [string, string][] = [
    ['<line x1="9" x2="9" y1="-6" y2="6" stroke="#1f5f99" />', 'spectral lines'],
    ['<rect x="0" y="-6" width="18" height="10" fill="#cfe8d5" />', 'necessary bandwidth, K = 5'],
    ['<line x1="0" x2="18" y1="0" y2="0" stroke="#7a5cc7" stroke-dasharray="5 4" />', '99 % occupied'],
    ['<path d="M4 -5 L14 -5 L9 4 Z" fill="#d9822b" />', 'key clicks'],
  ];
  let lx = m.l;
  for (const [sym, text] of legend) {
    out.push(
      `<g transform="translate(${fmt(lx)} ${ly})">${sym}<text x="22" y="4" font-size="11">${esc(text)}</text></g>`,
    );
    lx += 30 + text.length * 5.6;
  }
  out.push('</svg>');
  return out.join('');
}
