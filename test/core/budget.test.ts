import { describe, it, expect } from 'vitest';
import { computeBudget } from '../../src/core/budget';
import { regulatorOutputV, regulatorInputCurrentA as regulatorInputA } from '../../src/core/power/regulator';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import type { Project, RegulatedRail } from '../../src/core/model';
import { MODES } from '../../src/core/model';

const toleranceA = 1e-9;
const toleranceV = 0.005;
const club = () => structuredClone(DEMO_PROJECTS[0]);

describe('regulator output voltage', () => {
  it('adjustable: Vref(1 + R2/R1) + Iadj R2', () => {
    // Source: reference §6.2 worked example [D] from adjustable-regulator datasheets: 240 Ω / 2.4 kΩ -> 13.87 V
    expect(
      Math.abs(
        regulatorOutputV({ method: 'adjustable', vrefV: 1.25, adjustA: 50e-6, r1Ohm: 240, r2Ohm: 2400 }) - 13.87,
      ),
    ).toBeLessThan(toleranceV);
    // 220 Ω / 1 kΩ, I_adj neglected -> 6.93 V (reference §6.2)
    expect(
      Math.abs(regulatorOutputV({ method: 'adjustable', vrefV: 1.25, adjustA: 0, r1Ohm: 220, r2Ohm: 1000 }) - 6.93),
    ).toBeLessThan(toleranceV);
  });
  it('fixed raised by diodes adds one drop per diode', () => {
    // Source: reference §6.1 [C] ("5 V + 0.7 V = 5.7 V")
    expect(regulatorOutputV({ method: 'raised-diodes', nominalV: 5, diodes: 1, diodeDropV: 0.7 })).toBeCloseTo(5.7, 9);
  });
  it('fixed raised by a resistor divider includes Iq R2', () => {
    // Source: reference §6.1 [C]: Vout = Vxx (1 + R2/R1) + Iq R2; 12 V, R1 = 1 kΩ, R2 = 150 Ω, Iq = 5 mA -> 13.8 +
    // 0.75 = 14.55 V [D]
    expect(regulatorOutputV({ method: 'raised-resistor', nominalV: 12, r1Ohm: 1000, r2Ohm: 150 }, 0.005)).toBeCloseTo(
      14.55,
      9,
    );
  });
});

describe('current budget', () => {
  it('sums stage loads per rail and mode', () => {
    const p = club();
    const b = computeBudget(p);
    const rail = b.rails.find((r) => r.railId === 'rail-13v8')!;
    for (const m of MODES) {
      const sum = p.stages
        .flatMap((s) => s.loads)
        .filter((l) => l.railId === 'rail-13v8')
        .reduce((a, l) => a + l.currentA[m], 0);
      expect(Math.abs(rail.ownA[m] - sum)).toBeLessThan(toleranceA);
      expect(Math.abs(rail.outputA[m] - sum)).toBeLessThan(toleranceA); // nothing regulated hangs below it
    }
    // hand sum for key-down: 12 + 18 + 160 + 4 + 12 mA = 206 mA
    expect(Math.abs(rail.outputA.keyDown - 0.206)).toBeLessThan(toleranceA);
  });

  it('a linear regulator draws its output plus its quiescent current from its parent', () => {
    const b = computeBudget(club());
    const raw = b.rails.find((r) => r.railId === 'rail-raw')!;
    const reg = b.rails.find((r) => r.railId === 'rail-13v8')!;
    for (const m of MODES) expect(Math.abs(raw.outputA[m] - (reg.outputA[m] + 0.0052))).toBeLessThan(toleranceA);
  });

  it('a switching module draws Pout / (efficiency x Vin) at the lowest input voltage', () => {
    const p = club();
    const reg = p.supply.rails.find((r) => r.id === 'rail-13v8') as RegulatedRail;
    reg.regulator = 'switching';
    reg.efficiency = 0.85;
    reg.quiescentA = 0.002;
    // energy balance by hand: 13.87 V x 0.206 A / (0.85 x 18 V) + 2 mA = 0.18874 A
    expect(regulatorInputA(reg, 0.206, 18)).toBeCloseTo((13.87 * 0.206) / (0.85 * 18) + 0.002, 4);
    const b = computeBudget(p, [], { 'rail-raw': 18 });
    const raw = b.rails.find((r) => r.railId === 'rail-raw')!;
    expect(raw.outputA.keyDown).toBeCloseTo(regulatorInputA(reg, 0.206, 18), 9);
  });

  it('a computed load replaces the entered PA key-down current (no second entry)', () => {
    const p = club();
    const b = computeBudget(p, [
      { stageId: 'st-pa', railId: 'rail-pa', currentA: { receive: 0, keyUp: 0, keyDown: 1.5 }, replaces: ['keyDown'] },
    ]);
    const pa = b.rails.find((r) => r.railId === 'rail-pa')!;
    expect(pa.outputA.keyDown).toBeCloseTo(1.5, 12);
    expect(pa.outputA.keyUp).toBeCloseTo(0.05, 12); // entered key-up idle current kept
  });

  it('total DC power equals the sum over the sources', () => {
    const b = computeBudget(club());
    for (const m of MODES) expect(b.totalW[m]).toBeCloseTo(b.sources.reduce((a, s) => a + s.outputW[m], 0), 9);
  });

  it('a regulator loop is a finding, not a hang', () => {
    const p: Project = club();
    const reg = p.supply.rails.find((r) => r.id === 'rail-13v8') as RegulatedRail;
    reg.parentId = 'rail-13v8';
    const b = computeBudget(p);
    expect(b.findings.some((f) => f.rule === 'supply.loop' && f.severity === 'fail')).toBe(true);
  });
});
