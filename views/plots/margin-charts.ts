// Two small charts for the overview's first screen: per rail, its key-down trough at low, nominal and high mains
// against the minimum it must stay above; and the margin of each harmonic below the spurious limit as bars.
// Pure: data in, SVG text out; presentation attributes only (no style="").
import type { CornerSpec, SupplyReport } from '../../src/core/power/report-types';
import type { HarmonicsReport } from '../../src/core/rf/harmonics';
import type { Severity } from '../../src/core/findings';
import { formatValue } from '../../src/core/units';
import { esc } from './svg-text';
import { marginText, worstMarginText } from '../components/harmonic-margin';

export interface TroughRow {
  name: string;
  /** key-down trough per mains corner (V): L, N, H; battery rails have one point, the loaded end voltage */
  points: { label: string; troughV: number }[];
  /** lowest voltage allowed (V); null when none is stated */
  minimumV: number | null;
}

/** Appended to a corner's letter when the transformer's secondary is at the low end of its tolerance. */
export const TOLERANCE_MARK = 't';

/** Per rail: the key-down troughs across the mains corners and the minimum. */
export function troughRows(supply: SupplyReport | null): TroughRow[] {
  // mains corners: low / nominal / high mains; from a battery: at end voltage / nominal / full (power/corners.ts)
  const letter = supply?.mains
    ? ({ low: 'L', nominal: 'N', high: 'H' } as const)
    : ({ low: 'end', nominal: 'nom', high: 'full' } as const);
  // the corner with the secondary at the low end of its tolerance is told apart from plain low mains (Lt, not a 2nd L)
  const cornerLabel = (c: CornerSpec) => `${letter[c.mains]}${c.secondaryTolerance ? TOLERANCE_MARK : ''}`;
  return (supply?.rails ?? []).map((r) => {
    if (r.kind === 'rectified') {
      const pts = r.corners
        .filter((c) => c.load === 'keyDown')
        .map((c) => ({ label: cornerLabel(c), troughV: c.troughV }));
      return { name: r.railName, points: pts, minimumV: r.requiredMinV > 0 ? r.requiredMinV : null };
    }
    if (r.kind === 'regulated') {
      // a regulator's input trough against its output plus its dropout (the datasheet's definition of dropout)
      const pts = r.corners
        .filter((c) => c.load === 'keyDown')
        .map((c) => ({ label: cornerLabel(c), troughV: c.inputTroughV }));
      return { name: `${r.railName} (regulator input)`, points: pts, minimumV: r.outputV + r.dropoutV };
    }
    return {
      name: r.railName,
      points: [{ label: 'end', troughV: r.loadedEndV }],
      minimumV: r.requiredMinV > 0 ? r.requiredMinV : null,
    };
  });
}

const W = 600;
const COLOUR = { ok: '#2e7d4f', caution: '#a86500', fail: '#b3261e' } as const;
const f1 = (x: number) => (Math.round(x * 10) / 10).toString();

/** A dot below the minimum in the fail colour, or the caution colour at the secondary-tolerance corner. */
const dotColour = (p: TroughRow['points'][number], minimumV: number | null) =>
  minimumV === null || !(p.troughV < minimumV)
    ? '#1f5fa8'
    : p.label.endsWith(TOLERANCE_MARK)
      ? COLOUR.caution
      : COLOUR.fail;

