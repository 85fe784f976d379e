// SVG diagram of where the power goes: mains -> transformer -> windings -> rails -> stages, each branch labelled
// with its key-down (TX) current, each rail marked by its headroom verdict in words and by shape (circle OK,
// triangle caution, square fail, dotted outline not checked) as well as by colour.
// Pure: data in, SVG text out; no arithmetic beyond placing boxes. Presentation attributes only (no style="").
import type { Project } from '../../src/core/model';
import type { EvaluationReport } from '../../src/core/evaluate';
import type { LoadContribution } from '../../src/core/budget';
import type { Severity } from '../../src/core/findings';
import { actionable, worstSeverity } from '../../src/core/findings';
import { formatValue } from '../../src/core/units';
import { esc } from './svg-text';

/** The rules that decide whether a rail keeps its regulators (or loads) in regulation. */
// the tolerance corner's own headroom check too, so a rail the trough chart shows dipping below its minimum there is
// not drawn as 'headroom OK'
const HEADROOM_RULES = new Set([
  'rail.headroom',
  'rail.headroom-tolerance',
  'regulator.headroom',
  'battery.end-voltage',
  'battery.window',
]);

export interface FlowStage {
  name: string;
  keyDownA: number;
}

export interface FlowRail {
  id: string;
  name: string;
  kind: 'rectified' | 'regulated' | 'battery';
  depth: number;
  parentId: string | null;
  windingId: string | null;
  nominalV: number;
  /** key-down current into this rail: a rectified rail's DC output, a regulator's input current, A */
  keyDownA: number;
  /** null: no headroom check applies (no minimum stated) */
  headroom: Severity | null;
  stages: FlowStage[];
}

export interface FlowData {
  mains: { label: string } | null;
  transformers: { id: string; name: string; primaryA: number; windings: { id: string; name: string }[] }[];
  /** in drawing order: each root rail followed by the rails it feeds */
  rails: FlowRail[];
}

/** One line per stage: its entered and computed loads on the rail added, as the budget adds them (◆ = computed). */
function stagesOn(loads: LoadContribution[]): FlowStage[] {
  const out: (FlowStage & { id: string })[] = [];
  for (const l of loads) {
    const seen = out.find((s) => s.id === l.stageId);
    if (seen) {
      seen.keyDownA += l.currentA.keyDown;
      if (l.computed && !seen.name.endsWith(' ◆')) seen.name += ' ◆';
    } else out.push({ id: l.stageId, name: l.stageName + (l.computed ? ' ◆' : ''), keyDownA: l.currentA.keyDown });
  }
  return out.map(({ name, keyDownA }) => ({ name, keyDownA }));
}

export function powerFlowData(project: Project, report: EvaluationReport): FlowData {
  const budget = new Map(report.budget.rails.map((r) => [r.railId, r]));
  const supplyRails = new Map((report.supply?.rails ?? []).map((r) => [r.railId, r]));
  const ordered: FlowRail[] = [];
  const visit = (parentId: string | null, depth: number) => {
    for (const r of project.supply.rails) {
      const parent = r.kind === 'regulated' ? r.parentId : null;
      if (parent !== parentId || ordered.some((o) => o.id === r.id)) continue;
      const b = budget.get(r.id);
      const checks = actionable(supplyRails.get(r.id)?.findings ?? []).filter((f) => HEADROOM_RULES.has(f.rule));
      ordered.push({
        id: r.id,
        name: r.name,
        kind: r.kind,
        depth,
        parentId: parent,
        windingId: r.kind === 'rectified' ? r.windingId : null,
        nominalV: b?.nominalV ?? NaN,
        keyDownA: r.kind === 'regulated' ? (b?.inputA?.keyDown ?? NaN) : (b?.outputA.keyDown ?? NaN),
        headroom: checks.length ? worstSeverity(checks) : null,
        stages: stagesOn(b?.loads ?? []),
      });
      visit(r.id, depth + 1);
    }
  };
  visit(null, 0);
  const transformers = project.supply.transformers.map((t) => ({
    id: t.id,
    name: t.name,
    primaryA: report.supply?.transformers.find((x) => x.transformerId === t.id)?.primaryA ?? NaN,
    windings: t.windings.map((w) => ({ id: w.id, name: w.name })),
  }));
  const mains = project.mains
    ? { label: `${formatValue(project.mains.nominalV, 'V')} ${formatValue(project.mains.frequencyHz, 'Hz')}` }
    : null;
  return { mains, transformers, rails: ordered };
}

