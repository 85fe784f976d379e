// A 500-line parts list: the table runs over many pages, repeats its header on each, and every page is
// numbered. Nothing is timed here (speed lives in the lead's bench).
import { describe, expect, it } from 'vitest';
import { PDFDocument } from 'pdf-lib';
import { club30m } from '../../seed-demo/club-30m';
import { buildPack, largeBomProject } from '../../src/pdf';
import { costProject } from '../../src/core/cost';
import { computeBudget } from '../../src/core/budget';
import { hasPoppler, pagesText, writeTemp } from './pdf-text';

describe('500-line parts list', () => {
  it.skipIf(!hasPoppler)('repeats the table header on every page of the list and numbers every page', async () => {
    // one kit: no packing sheets, so every "(line N)" page belongs to the parts list
    const project = { ...largeBomProject(club30m, 500), kits: 1 };
    expect(project.bom.length).toBe(500);
    const cost = costProject(project);
    const report = { budget: computeBudget(project), supply: null, rf: null, cost, findings: cost.findings };
    const bytes = await buildPack(project, report, { paper: 'letter', dataDate: '2026-11-28' });
    const n = (await PDFDocument.load(bytes)).getPageCount();
    const pages = pagesText(writeTemp(bytes, 'large.pdf'));
    expect(pages.length).toBe(n);
    // the generated lines carry the designators X1..X500 (short: never wrapped in the Refs column)
    // the order sheets per supplier after the list name the designators too: only the text before them is the list
    const cut = pages.findIndex((p) => p.includes('Order sheets per supplier'));
    const beforeOrders =
      cut < 0
        ? pages
        : pages.slice(0, cut + 1).map((p, i) => (i === cut ? p.split('Order sheets per supplier')[0] : p));
    const listPages = beforeOrders.filter((p) => /(?<![-\w])X\d+\b/.test(p));
    // 500 rows at two to three lines each cannot fit on fewer than 10 Letter pages
    expect(listPages.length).toBeGreaterThanOrEqual(10);
    for (const p of listPages) {
      expect(p).toContain('Supplier / SKU');
      expect(p).toContain('Description');
    }
    // every line of the list is printed once in the parts list
    const seen = new Set(listPages.join('\n').match(/(?<![-\w])X\d+\b/g));
    expect(seen.size).toBe(500);
    pages.forEach((t, i) => expect(t).toContain(`page ${i + 1} of ${n}`));
  });
});
