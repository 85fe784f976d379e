// The pack's parts lists show each line's bound design role with its rating check, and a table of every role with
// its requirement; an unbound role is listed as a finding. Read back with pdftotext. The club demo binds every role,
// with the deliberate 0.5 W bleeders (0.92 W needed: P = V²/R at the no-load peak, rated at most 50 % loaded).
import { beforeAll, describe, expect, it } from 'vitest';
import { club30m } from '../../seed-demo/club-30m';
import { buildPack } from '../../src/pdf';
import { evaluationFor } from './fixture';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp } from './pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);
const flat = (pages: string[]) => pages.join('\n').replace(/\s+/g, ' ');

describe.skipIf(!hasPoppler)('design roles in the pack', () => {
  let builder = '';
  let organiser = '';
  let unbound = '';
  beforeAll(async () => {
    const report = evaluationFor(club30m);
    builder = flat(
      pagesText(
        writeTemp(await buildPack(club30m, report, { paper: 'a4', dataDate: '2026-12-02', part: 'builder' }), 'b.pdf'),
      ),
    );
    organiser = flat(
      pagesText(
        writeTemp(
          await buildPack(club30m, report, { paper: 'a4', dataDate: '2026-12-02', part: 'organiser' }),
          'o.pdf',
        ),
      ),
    );
    // the same project with the transformer line unbound
    const p = {
      ...club30m,
      bom: club30m.bom.map((b) => (b.roleId === 'transformer:tr-main' ? { ...b, roleId: null } : b)),
    };
    unbound = flat(
      pagesText(
        writeTemp(
          await buildPack(p, evaluationFor(p), { paper: 'a4', dataDate: '2026-12-02', part: 'builder' }),
          'u.pdf',
        ),
      ),
    );
  }, 120_000);

  it("each bound line carries its role and check, in the builder's and the organiser's parts lists", () => {
    for (const t of [builder, organiser]) {
      expect(t).toContain('Role: Reservoir capacitor, PA rail (unregulated, ~24 V) — meets the design');
      expect(t).toContain('Role: Bleeder resistors — check: Power 500 mW does not meet at least 919 mW');
      expect(t).toContain('Parts the design needs');
    }
  });

  // to check: the 0.5 W bleeders (a mismatch) and the generic fuse and filter-capacitor lines (cannot be checked)
  it('the roles table counts them; an unbound role is a finding', () => {
    expect(builder).toMatch(/13 role\(s\): 10 met, 3 to check or change, 0 unbound\./);
    expect(builder).toContain('does not state capacitance, so it cannot be checked');
    expect(unbound).toContain('Finding: no parts-list line is bound to this part of the design');
    expect(unbound).toMatch(/13 role\(s\): 9 met, 3 to check or change, 1 unbound\./);
  });
});
