import { describe, it, expect } from 'vitest';
import { evaluate } from '../../src/core/evaluate';
import { DEMO_PROJECTS } from '../../seed-demo/index';

// the capacitance match applies to rails whose reservoir role has no bound line: the demo with its bindings cleared
const club = () => {
  const p = structuredClone(DEMO_PROJECTS[0]);
  for (const b of p.bom) b.roleId = null;
  return p;
};
const rule = (p: ReturnType<typeof club>, r: string) => evaluate(p).catalog.filter((f) => f.rule === r);

describe('parts-list reservoir capacitors against the supply design', () => {
  it('the demo parts cover their rails', () => {
    const found = evaluate(club()).catalog;
    expect(found.filter((f) => f.rule === 'catalog.reservoir').length).toBe(2);
    expect(found.filter((f) => f.rule.startsWith('catalog.')).every((f) => f.severity === 'ok')).toBe(true);
  });

  it('with the demo’s bindings the reservoir roles decide instead, one finding per rating, and no capacitance ' +
    'match', () => {
    const found = evaluate(structuredClone(DEMO_PROJECTS[0])).catalog;
    expect(found.filter((f) => f.rule.startsWith('catalog.'))).toEqual([]);
    const reservoir = found.filter((f) => f.subject.startsWith('Reservoir capacitor'));
    expect(reservoir.map((f) => f.rule).sort()).toEqual([
      'role.capacitor.capacitanceF',
      'role.capacitor.capacitanceF',
      'role.capacitor.rippleA',
      'role.capacitor.rippleA',
      'role.capacitor.voltageV',
      'role.capacitor.voltageV',
    ]);
    expect(reservoir.every((f) => f.severity === 'ok')).toBe(true);
  });

  it('a part rated below the no-load high-mains peak fails', () => {
    // PA rail: 20 V winding, 8 % regulation, +10 % mains -> no-load peak about 31.8 V (simulated); a 25 V part is short
    const p = club();
    p.parts.find((x) => x.id === 'p-c6800')!.ratings.voltageV = 25;
    const f = rule(p, 'catalog.reservoir-voltage');
    expect(f.length).toBe(1);
    expect(f[0].severity).toBe('fail');
    expect(f[0].limit!).toBeGreaterThan(25);
  });

  it('a part whose ripple rating is below the simulated RMS current fails', () => {
    const p = club();
    p.parts.find((x) => x.id === 'p-c6800')!.ratings.rippleA = 0.5;
    const f = rule(p, 'catalog.reservoir-ripple');
    expect(f.length).toBe(1);
    expect(f[0].limit!).toBeGreaterThan(0.5);
  });

  it('a rail with no matching capacitor on the list gets a caution to check by hand', () => {
    const p = club();
    const pa = p.supply.rails.find((r) => r.id === 'rail-pa');
    if (pa?.kind !== 'rectified') throw new Error('demo changed');
    pa.reservoirF = 0.01;
    expect(rule(p, 'catalog.reservoir-match').length).toBe(1);
  });
});

describe('parts-list capacitor voltage margin matches the fitted-part check (1.2 x no-load peak; common practice, no ' +
  'published source, ref §4.2 [D])', () => {
  it('a part 25 % above the no-load peak but below the next standard step is ok on both checks', () => {
    const p = club();
    const peak = evaluate(club()).supply!.rails.find((r) => r.railId === 'rail-pa');
    const peakV = (peak as { reservoir: { noLoadPeakHighV: number } }).reservoir.noLoadPeakHighV;
    const ratedV = Math.ceil(peakV * 1.25); // e.g. 40 V for a 31.8 V peak: above 1.2 x peak, below the 50 V step
    p.parts.find((x) => x.id === 'p-c6800')!.ratings.voltageV = ratedV;
    expect(rule(p, 'catalog.reservoir-voltage').length).toBe(0);
    const ok = rule(p, 'catalog.reservoir').find((f) => f.subject.includes('6800'));
    expect(ok?.severity).toBe('ok');
    expect(Math.abs(ok!.limit! - 1.2 * peakV)).toBeLessThan(1e-9);
  });
});
