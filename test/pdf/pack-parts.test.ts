// The pack in parts: the builder's pages, the organiser's pages, or both in one file; the disclaimer printed once,
// on the cover; reference ranges such as "C10–C14" whole in the parts tables. Read back with pdftotext.
import { describe, expect, it, beforeAll } from 'vitest';
import { club30m } from '../../seed-demo/club-30m';
import { buildPack, type PackPart } from '../../src/pdf';
import { SAFETY_PREAMBLE } from '../../src/core/checklists';
import { GOVERNS } from '../../src/core/rules/rule-set';
import { evaluationFor } from './fixture';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp } from './pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);

// pdftotext (raw, not -layout) joins a wrapped line with a newline: compare with single spaces
const flat = (pages: string[]) => pages.join('\n').replace(/\s+/g, ' ');
const occurrences = (text: string, what: string) => text.split(what).length - 1;

describe.skipIf(!hasPoppler)('pack parts for the club build (8 kits)', () => {
  const text: Partial<Record<PackPart, string>> = {};
  const pages: Partial<Record<PackPart, string[]>> = {};
  beforeAll(async () => {
    const report = evaluationFor(club30m);
    for (const part of ['both', 'builder', 'organiser'] as const) {
      const bytes = await buildPack(club30m, report, { paper: 'a4', dataDate: '2026-12-02', part });
      pages[part] = pagesText(writeTemp(bytes, `${part}.pdf`));
      text[part] = flat(pages[part]!);
    }
  }, 120_000);

  it("the builder's pack: parts for one rig without prices, the design and both checklists; no orders or packing " +
    "sheets", () => {
    const t = text.builder!;
    expect(t).toContain('Builder’s pack');
    expect(t).toContain('Parts for one rig');
    for (const heading of ['Current budget', 'Build checklist', 'Safety checklist', 'Sources'])
      expect(t).toContain(heading);
    for (const absent of ['Costed parts list', 'Order sheets per supplier', 'Order total', 'Packing sheet'])
      expect(t.includes(absent), absent).toBe(false);
    // the cover gives the cost per kit, not the build's total
    expect(flat(pages.builder!.slice(0, 1))).toContain('Per kit');
    expect(flat(pages.builder!.slice(0, 1)).includes('Build total')).toBe(false);
  });

  it("the organiser's pack: costed list, order sheets and one packing sheet per kit; no checklists", () => {
    const t = text.organiser!;
    expect(t).toContain('Organiser’s pack');
    for (const heading of ['Costed parts list', 'Order sheets per supplier', 'Build total'])
      expect(t).toContain(heading);
    for (let k = 1; k <= club30m.kits; k++) expect(t).toContain(`Packing sheet — kit ${k} of ${club30m.kits}`);
    for (const absent of ['Build checklist', 'Safety checklist', 'Parts for one rig'])
      expect(t.includes(absent), absent).toBe(false);
  });

  it('both in one file holds the organiser and builder pages', () => {
    const t = text.both!;
    for (const heading of [
      'Costed parts list',
      'Order sheets per supplier',
      'Packing sheet — kit 8 of 8',
      'Build checklist',
      'Safety checklist',
    ]) {
      expect(t).toContain(heading);
    }
    expect(pages.both!.length).toBeGreaterThan(pages.builder!.length);
    expect(pages.both!.length).toBeGreaterThan(pages.organiser!.length);
  });

  it('prints the disclaimer once, on the cover, in each file', () => {
    for (const part of ['both', 'builder', 'organiser'] as const) {
      const t = text[part]!;
      expect(occurrences(t, 'This pack is a planning aid')).toBe(1);
      expect(flat(pages[part]!.slice(0, 1))).toContain('This pack is a planning aid');
      // the texts it replaces are not repeated elsewhere
      expect(t.includes(GOVERNS)).toBe(false);
      expect(t.includes(SAFETY_PREAMBLE)).toBe(false);
    }
  });

  it('keeps the reference range C10–C14 whole in the costed list, the packing sheets and the rig list', () => {
    // the club's five LPF capacitors carry "C10–C14"; broken, the text would read "C10–C1 4"
    expect(occurrences(text.organiser!, 'C10–C14')).toBeGreaterThanOrEqual(1 + club30m.kits);
    expect(text.builder!).toContain('C10–C14');
    for (const part of ['both', 'builder', 'organiser'] as const) expect(text[part]!).not.toMatch(/C10–C1 4/);
  });
});