export const HEADROOM_WORDS: Record<Severity | 'none', string> = {
  ok: '✓ headroom OK',
  // short enough that "12.8 V · ! headroom low" fits the rail box (railW 158, text from x + 21)
  caution: '! headroom low',
  fail: '✗ headroom fails',
  none: '– no headroom check',
};
const COLOUR: Record<Severity | 'none', string> = {
  ok: '#2e7d4f',
  caution: '#a86500',
  fail: '#b3261e',
  none: '#5b6770',
};
const FILL: Record<Severity | 'none', string> = { ok: '#f1f8f3', caution: '#fff7e8', fail: '#fff1f0', none: '#f6f7f8' };

/** A shape that says the verdict without colour: circle, triangle, square, or a dash. */
function marker(v: Severity | 'none', cx: number, cy: number): string {
  const c = COLOUR[v];
  if (v === 'ok') return `<circle cx="${cx}" cy="${cy}" r="5" fill="${c}"/>`;
  if (v === 'caution') return `<path d="M${cx} ${cy - 6} L${cx + 6} ${cy + 5} L${cx - 6} ${cy + 5} Z" fill="${c}"/>`;
  if (v === 'fail') return `<rect x="${cx - 5}" y="${cy - 5}" width="10" height="10" fill="${c}"/>`;
  return `<line x1="${cx - 5}" y1="${cy}" x2="${cx + 5}" y2="${cy}" stroke="${c}" stroke-width="2"/>`;
}

const amps = (a: number) => (Number.isFinite(a) ? formatValue(a, 'A') : 'unknown');

/** Split a name into at most two lines of about `max` characters, at spaces; longer text ends with "…". */
function twoLines(s: string, max: number): string[] {
  if (s.length <= max) return [s];
  const cut = s.lastIndexOf(' ', max);
  const first = cut > 8 ? s.slice(0, cut) : s.slice(0, max);
  const rest = s.slice(first.length).trim();
  return [first, rest.length > max ? `${rest.slice(0, max - 1)}…` : rest];
}
const clip = (s: string, max: number) => (s.length > max ? `${s.slice(0, max - 1)}…` : s);

const W = 790;
const X_FULL = { mains: 0, mainsW: 76, tr: 96, trW: 100, rail0: 258, railW: 158, railStep: 166 };
const RAIL_H = 54;
const STAGE_ROW = 17;

