// computeBudget: the totals are the sums of their parts, for the demo projects with random currents,
// random rail assignments and random regulator quiescent currents. Seeded fast-check.
import { describe, it } from 'vitest';
import fc from 'fast-check';
import { propertyOptions } from '../helpers/property'; // fixed seed per property
import { computeBudget } from '../../src/core/budget';
import { MODES, type Project } from '../../src/core/model';
import { DEMO_PROJECTS } from '../../seed-demo/index';

const SEED = 20261201;
const toleranceRelative = 1e-9;

function close(a: number, b: number, what: string) {
  const scale = Math.max(1e-12, Math.abs(a), Math.abs(b));
  if (!(Math.abs(a - b) / scale <= toleranceRelative)) throw new Error(`${what}: ${a} != ${b}`);
}

/** A demo project whose stage loads get random currents (0..5 A) on random rails. */
const randomised = fc
  .tuple(
    fc.constantFrom(...DEMO_PROJECTS.map((_, i) => i)),
    fc.array(fc.double({ min: 0, max: 5, noNaN: true }), { minLength: 300, maxLength: 300 }),
    fc.array(fc.nat(), { minLength: 100, maxLength: 100 }),
  )
  .map(([which, currents, picks]) => {
    const p: Project = structuredClone(DEMO_PROJECTS[which]);
    let c = 0;
    let k = 0;
    for (const s of p.stages) {
      for (const l of s.loads) {
        l.railId = p.supply.rails[picks[k++ % picks.length] % p.supply.rails.length].id;
        for (const m of MODES) l.currentA[m] = currents[c++ % currents.length];
      }
    }
    for (const r of p.supply.rails) if (r.kind === 'regulated') r.quiescentA = currents[c++ % currents.length] / 100;
    return p;
  });

describe('budget: totals equal the sum of their parts', () => {
  it('per rail: own = sum of its stage loads; output = own + regulators; W = A x V', () => {
    fc.assert(
      fc.property(randomised, (p) => {
        const b = computeBudget(p);
        for (const r of b.rails)
          for (const m of MODES) {
            close(r.ownA[m], r.loads.reduce((s, l) => s + l.currentA[m], 0), `${r.name} own ${m}`);
            close(r.outputA[m], r.ownA[m] + r.regulatorsA[m], `${r.name} output ${m}`);
            close(r.outputW[m], r.outputA[m] * r.nominalV, `${r.name} W ${m}`);
          }
      }),
      propertyOptions(SEED, 300), // fixed seed
    );
  });

  it("a rail's regulator current is the sum of its children's input currents; every entered load is counted " +
    "once", () => {
    fc.assert(
      fc.property(randomised, (p) => {
        const b = computeBudget(p);
        for (const r of b.rails) {
          const kids = b.rails.filter((x) => x.parentId === r.railId);
          for (const m of MODES)
            close(
              r.regulatorsA[m],
              kids.reduce((s, k) => s + (k.inputA?.[m] ?? 0), 0),
              `${r.name} regulators ${m}`,
            );
        }
        for (const m of MODES) {
          const entered = p.stages.flatMap((s) => s.loads).reduce((s, l) => s + l.currentA[m], 0);
          close(b.rails.reduce((s, r) => s + r.ownA[m], 0), entered, `all loads ${m}`);
        }
      }),
      propertyOptions(SEED, 300), // fixed seed
    );
  });

  it('the total DC power is the sum over the sources, and the sources are the non-regulated rails', () => {
    fc.assert(
      fc.property(randomised, (p) => {
        const b = computeBudget(p);
        const roots = b.rails.filter((r) => r.kind !== 'regulated');
        close(b.sources.length, roots.length, 'source count');
        for (const m of MODES) {
          close(b.totalW[m], b.sources.reduce((s, x) => s + x.outputW[m], 0), `total ${m}`);
          close(b.totalW[m], roots.reduce((s, r) => s + r.outputA[m] * r.nominalV, 0), `total from rails ${m}`);
        }
      }),
      propertyOptions(SEED, 300), // fixed seed
    );
  });
});
