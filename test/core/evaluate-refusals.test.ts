// A computed current core cannot compute (refused PA data, a relay coil with no rail) is a fail finding naming the
// stage and field, the budget shows it as unknown (never 0), and no supply is designed for a zero load in its place.
// These are program rules (the project's own "no silent fallback" rule), not engineering values: no external source.
import { describe, expect, it } from 'vitest';
import { evaluate } from '../../src/core/evaluate';
import { worstSeverity } from '../../src/core/findings';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { BudgetTable } from '../../views/components/budget-table';

const club = () => structuredClone(DEMO_PROJECTS[0]);
const portable = () => structuredClone(DEMO_PROJECTS[1]);
const fails = (r: ReturnType<typeof evaluate>, rule: string) =>
  r.findings.filter((f) => f.severity === 'fail' && f.rule === rule);
const railOf = (r: ReturnType<typeof evaluate>, id: string) => r.budget.rails.find((x) => x.railId === id)!;

describe('a PA that core refuses', () => {
  it('efficiency 2 % (below the 5 % core accepts): fail naming stage and field, key-down unknown, PA rail not ' +
    'designed', () => {
    const p = club();
    p.stages.find((s) => s.id === 'st-pa')!.pa!.efficiency = 0.02;
    const r = evaluate(p);
    const f = fails(r, 'budget.pa-current');
    expect(f.map((x) => x.subject)).toEqual(['Push-pull MOSFET final: PA key-down current']);
    expect(f[0].message).toContain('refused: efficiency');
    // the typed 1.2 A key-down is not silently replaced by 0: the rail's key-down is unknown
    const pa = railOf(r, 'rail-pa');
    expect(Number.isNaN(pa.outputA.keyDown)).toBe(true);
    expect(Number.isNaN(r.budget.totalW.keyDown)).toBe(true);
    expect(pa.outputA.keyUp).toBeCloseTo(0.05, 12); // the typed key-up idle current stays
    // no supply design for the PA rail, and its transformer is not sized on the other windings alone
    expect(r.supply!.rails.some((x) => x.railId === 'rail-pa')).toBe(false);
    expect(
      r.supply!.findings.filter((x) => x.rule === 'supply.unknown-load' && x.severity === 'fail').map((x) => x.subject),
    ).toEqual(['PA rail (unregulated, ~24 V)', 'T1 mains transformer']);
    expect(r.supply!.transformers).toHaveLength(0);
    expect(r.supply!.primary).toBeNull();
    // the raw rail and its regulator are in another tree: still designed
    expect(r.supply!.rails.map((x) => x.railId).sort()).toEqual(['rail-13v8', 'rail-raw']);
    expect(worstSeverity(r.findings)).toBe('fail');
  });

  it('a PA on a rail the project does not have: fail naming the supply rail, nothing designed for it', () => {
    const p = club();
    p.stages.find((s) => s.id === 'st-pa')!.pa!.railId = 'rail-gone';
    const r = evaluate(p);
    const f = fails(r, 'budget.pa-current');
    expect(f).toHaveLength(1);
    expect(f[0].message).toContain('refused: supply rail');
  });

  it('battery station: the battery and the regulator it feeds are not designed when the PA current is unknown', () => {
    const p = portable();
    p.stages.find((s) => s.pa)!.pa!.efficiency = 0.01;
    const r = evaluate(p);
    expect(fails(r, 'budget.pa-current')).toHaveLength(1);
    expect(Number.isNaN(railOf(r, 'rail-bat').outputA.keyDown)).toBe(true);
    expect(r.supply!.rails).toHaveLength(0);
    const subjects = r.supply!.findings.filter((x) => x.rule === 'supply.unknown-load').map((x) => x.subject);
    expect(subjects).toHaveLength(2);
    expect(worstSeverity(r.findings)).toBe('fail');
  });
});

describe('a relay coil whose current cannot be placed', () => {
  it('coil current with no rail chosen: fail naming the stage and the coil rail, not a silent omission', () => {
    const p = club();
    const tr = p.stages.find((s) => s.kind === 'tr')!;
    tr.relay!.coilRailId = null;
    const r = evaluate(p);
    expect(fails(r, 'relay.coil').map((x) => x.subject)).toEqual([`${tr.name}: relay coil rail`]);
    expect(worstSeverity(r.findings)).toBe('fail');
  });

  it('coil on a rail the project does not have: the same fail', () => {
    const p = club();
    const tr = p.stages.find((s) => s.kind === 'tr')!;
    tr.relay!.coilRailId = 'rail-gone';
    expect(fails(evaluate(p), 'relay.coil').map((x) => x.subject)).toEqual([`${tr.name}: relay coil rail`]);
  });

  it('a refused coil current makes its rail unknown in the modes it is energised, and its supply tree ' +
    'undesigned', () => {
    const p = club();
    const tr = p.stages.find((s) => s.kind === 'tr')!;
    tr.relay!.coilA = -0.03;
    const r = evaluate(p);
    expect(fails(r, 'relay.coil').map((x) => x.subject)).toEqual([`${tr.name}: relay coil current`]);
    const sig = railOf(r, 'rail-13v8');
    expect(Number.isNaN(sig.outputA.keyDown) && Number.isNaN(sig.outputA.keyUp)).toBe(true);
    expect(Number.isFinite(sig.outputA.receive)).toBe(true); // the coil is not energised on receive
    // unknown through the regulator to its source: neither is designed
    expect(Number.isNaN(railOf(r, 'rail-raw').outputA.keyDown)).toBe(true);
    expect(r.supply!.rails.map((x) => x.railId)).toEqual(['rail-pa']);
  });
});

