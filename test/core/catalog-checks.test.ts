import { describe, it, expect } from 'vitest';
import { evaluate } from '../../src/core/evaluate';
import { DEMO_PROJECTS } from '../../seed-demo/index';

const club = () => structuredClone(DEMO_PROJECTS[0]);
const rule = (p: ReturnType<typeof club>, r: string) => evaluate(p).catalog.filter((f) => f.rule === r);

describe('parts-list reservoir capacitors against the supply design', () => {
  it('the demo parts cover their rails', () => {
    const found = evaluate(club()).catalog;
    expect(found.filter((f) => f.rule === 'catalog.reservoir').length).toBe(2);
    expect(found.every((f) => f.severity === 'ok')).toBe(true);
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