export function troughChartSvg(rows: TroughRow[]): string {
  const rowH = 30;
  // the note at the right ("✗ lowest 16.4 V / min 16.9 V", about 165 px at 10.5 px) must fit inside W
  const labelW = 200;
  const trackW = 220;
  // room for the one line said when there is no rail
  const h = Math.max(rows.length * rowH + 8, 24);
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot troughs" viewBox="0 0 ${W} ${h}" role="img" ` +
      `aria-labelledby="tr-title" ` +
      `font-family="sans-serif" font-size="11"><title id="tr-title">Key-down trough of each rail at low (L), nominal ` +
      `(N) and high (H) ` +
      `mains against its minimum</title>`,
  ];
  rows.forEach((r, i) => {
    const y = 4 + i * rowH;
    const vals = [...r.points.map((p) => p.troughV), ...(r.minimumV === null ? [] : [r.minimumV])].filter(
      Number.isFinite,
    );
    const lo = Math.min(...vals);
    const hi = Math.max(...vals);
    const pad = Math.max((hi - lo) * 0.15, 0.5);
    const [vLo, vHi] = [lo - pad, hi + pad];
    const x = (v: number) => labelW + ((v - vLo) / (vHi - vLo)) * trackW;
    const name = r.name.length > 31 ? `${r.name.slice(0, 30)}…` : r.name;
    parts.push(`<text x="0" y="${y + 15}">${esc(name)}<title>${esc(r.name)}</title></text>`);
    parts.push(
      `<line x1="${labelW}" y1="${y + 12}" x2="${labelW + trackW}" y2="${y + 12}" stroke="#d5dbe0" stroke-width="6"/>`,
    );
    const worst = Math.min(...r.points.map((p) => p.troughV));
    const below = r.minimumV !== null && worst < r.minimumV;
    // below only at the secondary-tolerance corner: a caution (rail.headroom-tolerance), not a failure
    const plainWorst = Math.min(...r.points.filter((p) => !p.label.endsWith(TOLERANCE_MARK)).map((p) => p.troughV));
    const fails = r.minimumV !== null && plainWorst < r.minimumV;
    const noteColour = fails ? COLOUR.fail : below ? COLOUR.caution : '#1d2327';
    if (r.minimumV !== null && Number.isFinite(r.minimumV)) {
      const mx = f1(x(r.minimumV));
      parts.push(
        `<line x1="${mx}" y1="${y + 2}" x2="${mx}" y2="${y + 22}" stroke="#b3261e" stroke-width="2" ` +
          `stroke-dasharray="3 2"/>`,
      );
    }
    for (const p of r.points) {
      if (!Number.isFinite(p.troughV)) continue;
      const px = f1(x(p.troughV));
      parts.push(`<circle cx="${px}" cy="${y + 12}" r="4" fill="${dotColour(p, r.minimumV)}"/>`);
      parts.push(`<text x="${px}" y="${y + 28}" text-anchor="middle" font-size="9">${esc(p.label)}</text>`);
    }
    const note =
      r.minimumV === null
        ? `lowest ${formatValue(worst, 'V')}, no minimum`
        : `${fails ? '✗ ' : below ? '! ' : ''}lowest ${formatValue(worst, 'V')} / min ` +
          `${formatValue(r.minimumV, 'V')}`;
    parts.push(
      `<text x="${labelW + trackW + 8}" y="${y + 15}" font-size="10.5" fill="${noteColour}">${esc(note)}</text>`,
    );
  });
  if (!rows.length) parts.push('<text x="0" y="16" fill="#5b6770">No rails designed yet.</text>');
  parts.push('</svg>');
  return parts.join('');
}

/** Harmonic margins below the limit as bars: length = nominal margin, a tick at the worst case. */
export function harmonicBarsSvg(h: HarmonicsReport | null): string {
  const rows = h?.rows ?? [];
  const rowH = 20;
  const labelW = 44;
  const trackW = 230;
  const height = Math.max(rows.length * rowH + 6, 24);
  const parts = [
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot harmonics" viewBox="0 0 ` +
      `${labelW + trackW + 150} ${height}" role="img" ` +
      `aria-labelledby="hm-title" font-family="sans-serif" font-size="11"><title id="hm-title">Margin of each ` +
      `harmonic below the ` +
      `spurious limit (longer is better; a tick marks the worst built filter)</title>`,
  ];
  if (!rows.length) {
    parts.push('<text x="0" y="16" fill="#5b6770">No harmonic prediction (no PA or filter yet).</text></svg>');
    return parts.join('');
  }
  const maxDb = Math.max(
    10,
    ...rows.map((r) => Math.abs(r.marginDb)),
    ...rows.map((r) => Math.abs(r.worstMarginDb ?? 0)),
  );
  const neg = rows.some((r) => r.marginDb < 0 || (r.worstMarginDb ?? 0) < 0);
  const zero = labelW + (neg ? trackW / 2 : 0);
  const scale = (neg ? trackW / 2 : trackW) / maxDb;
  rows.forEach((r, i) => {
    const y = 3 + i * rowH;
    const sev: Severity = r.severity;
    const len = r.marginDb * scale;
    parts.push(`<text x="0" y="${y + 12}">H${r.n}</text>`);
    parts.push(
      `<rect x="${f1(Math.min(zero, zero + len))}" y="${y + 2}" width="${f1(Math.abs(len))}" height="12" ` +
        `fill="${COLOUR[sev]}"/>`,
    );
    if (r.worstMarginDb !== null) {
      const wx = f1(zero + r.worstMarginDb * scale);
      parts.push(`<line x1="${wx}" y1="${y}" x2="${wx}" y2="${y + 16}" stroke="#1d2327" stroke-width="2"/>`);
    }
    const words = sev === 'ok' ? '' : sev === 'caution' ? ' (caution)' : ' (FAILS)';
    // the same words as the RF page: below the construction floor a margin is a lower bound ("at least")
    const nominal = marginText(r);
    const worstText = worstMarginText(r);
    const worst = worstText === null ? '' : worstText === nominal ? ', worst too' : `, worst ${worstText}`;
    parts.push(
      `<text x="${labelW + trackW + 6}" y="${y + 12}" font-size="10.5">${esc(nominal + worst + words)}</text>`,
    );
  });
  parts.push(`<line x1="${zero}" y1="0" x2="${zero}" y2="${height}" stroke="#1d2327"/>`);
  parts.push('</svg>');
  return parts.join('');
}