describe('an entered load on a rail the project does not have', () => {
  it('is a fail finding, not dropped silently', () => {
    const p = club();
    const rx = p.stages.find((s) => s.kind === 'receiver')!;
    rx.loads = [{ railId: 'rail-gone', currentA: { receive: 0.05, keyUp: 0.01, keyDown: 0.01 } }];
    const f = fails(evaluate(p), 'budget.no-rail');
    expect(f.map((x) => x.subject)).toEqual([`${rx.name}: entered load`]);
  });
});

describe('the budget table shows an unknown current as unknown, never as 0', () => {
  it('renders "unknown" in the PA rail key-down cell and the key-down total', () => {
    const p = club();
    p.stages.find((s) => s.id === 'st-pa')!.pa!.efficiency = 0.02;
    const html = String(BudgetTable({ budget: evaluate(p).budget }));
    const cell = html.match(/data-rail="rail-pa" data-mode="keyDown">([\s\S]*?)<\/td>/)![1];
    expect(cell).toContain('unknown');
    expect(cell).not.toMatch(/>0 A</);
    const total = html.match(/data-total-mode="keyDown">([\s\S]*?)<\/td>/)![1];
    expect(total).toContain('unknown');
  });
});

describe('a refused PA shows no placeholder zeros downstream', () => {
  const refused = () => {
    const p = club();
    p.stages.find((s) => s.id === 'st-pa')!.pa!.efficiency = 0.02;
    return { p, r: evaluate(p) };
  };
  it('the RF page says "Not computed" instead of a table of 0 W / 0 A', async () => {
    const { RfResults } = await import('../../views/partials/rf-results');
    const html = String(await RfResults({ report: refused().r.rf })!.toString());
    const block = html.match(/<div class="rf-pa">([\s\S]*?)<\/div>/)![1];
    expect(block).toContain('Not computed: the PA data is refused');
    expect(block).toContain('Push-pull MOSFET final: efficiency');
    expect(block).not.toContain('DC input / key-down current');
  });
  it('the RF checks say the stress checks use the target power instead of the unknown PA output', () => {
    const { p, r } = refused();
    const note = r.rf.findings.find((f) => f.rule === 'rf.pa-unknown')!;
    expect(note.severity).toBe('caution');
    expect(note.message).toContain(`${p.targetPowerW} W target power`);
  });
  it('the build checklist does not tell the builder to expect 0 A key-down or 0 W output', async () => {
    const { buildChecklist } = await import('../../src/core/checklists');
    const { p, r } = refused();
    const items = buildChecklist(p, r).find((s) => s.stageId === 'st-pa')!.items;
    const keyDown = items.find((i) => i.text.startsWith('Key down for a few seconds'))!;
    expect(keyDown.value).toBeNull(); // unknown, printed as a dash, not "0 A"
    const output = items.find((i) => i.text.startsWith('Measure the output'))!;
    expect(output.text).toContain('PA not computed');
  });
});

describe('a rectified rail with no winding', () => {
  it('has an unknown voltage in the budget (not 0 V) with a fail naming the rail, and its PA current is ' +
    'refused', () => {
    const p = club();
    (p.supply.rails.find((x) => x.id === 'rail-pa') as { windingId: string }).windingId = 'gone';
    const r = evaluate(p);
    const pa = railOf(r, 'rail-pa');
    expect(Number.isNaN(pa.nominalV)).toBe(true);
    expect(Number.isNaN(pa.outputW.keyUp)).toBe(true); // 50 mA at an unknown voltage: unknown power, not 0 W
    expect(fails(r, 'budget.rail-voltage').map((f) => f.subject)).toEqual([pa.name]);
    expect(fails(r, 'budget.pa-current').map((f) => f.subject)).toEqual([
      'Push-pull MOSFET final: PA key-down current',
    ]);
  });
});

describe('the supply page for a tree with an unknown load', () => {
  it('shows the "not designed" failure and no rail card for the PA rail', async () => {
    const { SupplyResults } = await import('../../views/partials/supply-results');
    const p = club();
    p.stages.find((s) => s.id === 'st-pa')!.pa!.efficiency = 0.02;
    const html = String(await SupplyResults({ report: evaluate(p).supply! })!.toString());
    expect(html).toContain('PA rail (unregulated, ~24 V) is not designed');
    expect(html).toContain('T1 mains transformer is not sized');
    expect(html).toContain('id="supply-rail-raw"'); // the other tree keeps its card
    expect(html).not.toContain('id="supply-rail-pa"');
  });
});
