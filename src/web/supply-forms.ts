// Supply editor forms: display text -> SI values, plus the "what still uses this?" checks for deletes.
import { z } from 'zod';
import type { HeatsinkMount, Project, Rail, RegulatorSetting } from '../core/model';
import { num, optNum, pct, text, choice } from './form';

const need = (ctx: z.RefinementCtx, path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });

export const transformerSchema = z.object({
  name: text('Transformer name'),
  construction: choice('Construction', ['laminated', 'toroidal']),
});

export const windingSchema = z.object({
  name: text('Winding name'),
  ratedV: num('V', { label: 'Rated voltage', min: 0, exclusiveMin: true, max: 1000 }),
  ratedA: num('A', { label: 'Rated current', min: 0, exclusiveMin: true, max: 100 }),
  regulation: pct({ label: 'Regulation', min: 0, max: 100 }),
  resistance: optNum('Ω', { label: 'Winding resistance', min: 0, exclusiveMin: true, max: 1000 }),
});

export const fuseSchema = z.object({ primaryFuse: optNum('A', { label: 'Primary fuse', min: 0, exclusiveMin: true, max: 63 }) });

/** The add-rail form: the source decides the kind (w:<winding id> rectified, r:<rail id> regulated, battery). */
export const addRailSchema = z.object({
  name: text('Rail name'),
  source: z.string({ message: 'Fed from: choose a winding, a rail or a battery' }).regex(/^(w:.+|r:.+|battery)$/, 'Fed from: choose a winding, a rail or a battery'),
});

export const rectifiedSchema = z.object({
  name: text('Rail name'),
  windingId: z.string({ message: 'Winding: choose one' }).min(1, 'Winding: choose one'),
  topology: choice('Rectifier', ['bridge', 'centre-tap', 'half-wave']),
  diodeDrop: num('V', { label: 'Diode drop', min: 0, max: 5 }),
  diodeR: num('Ω', { label: 'Diode resistance', min: 0, max: 100 }),
  reservoir: num('F', { label: 'Reservoir capacitance', min: 0, exclusiveMin: true, max: 10 }),
  esr: num('Ω', { label: 'Capacitor ESR', min: 0, max: 100 }),
  bleeder: optNum('Ω', { label: 'Bleeder resistor', min: 0, exclusiveMin: true, max: 1e9 }),
  capV: optNum('V', { label: 'Capacitor rated voltage', min: 0, exclusiveMin: true, max: 10_000 }),
  capRipple: optNum('A', { label: 'Capacitor ripple rating', min: 0, exclusiveMin: true, max: 1000 }),
  rippleTarget: optNum('V', { label: 'Ripple target', min: 0, exclusiveMin: true, max: 1000 }),
  margin: num('V', { label: 'Headroom margin', min: 0, max: 100 }),
  fuse: optNum('A', { label: 'Rail fuse', min: 0, exclusiveMin: true, max: 63 }),
});

export const REGULATOR_METHODS = ['fixed', 'adjustable', 'raised-diodes', 'raised-resistor'] as const;

export const regulatedSchema = z
  .object({
    name: text('Rail name'),
    parentId: z.string({ message: 'Fed from: choose a rail' }).min(1, 'Fed from: choose a rail'),
    regulator: choice('Regulator type', ['linear', 'ldo', 'switching']),
    method: choice('Output setting', REGULATOR_METHODS),
    nominalV: optNum('V', { label: 'Regulator voltage', min: 0, exclusiveMin: true, max: 1000 }),
    vref: optNum('V', { label: 'Reference voltage', min: 0, exclusiveMin: true, max: 100 }),
    iadj: optNum('A', { label: 'Adjust-pin current', min: 0, max: 0.01 }),
    r1: optNum('Ω', { label: 'R1', min: 0, exclusiveMin: true, max: 1e8 }),
    r2: optNum('Ω', { label: 'R2', min: 0, max: 1e8 }),
    diodes: optNum('', { label: 'Number of diodes', min: 1, max: 20, integer: true }),
    raiseDrop: optNum('V', { label: 'Drop per diode', min: 0, exclusiveMin: true, max: 5 }),
    dropout: num('V', { label: 'Dropout', min: 0, max: 50 }),
    quiescent: num('A', { label: 'Quiescent current', min: 0, max: 1 }),
    efficiency: optNum('%', { label: 'Efficiency', min: 0, exclusiveMin: true, max: 100 }),
    maxOut: optNum('A', { label: 'Maximum output current', min: 0, exclusiveMin: true, max: 100 }),
    maxIn: optNum('V', { label: 'Maximum input voltage', min: 0, exclusiveMin: true, max: 1000 }),
    thetaJc: optNum('K/W', { label: 'θjc', min: 0, max: 100 }),
    thetaCs: optNum('K/W', { label: 'θcs', min: 0, max: 100 }),
    thetaSa: optNum('K/W', { label: 'θsa', min: 0, exclusiveMin: true, max: 1000 }),
    tjMax: optNum('°C', { label: 'Tj max', min: 50, max: 250 }),
  })
  .transform((d, ctx) => {
    const setting = settingFrom(d, ctx);
    const mount = mountFrom(d, ctx);
    if (d.regulator === 'switching' && d.efficiency === null) need(ctx, 'efficiency', 'Efficiency: a switching regulator needs its efficiency at the lowest input voltage (e.g. 85 %)');
    return { ...d, setting, mount, efficiencyFraction: d.efficiency === null ? null : d.efficiency / 100 };
  });

type RegFields = { method: (typeof REGULATOR_METHODS)[number]; nominalV: number | null; vref: number | null; iadj: number | null; r1: number | null; r2: number | null; diodes: number | null; raiseDrop: number | null };

