// The evaluation's speed shortcuts change no result: evaluate() with them equals the plain path
// (evaluate(p, { reference: true }): the supply designed again in full for the enclosure's inside air, no
// per-evaluation caches of pure results), the whole report compared as JSON. A differential test of two code
// paths of this program: the expected report is the plain path's, not a figure (no published source needed).
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/core/evaluate';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { projectFromTemplate, TEMPLATE_INFO, TEMPLATE_KEYS } from '../../src/core/templates';
import { MAINS_PRESETS } from '../../src/core/spec/settings';
import type { Project } from '../../src/core/model';

const asJson = (x: unknown) => JSON.parse(JSON.stringify(x)) as unknown;

function template(key: (typeof TEMPLATE_KEYS)[number], mainsKey: string): Project {
  let n = 0;
  const mains = TEMPLATE_INFO[key].mains ? MAINS_PRESETS[mainsKey]! : null;
  const input = { name: `t ${key} ${mainsKey}`, frequencyHz: 7.03e6, targetPowerW: 20, mains };
  return projectFromTemplate(key, input, 'prj-t', (p) => `${p}-${n++}`);
}

// a small closed box (its air well above the room) and a roomy one (a few kelvin): the inside-air path runs
const boxed = (p: Project, areaM2: number): Project => ({
  ...p, name: `${p.name} in ${areaM2} m²`, supply: { ...p.supply, enclosureAreaM2: areaM2, enclosureUWPerM2K: 5.5 },
});

const BASES: Project[] = [
  ...DEMO_PROJECTS,
  ...TEMPLATE_KEYS.flatMap((k) => (TEMPLATE_INFO[k].mains
    ? [template(k, '230-50'), template(k, '120-60')] : [template(k, '230-50')])),
];
const CASES = BASES.flatMap((p) => [p, boxed(p, 0.1), boxed(p, 10)]);

describe('evaluate(): shortcuts give the plain path\'s report', () => {
  it.each(CASES.map((p) => [p.name, p] as const))('%s', (_name, project) => {
    const fast = evaluate(project);
    const plain = evaluate(project, { reference: true });
    expect(asJson(fast)).toEqual(asJson(plain));
    expect(fast.findings.length).toBeGreaterThan(0);
  });

  it('the boxed cases take the inside-air path (the air in the box is the ambient of the supply checks)', () => {
    const withRails = BASES.filter((p) => p.supply.rails.length > 0);
    expect(withRails.length).toBeGreaterThan(2);
    for (const p of withRails) {
      const r = evaluate(boxed(p, 0.1));
      expect(r.heat?.insideC ?? null).not.toBeNull();
      expect(r.supply?.thermalAmbient?.inside).toBe(true);
      expect(evaluate(p).supply?.thermalAmbient?.inside).toBe(false);
    }
  });
});
