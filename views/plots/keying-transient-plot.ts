// SVG plot of a PA rail's keying transient: the rail voltage from rest through the first dots (key-down shaded),
// the key-up and held-key levels dashed, and each dot's leading-edge output against a held key written above it.
// Pure: data in, SVG text out; no arithmetic beyond placing points and choosing tick steps. Self-contained
// (inline styles), drawn like the rectifier plot.
import type { KeyingTransient } from '../../src/core/power/keying-transient';
import { formatValue } from '../../src/core/units';
import { esc } from './svg-text';
import { r1, ticks } from './ticks';

const sdb = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(1)} dB`;

/** Render the transient of one rail ('' when there is nothing to draw). */
export function keyingTransientSvg(railName: string, k: KeyingTransient, widthPx = 720, heightPx = 340): string {
  const n = Math.min(k.waveform.timeS.length, k.waveform.railV.length);
  if (n < 2) return '';
  const m = { l: 60, r: 20, t: 44, b: 64 };
  const w = widthPx - m.l - m.r;
  const h = heightPx - m.t - m.b;
  const t0 = k.waveform.timeS[0];
  const t1 = k.waveform.timeS[n - 1];
  const vs = k.waveform.railV.slice(0, n).filter(Number.isFinite);
  let vLo = Math.min(...vs, k.keyDownTroughV);
  let vHi = Math.max(...vs, k.keyUpMeanV);
  const pad = (vHi - vLo || 1) * 0.08;
  vLo -= pad;
  vHi += pad;
  const x = (t: number) => m.l + ((t - t0) / (t1 - t0 || 1)) * w;
  const y = (v: number) => m.t + (1 - (v - vLo) / (vHi - vLo)) * h;
  const title = `${railName}: keyed from rest at ${k.wpm} WPM, nominal mains`;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot keying-transient-plot" viewBox="0 0 ` +
      `${widthPx} ${heightPx}" role="img" aria-label="${esc(title)}: rail voltage against time, key-down shaded" ` +
      `font-family="sans-serif" font-size="11">`,
  );
  out.push(`<text x="${m.l}" y="18" font-size="13" font-weight="bold" fill="#222">${esc(title)}</text>`);
  out.push(`<rect x="${m.l}" y="${m.t}" width="${w}" height="${h}" fill="#fff" stroke="#999"/>`);
  for (const e of k.elements) {
    const xa = Math.max(m.l, x(e.startS));
    const xb = Math.min(m.l + w, x(e.endS));
    if (xb <= xa) continue;
    out.push(`<rect class="key-down" x="${r1(xa)}" y="${m.t}" width="${r1(xb - xa)}" height="${h}" fill="#f6e3c6"/>`);
    out.push(
      `<text x="${r1((xa + xb) / 2)}" y="${m.t - 6}" text-anchor="middle" ` +
        `fill="#8a4b0f">${esc(sdb(e.leadVsSteadyDb))}</text>`,
    );
  }
  for (const tv of ticks(t0, t1, 8)) {
    const px = r1(x(tv));
    out.push(`<line x1="${px}" y1="${m.t}" x2="${px}" y2="${m.t + h}" stroke="#eee"/>`);
    out.push(
      `<text x="${px}" y="${m.t + h + 14}" text-anchor="middle" fill="#333">${esc(formatValue(tv, 's', 2))}</text>`,
    );
  }
  for (const vv of ticks(vLo, vHi, 6)) {
    const py = r1(y(vv));
    out.push(`<line x1="${m.l}" y1="${py}" x2="${m.l + w}" y2="${py}" stroke="#eee"/>`);
    out.push(
      `<text x="${m.l - 6}" y="${py}" text-anchor="end" dominant-baseline="middle" ` +
        `fill="#1f5fa8">${esc(formatValue(vv, 'V', 3))}</text>`,
    );
  }
  const level = (v: number, colour: string) =>
    `<line x1="${m.l}" y1="${r1(y(v))}" x2="${m.l + w}" y2="${r1(y(v))}" stroke="${colour}" stroke-width="1.2" ` +
      `stroke-dasharray="6 4"/>`;
  out.push(level(k.keyUpMeanV, '#2e7d32'), level(k.keyDownMeanV, '#c0392b'));
  const pts = k.waveform.timeS.slice(0, n).map((t, i) => `${r1(x(t))},${r1(y(k.waveform.railV[i]))}`).join(' ');
  out.push(`<polyline fill="none" stroke="#1f5fa8" stroke-width="1.6" points="${pts}"/>`);
  out.push(
    `<text x="${m.l + w / 2}" y="${m.t + h + 32}" text-anchor="middle" fill="#222">time from the first key-down ` +
      `(dots of ${esc(formatValue(k.dotS, 's', 2))})</text>`,
  );
  out.push(
    `<text transform="translate(14 ${m.t + h / 2}) rotate(-90)" text-anchor="middle" fill="#1f5fa8">rail voltage ` +
      `(V)</text>`,
  );
  const ly = heightPx - 12;
  out.push(
    `<rect x="${m.l}" y="${ly - 8}" width="24" height="10" fill="#f6e3c6"/><text x="${m.l + 30}" y="` +
      `${ly + 1}" fill="#222">key down (dB: ${esc(formatValue(k.leadS, 's', 2))} leading edge vs a held key)</text>`,
  );
  out.push(
    `<line x1="${m.l + 330}" y1="${ly - 3}" x2="${m.l + 354}" y2="${ly - 3}" stroke="#2e7d32" stroke-dasharray="6 ` +
      `4"/><text x="${m.l + 360}" y="${ly + 1}" fill="#222">key-up ${esc(formatValue(k.keyUpMeanV, 'V', 3))}</text>`,
  );
  out.push(
    `<line x1="${m.l + 460}" y1="${ly - 3}" x2="${m.l + 484}" y2="${ly - 3}" stroke="#c0392b" stroke-dasharray="6 ` +
      `4"/><text x="${m.l + 490}" y="${ly + 1}" fill="#222">key held ` +
      `${esc(formatValue(k.keyDownMeanV, 'V', 3))}</text>`,
  );
  out.push('</svg>');
  return out.join('');
}