function settingFrom(d: RegFields, ctx: z.RefinementCtx): RegulatorSetting | null {
  const missing = (field: keyof RegFields, label: string) => {
    if (d[field] === null) need(ctx, field, `${label}: needed for this output setting`);
    return d[field] === null;
  };
  switch (d.method) {
    case 'fixed':
      return missing('nominalV', 'Regulator voltage') ? null : { method: 'fixed', nominalV: d.nominalV! };
    case 'adjustable': {
      const bad = [missing('vref', 'Reference voltage'), missing('r1', 'R1'), missing('r2', 'R2')].some(Boolean);
      return bad ? null : { method: 'adjustable', vrefV: d.vref!, adjustA: d.iadj ?? 0, r1Ohm: d.r1!, r2Ohm: d.r2! };
    }
    case 'raised-diodes': {
      const bad = [missing('nominalV', 'Regulator voltage'), missing('diodes', 'Number of diodes'), missing('raiseDrop', 'Drop per diode')].some(Boolean);
      return bad ? null : { method: 'raised-diodes', nominalV: d.nominalV!, diodes: d.diodes!, diodeDropV: d.raiseDrop! };
    }
    case 'raised-resistor': {
      const bad = [missing('nominalV', 'Regulator voltage'), missing('r1', 'R1'), missing('r2', 'R2')].some(Boolean);
      return bad ? null : { method: 'raised-resistor', nominalV: d.nominalV!, r1Ohm: d.r1!, r2Ohm: d.r2! };
    }
  }
}

type MountFields = { thetaJc: number | null; thetaCs: number | null; thetaSa: number | null; tjMax: number | null };

/** All four empty = no heatsink data; θsa alone may stay empty (the page then reports the heatsink needed). */
function mountFrom(d: MountFields, ctx: z.RefinementCtx): HeatsinkMount | null {
  if (d.thetaJc === null && d.thetaCs === null && d.thetaSa === null && d.tjMax === null) return null;
  for (const [k, label] of [['thetaJc', 'θjc'], ['thetaCs', 'θcs'], ['tjMax', 'Tj max']] as const) {
    if (d[k] === null) need(ctx, k, `${label}: needed once any heatsink value is entered (leave all four empty for none)`);
  }
  if (d.thetaJc === null || d.thetaCs === null || d.tjMax === null) return null;
  return { thetaJcKPerW: d.thetaJc, thetaCsKPerW: d.thetaCs, thetaSaKPerW: d.thetaSa, tjMaxC: d.tjMax };
}

export const batterySchema = z
  .object({
    name: text('Rail name'),
    chemistry: text('Chemistry', 60),
    nominalV: num('V', { label: 'Nominal voltage', min: 0, exclusiveMin: true, max: 1000 }),
    fullV: num('V', { label: 'Full-charge voltage', min: 0, exclusiveMin: true, max: 1000 }),
    endV: num('V', { label: 'End-of-discharge voltage', min: 0, exclusiveMin: true, max: 1000 }),
    capacity: num('Ah', { label: 'Capacity', min: 0, exclusiveMin: true, max: 10_000 }),
    usable: pct({ label: 'Usable capacity', min: 0, exclusiveMin: true, max: 100 }),
    internal: num('Ω', { label: 'Internal resistance', min: 0, max: 100 }),
  })
  .superRefine((d, ctx) => {
    if (d.endV >= d.fullV) need(ctx, 'endV', 'End-of-discharge voltage must be below the full-charge voltage');
    else if (d.nominalV > d.fullV) need(ctx, 'nominalV', 'Nominal voltage must not be above the full-charge voltage');
    else if (d.nominalV < d.endV) need(ctx, 'nominalV', 'Nominal voltage must not be below the end-of-discharge voltage');
  });

// ---------------------------------------------------------------- who uses what

/** Sentences naming everything that draws on rail `railId` (empty = free to delete). */
export function railUsers(p: Project, railId: string): string[] {
  const out: string[] = [];
  for (const r of p.supply.rails) if (r.kind === 'regulated' && r.parentId === railId) out.push(`rail “${r.name}” is fed from it`);
  for (const s of p.stages) {
    if (s.loads.some((l) => l.railId === railId)) out.push(`stage “${s.name}” draws current from it`);
    if (s.pa?.railId === railId) out.push(`the final amplifier “${s.name}” runs from it`);
    if (s.relay?.coilRailId === railId) out.push(`the relay coil of “${s.name}” is powered from it`);
  }
  return out;
}

export function windingUsers(p: Project, windingId: string): string[] {
  return p.supply.rails.filter((r) => r.kind === 'rectified' && r.windingId === windingId).map((r) => `rail “${r.name}” is rectified from it`);
}

export function transformerUsers(p: Project, transformerId: string): string[] {
  const t = p.supply.transformers.find((x) => x.id === transformerId);
  return t ? t.windings.flatMap((w) => windingUsers(p, w.id).map((u) => `${w.name}: ${u}`)) : [];
}

/** Rails a regulated rail may be fed from: any rail except itself and the rails it feeds (no loops). */
export function possibleParents(p: Project, railId: string | null): Rail[] {
  const below = new Set<string>();
  if (railId) {
    below.add(railId);
    let grew = true;
    while (grew) {
      grew = false;
      for (const r of p.supply.rails) if (r.kind === 'regulated' && below.has(r.parentId) && !below.has(r.id)) (below.add(r.id), (grew = true));
    }
  }
  return p.supply.rails.filter((r) => !below.has(r.id));
}

export function refusal(what: string, users: string[]): string {
  return `${what.charAt(0).toUpperCase()}${what.slice(1)} cannot be deleted while it is in use: ${users.join('; ')}. Change or delete those first.`;
}
