// Design roles: the bound part's ratings against each rule. Expected values are worked by hand beside each check.
import { describe, expect, it } from 'vitest';
import { checkRoles, judgeRule, partMeetsRole, type DesignRole } from '../../../src/core/roles';
import type { BomLine, Part } from '../../../src/core/model';
import { SOURCES } from '../../../src/core/sources/registry';

const cap = (ratings: Part['ratings'], category = 'capacitor'): Part => ({
  id: 'p',
  description: 'cap',
  category,
  ratings,
  offers: [],
});
// a reservoir with a 30 V no-load peak at high mains: voltage >= 1.2 x 30 = 36 V (20 % margin, common practice,
// no published source), fail below 30 V; ripple >= 1.5 A; capacitance >= 4700 µF x 0.98 = 4606 µF
const reservoir: DesignRole = {
  id: 'reservoir:r1', label: 'Reservoir', category: 'capacitor', stageId: null, qtyPerRig: 1, requirement: '',
  rules: [
    {
      key: 'capacitanceF',
      label: 'Capacitance',
      unit: 'F',
      op: 'min',
      limit: 4606e-6,
      required: true,
      source: 'supply.reservoir-plan',
      why: '',
    },
    {
      key: 'voltageV',
      label: 'Voltage',
      unit: 'V',
      op: 'min',
      limit: 36,
      hardLimit: 30,
      required: true,
      source: 'supply.capacitor-voltage',
      why: '',
    },
    {
      key: 'rippleA',
      label: 'Ripple',
      unit: 'A',
      op: 'min',
      limit: 1.5,
      required: true,
      source: 'supply.capacitor-ripple',
      why: '',
    },
    {
      key: 'dielectric',
      label: 'Dielectric',
      unit: '',
      op: 'oneOf',
      options: ['electrolytic'],
      required: false,
      source: 'roles.rf-dielectric',
      why: '',
    },
  ],
};
const line = (roleId: string | null, partId = 'p'): BomLine => ({
  id: 'b1',
  stageId: null,
  partId,
  qtyPerRig: 1,
  refs: 'C1',
  notes: '',
  roleId,
});

describe('judgeRule', () => {
  it('min with a hard limit: above the limit ok, between the two a caution, below the hard limit a fail', () => {
    const v = reservoir.rules[1];
    expect(judgeRule(v, cap({ voltageV: 50 })).severity).toBe('ok');
    expect(judgeRule(v, cap({ voltageV: 35 })).severity).toBe('caution'); // 30 <= 35 < 36
    expect(judgeRule(v, cap({ voltageV: 25 })).severity).toBe('fail'); // below the 30 V peak
    expect(judgeRule(v, cap({})).severity).toBe('missing');
  });
  it('max, near and oneOf', () => {
    const theta = {
      key: 'thetaSaKPerW',
      label: 'θsa',
      unit: 'K/W',
      op: 'max',
      limit: 12.7,
      required: true,
      source: 'pa.thermal',
      why: '',
    } as const;
    expect(judgeRule(theta, { category: 'heatsink', ratings: { thetaSaKPerW: 2.5 } }).severity).toBe('ok');
    expect(judgeRule(theta, { category: 'heatsink', ratings: { thetaSaKPerW: 15 } }).severity).toBe('fail');
    // AL 4.9 nH/t² ±10 %: 5.3 is inside (|5.3-4.9| = 0.4 <= 0.49), 5.5 is not (0.6 > 0.49)
    const al = {
      key: 'alHPerTurn2',
      label: 'AL',
      unit: 'H',
      op: 'near',
      limit: 4.9e-9,
      tolerance: 0.1,
      required: true,
      source: 'roles.core-al',
      why: '',
    } as const;
    expect(judgeRule(al, { category: 'core', ratings: { alHPerTurn2: 5.3e-9 } }).severity).toBe('ok');
    expect(judgeRule(al, { category: 'core', ratings: { alHPerTurn2: 5.5e-9 } }).severity).toBe('fail');
    expect(judgeRule(reservoir.rules[3], cap({ dielectric: 'Electrolytic' })).severity).toBe('ok'); // any case
    expect(judgeRule(reservoir.rules[3], cap({ dielectric: 'film' })).severity).toBe('fail');
  });
  it('a rating outside its category field range is not used (read as missing)', () => {
    expect(judgeRule(reservoir.rules[1], cap({ voltageV: -5 })).severity).toBe('missing');
  });
});

describe('checkRoles', () => {
  const good = cap({ capacitanceF: 0.0047, voltageV: 50, rippleA: 2.4 }, 'capacitor-reservoir'); // older category name
  it('a bound part meeting every rule: ok findings only, one per rule it states, each with a registry source', () => {
    const r = checkRoles({ parts: [good], bom: [line('reservoir:r1')] }, [reservoir]);
    expect(r.statuses[0].state).toBe('ok');
    expect(r.findings.map((f) => f.rule)).toEqual([
      'role.capacitor.capacitanceF',
      'role.capacitor.voltageV',
      'role.capacitor.rippleA',
    ]);
    for (const f of r.findings) expect(SOURCES[f.source]).toBeDefined();
    expect(partMeetsRole(good, reservoir)).toBe(true);
  });
  it('a ripple rating below the requirement fails that rule, naming both values', () => {
    const weak = cap({ capacitanceF: 0.0047, voltageV: 50, rippleA: 1.2 });
    const r = checkRoles({ parts: [weak], bom: [line('reservoir:r1')] }, [reservoir]);
    const f = r.findings.find((x) => x.rule === 'role.capacitor.rippleA')!;
    expect(f.severity).toBe('fail');
    expect([f.value, f.limit]).toEqual([1.2, 1.5]);
    expect(r.statuses[0].state).toBe('fail');
    expect(partMeetsRole(weak, reservoir)).toBe(false);
  });
  it('a required rating not stated is a caution asking for it; an optional one is skipped', () => {
    const r = checkRoles({ parts: [cap({ capacitanceF: 0.0047, voltageV: 50 })], bom: [line('reservoir:r1')] }, [
      reservoir,
    ]);
    expect(r.findings.filter((f) => f.severity === 'caution').map((f) => f.rule)).toEqual(['role.capacitor.rippleA']);
    expect(r.findings.some((f) => f.rule === 'role.capacitor.dielectric')).toBe(false);
  });
  it('the wrong category is one fail; an unbound role and a line bound to a missing role are cautions', () => {
    const r1 = checkRoles({ parts: [cap({ voltageV: 50 }, 'resistor')], bom: [line('reservoir:r1')] }, [reservoir]);
    expect(r1.findings.map((f) => [f.rule, f.severity])).toEqual([['role.category', 'fail']]);
    const r2 = checkRoles({ parts: [good], bom: [line(null)] }, [reservoir]);
    expect(r2.findings.map((f) => f.rule)).toEqual(['role.unbound']);
    expect(r2.statuses[0].state).toBe('unbound');
    const r3 = checkRoles({ parts: [good], bom: [line('reservoir:gone')] }, []);
    expect(r3.findings.map((f) => f.rule)).toEqual(['role.gone']);
    // older data without the field is simply unbound
    const { roleId: _, ...old } = line(null);
    expect(checkRoles({ parts: [good], bom: [old] }, []).findings).toEqual([]);
  });
});
