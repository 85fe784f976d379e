// The supply checklist line for an unregulated rail says what its trough must stay above: the lowest voltage stated
// for its loads (the club demo's PA rail states 20 V), or that none is stated — never the 0–0.5 V headroom margin
// as a
// need (the old "must stay above 500 mV"). The reports come from the engines themselves (test/pdf/fixture).
import { describe, expect, it } from 'vitest';
import { club30m } from '../../../seed-demo/club-30m';
import { buildChecklist } from '../../../src/core/checklists';
import { evaluationFor } from '../../pdf/fixture';
import type { Project, RectifiedRail } from '../../../src/core/model';

const paTroughLine = (p: Project) => {
  const items = buildChecklist(p, evaluationFor(p)).flatMap((s) => s.items);
  return items.find((i) => i.text.startsWith('PA rail (unregulated, ~24 V): lowest point of the ripple'))!.text;
};
const withPaMinimum = (v: number | null): Project => {
  const p = structuredClone(club30m);
  const rail = p.supply.rails.find((r) => r.id === 'rail-pa') as RectifiedRail;
  rail.minimumV = v;
  rail.marginV = 0.5;
  return p;
};

describe('build checklist: what an unregulated rail must stay above', () => {
  it('the stated lowest voltage of its loads (20 V in the club demo)', () => {
    expect(paTroughLine(withPaMinimum(20))).toContain('(must stay above 20 V, the least its loads need)');
  });
  it('none stated: says so instead of the 500 mV margin', () => {
    const text = paTroughLine(withPaMinimum(null));
    expect(text).toContain('no lowest voltage is stated for its loads');
    expect(text).not.toContain('500 mV');
  });
  it('a regulator’s raw rail names the regulators it feeds', () => {
    const items = buildChecklist(club30m, evaluationFor(club30m)).flatMap((s) => s.items);
    const raw = items.find((i) => i.text.startsWith('Raw DC for the 13.8 V regulator: lowest point'))!.text;
    expect(raw).toMatch(/must stay above [\d.]+ V, the least the regulators it feeds need/);
  });
});
