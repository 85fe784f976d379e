// The station templates: each builds a project that passes every stored-value check, evaluates without a fail
// finding (nothing missing, and the typical values hang together), and has a fully priced parts list.
// The expected results are properties of the plan (no fail, no unpriced line, every reference resolves), not
// figures from this program; the power/current relation checked below is the definition of efficiency.
import { describe, expect, it } from 'vitest';
import { projectFromTemplate, TEMPLATE_INFO, TEMPLATE_KEYS, type TemplateKey } from '../../../src/core/templates';
import { finalKeyDownA } from '../../../src/core/templates/stages';
import { evaluate } from '../../../src/core/evaluate';
import { checkProjectInputs } from '../../../src/core/spec/project-check';
import { MAINS_PRESETS } from '../../../src/core/spec/settings';
import type { Project } from '../../../src/core/model';

// each template's own typical output (its summary on the form says the range)
const TYPICAL_W: Record<TemplateKey, number> = {
  'mains-two-rail': 20,
  'battery-portable': 5,
  'single-rail': 5,
  'amplifier-only': 20,
};

function build(key: TemplateKey, frequencyHz: number, mainsKey: string, powerW = TYPICAL_W[key]): Project {
  let n = 0;
  const mains = TEMPLATE_INFO[key].mains ? MAINS_PRESETS[mainsKey]! : null;
  return projectFromTemplate(
    key,
    { name: `t ${key}`, frequencyHz, targetPowerW: powerW, mains },
    'prj-t',
    (p) => `${p}-${n++}`,
  );
}

// the new-project form's default output (the target output spec's default), which a hurried user keeps
const FORM_DEFAULT_W = 5;

const CASES = TEMPLATE_KEYS.flatMap((key) => [
  // 40 m on both common mains, and 20 m on 230 V (the filter and crystal follow the band), at the typical output
  ...(
    [[7.03e6, '230-50'], [7.03e6, '120-60'], [14.06e6, '230-50']] as const
  ).map(([hz, m]) => ({ key, hz, m, w: TYPICAL_W[key] })),
  // and 40 m at the form's default output
  { key, hz: 7.03e6, m: '230-50', w: FORM_DEFAULT_W },
]);

describe('station templates', () => {
  it.each(CASES)(
    '$key at $hz Hz, $w W on $m: stored values pass, no fail finding, every line priced',
    ({ key, hz, m, w }) => {
      const p = build(key, hz, m, w);
      expect(checkProjectInputs(p)).toEqual([]);
      const report = evaluate(p);
      const fails = report.findings
        .filter((f) => f.severity === 'fail')
        .map((f) => `${f.rule}: ${f.subject}: ${f.message}`);
      expect(fails).toEqual([]);
      expect(report.cost.totals.unpricedLines).toBe(0);
      // the starter lines bound to design roles follow the project's fresh ids: none points at a role the design lacks
      expect(report.findings.filter((f) => f.rule === 'role.gone').map((f) => f.subject)).toEqual([]);
      const bound = new Set(p.bom.map((l) => l.roleId).filter(Boolean));
      expect(report.roles.list.filter((r) => bound.has(r.id)).length).toBe(bound.size);
      expect(bound.size).toBeGreaterThan(3);
      expect(report.cost.totals.perKitCents).toBeGreaterThan(0);
      expect(p.stages.length).toBeGreaterThan(2);
      expect(p.supply.rails.length).toBeGreaterThan(0);
    },
  );

  it.each(TEMPLATE_KEYS)(
    '%s: every reference (rails, windings, parts, stages) points at a row of the project',
    (key) => {
      const p = build(key, 7.03e6, '230-50');
      const rails = new Set(p.supply.rails.map((r) => r.id));
      const windings = new Set(p.supply.transformers.flatMap((t) => t.windings.map((w) => w.id)));
      for (const r of p.supply.rails) {
        if (r.kind === 'rectified') expect(windings.has(r.windingId)).toBe(true);
        if (r.kind === 'regulated') expect(rails.has(r.parentId)).toBe(true);
      }
      for (const s of p.stages) {
        for (const l of s.loads) expect(rails.has(l.railId)).toBe(true);
        if (s.pa) expect(rails.has(s.pa.railId)).toBe(true);
        if (s.relay?.coilRailId) expect(rails.has(s.relay.coilRailId)).toBe(true);
      }
      const parts = new Set(p.parts.map((x) => x.id));
      const stages = new Set(p.stages.map((s) => s.id));
      for (const b of p.bom) {
        expect(parts.has(b.partId)).toBe(true);
        if (b.stageId) expect(stages.has(b.stageId)).toBe(true);
      }
      // every rectified or battery rail states the lowest voltage its loads need, or feeds a regulator that does
      for (const r of p.supply.rails) {
        if (r.kind === 'regulated') continue;
        const feedsRegulator = p.supply.rails.some((x) => x.kind === 'regulated' && x.parentId === r.id);
        expect(r.minimumV !== null || feedsRegulator).toBe(true);
      }
    },
  );

  it('battery template has no mains; a mains template refuses to be built without mains', () => {
    expect(build('battery-portable', 7.03e6, '230-50').mains).toBeNull();
    expect(() =>
      projectFromTemplate(
        'mains-two-rail',
        { name: 'x', frequencyHz: 7.03e6, targetPowerW: 20, mains: null },
        'p',
        (x) => x,
      ),
    ).toThrow();
  });

  it('two projects from one template share no row id', () => {
    const a = build('mains-two-rail', 7.03e6, '230-50');
    let n = 1000;
    const b = projectFromTemplate(
      'mains-two-rail',
      { name: 'b', frequencyHz: 7.03e6, targetPowerW: 20, mains: MAINS_PRESETS['230-50']! },
      'prj-b',
      (p) => `${p}-${n++}`,
    );
    const ids = (p: Project) => [
      ...p.stages.map((s) => s.id),
      ...p.supply.rails.map((r) => r.id),
      ...p.parts.map((x) => x.id),
      ...p.bom.map((l) => l.id),
    ];
    const shared = ids(a).filter((x) => ids(b).includes(x));
    expect(shared).toEqual([]);
  });

  it("the final's starting current is the DC input for the target power: P / (efficiency × V)", () => {
    // Definition of drain efficiency: 20 W out at 60 % from 24 V takes 20 / 0.6 / 24 = 1.3889 A, stored rounded
    // up to the whole mA a builder types: 1.389 A; 10 W at 60 % from 12.5 V is exactly 1.3333 A → 1.334 A;
    // 12 W at 50 % from 24 V is exactly 1.000 A and stays 1.000 A
    const toleranceA = 1e-9;
    expect(Math.abs(finalKeyDownA(20, 24, 0.6) - 1.389)).toBeLessThan(toleranceA);
    expect(Math.abs(finalKeyDownA(10, 12.5, 0.6) - 1.334)).toBeLessThan(toleranceA);
    expect(Math.abs(finalKeyDownA(12, 24, 0.5) - 1)).toBeLessThan(toleranceA);
  });
});