export function powerFlowSvg(d: FlowData): string {
  // without a transformer (battery stations) the rails start near the left edge
  const X = d.transformers.length ? X_FULL : { ...X_FULL, rail0: 56 };
  const maxDepth = Math.max(0, ...d.rails.map((r) => r.depth));
  const stageX = X.rail0 + (maxDepth + 1) * X.railStep + 4;
  const top = 24;
  // vertical placement: one block per rail; the first rail of each transformer leaves room for its title
  const placed: { rail: FlowRail; y: number; h: number }[] = [];
  let y = top;
  const firstOf = new Set(
    d.transformers.map((t) => d.rails.find((r) => t.windings.some((w) => w.id === r.windingId))?.id),
  );
  for (const rail of d.rails) {
    if (firstOf.has(rail.id) && d.transformers.length > 1) y += 18;
    const h = Math.max(RAIL_H + 8, rail.stages.length * STAGE_ROW + 10);
    placed.push({ rail, y, h });
    y += h + 6;
  }
  const height = Math.max(y + 4, 120);
  const parts: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" class="plot power-flow" viewBox="0 0 ${W} ${height}" role="img" ` +
      `aria-labelledby="pf-title" font-family="sans-serif" font-size="12.5">`,
    `<title id="pf-title">Power flow: mains, transformer, windings, rails and stages with their key-down ` +
      `currents</title>`,
  ];
  const heading = (x: number, text: string) =>
    `<text x="${x}" y="12" font-size="11.5" fill="#5b6770">${esc(text)}</text>`;
  if (d.mains) parts.push(heading(X.mains, 'Mains'));
  const single = d.transformers.length === 1;
  if (d.transformers.length) parts.push(heading(X.tr, single ? clip(d.transformers[0].name, 26) : 'Transformers'));
  parts.push(heading(X.rail0, 'Rails (key-down input)'), heading(stageX, 'Stages (key-down current)'));
  const at = new Map(placed.map((p) => [p.rail.id, p]));
  const centre = (p: { y: number }) => p.y + RAIL_H / 2;

  // transformers with their windings, and the mains feeding them
  const trBoxes: { y0: number; y1: number }[] = [];
  for (const t of d.transformers) {
    const fed = placed.filter((p) => t.windings.some((w) => w.id === p.rail.windingId));
    if (!fed.length) continue;
    const y0 = fed[0].y - (single ? 4 : 18);
    const y1 = fed[fed.length - 1].y + RAIL_H;
    trBoxes.push({ y0, y1 });
    parts.push(
      `<rect x="${X.tr}" y="${y0}" width="${X.trW}" height="${y1 - y0}" rx="4" fill="#f3f5f7" stroke="#5b6770"/>`,
    );
    if (!single)
      parts.push(
        `<text x="${X.tr + 6}" y="${y0 + 13}" font-weight="bold">${esc(clip(t.name, 13))}<title>` +
          `${esc(t.name)}</title></text>`,
      );
    for (const p of fed) {
      const w = t.windings.find((x) => x.id === p.rail.windingId)!;
      const cy = centre(p);
      parts.push(
        `<text x="${X.tr + X.trW - 6}" y="${cy + 4}" text-anchor="end">${esc(clip(w.name, 14))}<title>` +
          `${esc(w.name)}</title></text>`,
      );
      parts.push(
        `<line x1="${X.tr + X.trW}" y1="${cy}" x2="${X.rail0}" y2="${cy}" stroke="#1d2327" stroke-width="1.5"/>`,
      );
      parts.push(
        `<text x="${(X.tr + X.trW + X.rail0) / 2}" y="${cy - 4}" text-anchor="middle" ` +
          `font-size="11.5">${esc(amps(p.rail.keyDownA))}</text>`,
      );
    }
    if (d.mains) {
      const my = (y0 + y1) / 2;
      parts.push(
        `<line x1="${X.mains + X.mainsW}" y1="${my}" x2="${X.tr}" y2="${my}" stroke="#1d2327" stroke-width="1.5"/>`,
      );
    }
  }
  if (d.mains && trBoxes.length) {
    const my = (Math.min(...trBoxes.map((b) => b.y0)) + Math.max(...trBoxes.map((b) => b.y1))) / 2;
    const primaryA = d.transformers.reduce((sum, t) => sum + t.primaryA, 0);
    parts.push(
      `<rect x="${X.mains}" y="${my - 30}" width="${X.mainsW}" height="60" rx="4" fill="#f3f5f7" stroke="#5b6770"/>`,
    );
    parts.push(`<text x="${X.mains + 6}" y="${my - 13}" font-weight="bold">Mains</text>`);
    parts.push(`<text x="${X.mains + 6}" y="${my + 3}" font-size="11">${esc(d.mains.label)}</text>`);
    parts.push(
      `<text x="${X.mains + 6}" y="${my + 20}" font-size="11" ` +
        `font-weight="bold">${esc(amps(primaryA))}<title>primary RMS current</title></text>`,
    );
  }

  // rails, the rails they feed, and their stages
  for (const p of placed) {
    const r = p.rail;
    const x = X.rail0 + r.depth * X.railStep;
    const v = r.headroom ?? 'none';
    const parent = r.parentId ? at.get(r.parentId) : undefined;
    if (parent) {
      const px = X.rail0 + parent.rail.depth * X.railStep + 18;
      const cy = centre(p);
      parts.push(
        `<path d="M${px} ${parent.y + RAIL_H} V${cy} H${x}" fill="none" stroke="#1d2327" stroke-width="1.5"/>`,
      );
      parts.push(`<text x="${px + 6}" y="${cy - 4}" font-size="11.5">${esc(amps(r.keyDownA))}</text>`);
    }
    if (r.kind === 'battery')
      parts.push(`<text x="${x - 6}" y="${centre(p) + 4}" text-anchor="end" font-size="11.5">battery</text>`);
    const dash = v === 'caution' ? ' stroke-dasharray="6 3"' : v === 'none' ? ' stroke-dasharray="2 3"' : '';
    const sw = v === 'fail' ? 3 : 1.8;
    parts.push(
      `<g class="rail" data-rail="${esc(r.id)}" data-headroom="${v}"><rect x="${x}" y="${p.y}" width="` +
        `${X.railW}" height="${RAIL_H}" rx="4" ` +
        `fill="${FILL[v]}" stroke="${COLOUR[v]}" stroke-width="${sw}"${dash}/>`,
    );
    const lines = twoLines(r.name, 21);
    lines.forEach((line, i) =>
      parts.push(`<text x="${x + 6}" y="${p.y + 14 + i * 13}" font-weight="bold">${esc(line)}</text>`),
    );
    parts.push(marker(v, x + 11, p.y + RAIL_H - 10));
    const volts = Number.isFinite(r.nominalV) ? `${formatValue(r.nominalV, 'V')} · ` : '';
    parts.push(
      `<text x="${x + 21}" y="${p.y + RAIL_H - 6}" font-size="10.5" fill="${COLOUR[v]}` +
        `">${esc(volts + HEADROOM_WORDS[v])}</text>`,
    );
    parts.push(`<title>${esc(`${r.name}: ${HEADROOM_WORDS[v]}`)}</title></g>`);
    if (r.stages.length) {
      const bus = stageX - 10;
      const cy = centre(p);
      const s0 = p.y + 9;
      const s1 = p.y + 9 + (r.stages.length - 1) * STAGE_ROW;
      parts.push(`<path d="M${x + X.railW} ${cy} H${bus}" fill="none" stroke="#8a959e" stroke-width="1.2"/>`);
      parts.push(
        `<line x1="${bus}" y1="${Math.min(s0, cy)}" x2="${bus}" y2="${Math.max(s1, cy)}" stroke="#8a959e" ` +
          `stroke-width="1.2"/>`,
      );
      r.stages.forEach((s, i) => {
        const sy = s0 + i * STAGE_ROW;
        parts.push(`<line x1="${bus}" y1="${sy}" x2="${stageX - 2}" y2="${sy}" stroke="#8a959e" stroke-width="1.2"/>`);
        parts.push(
          `<text x="${stageX}" y="${sy + 4}" font-size="11.5">${esc(clip(s.name, 22))} <tspan font-weight="bold">` +
            `${esc(amps(s.keyDownA))}</tspan>` +
            `<title>${esc(`${s.name}: ${amps(s.keyDownA)} key-down`)}</title></text>`,
        );
      });
    }
  }
  if (!d.rails.length)
    parts.push(
      `<text x="${X.rail0}" y="${top + 20}" fill="#5b6770">No rails yet: add a transformer or battery and a rail on ` +
        `the Supply page.</text>`,
    );
  parts.push('</svg>');
  return parts.join('');
}
