// The pack page offers the builder's pack, the organiser's pack or both; the PDF route takes the choice as `part`
// and refuses an unknown one by name.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { SAFETY_PREAMBLE } from '../../src/core/checklists';

const P = '/projects/demo-club-30m';

describe('pack parts on the web', () => {
  it('offers the three packs on two papers', async () => {
    const { get } = await demoApp();
    const html = await (await get(`${P}/pack`)).text();
    for (const part of ['builder', 'organiser', 'both'])
      for (const paper of ['a4', 'letter'])
        expect(html).toContain(`href="${P}/pack.pdf?part=${part}&amp;paper=${paper}"`);
    expect(html).toContain('8 packing sheets (one per kit)');
  });

  it('says the safety preamble once on the page (in its box, not again as the first checklist item)', async () => {
    const { get } = await demoApp();
    const html = await (await get(`${P}/pack`)).text();
    const preamble = SAFETY_PREAMBLE.slice(0, 60);
    expect(html.split(preamble).length - 1).toBe(1);
  });

  it('downloads each part as its own PDF, named for it', async () => {
    const { get } = await demoApp();
    const names: string[] = [];
    for (const part of ['builder', 'organiser', 'both']) {
      const res = await get(`${P}/pack.pdf?part=${part}&paper=a4`);
      expect(res.status).toBe(200);
      expect(res.headers.get('Content-Type')).toBe('application/pdf');
      expect(Buffer.from(await res.arrayBuffer()).subarray(0, 5).toString('latin1')).toBe('%PDF-');
      names.push(res.headers.get('Content-Disposition') ?? '');
    }
    expect(names[0]).toMatch(/-builder-a4\.pdf"$/);
    expect(names[1]).toMatch(/-organiser-a4\.pdf"$/);
    // the full pack keeps the name it had before the choice existed
    expect(names[2]).toMatch(/\(8-kits\)-a4\.pdf"$|-a4\.pdf"$/);
    expect(names[2]).not.toMatch(/builder|organiser/);
  });

  it('refuses an unknown part by name', async () => {
    const { get } = await demoApp();
    const res = await get(`${P}/pack.pdf?part=everyone`);
    expect(res.status).toBe(400);
    expect(await res.text()).toContain('part must be one of "both", "builder", "organiser"');
  });
});
