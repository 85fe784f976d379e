// The new-project form's template choice through app.request: a template creates the stages, rails and a priced
// parts list (stored and reloaded); a supply that does not fit the template is refused by field, nothing saved.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { listProjects, loadProject } from '../../src/db/projects';

describe('new project from a template', () => {
  it('shows the templates as a choice on the project list', async () => {
    const { get } = await demoApp();
    const html = await (await get('/')).text();
    for (const v of ['mains-two-rail', 'battery-portable', 'single-rail', 'amplifier-only', ''])
      expect(html).toContain(`name="template" value="${v}"`);
  });

  it('creates stages, supply and a parts list from the mains two-rail template', async () => {
    const { post, database } = await demoApp();
    const res = await post('/projects', {
      name: '40 m two-rail',
      band: '7.03',
      power: '20',
      mains: '230-50',
      template: 'mains-two-rail',
    });
    expect(res.status).toBe(303);
    const id = res.headers.get('location')!.split('/').pop()!;
    const p = (await loadProject(database.db, id))!;
    expect(p.name).toBe('40 m two-rail');
    expect(p.frequencyHz).toBe(7.03e6);
    expect(p.mains?.nominalV).toBe(230);
    expect(p.supply.transformers[0]!.windings.length).toBe(2);
    expect(p.supply.rails.map((r) => r.kind)).toEqual(['rectified', 'regulated', 'rectified']);
    expect(p.stages.map((s) => s.kind)).toEqual(['receiver', 'vxo', 'driver', 'final', 'lpf', 'tr', 'other']);
    expect(p.bom.length).toBeGreaterThan(10);
    expect(p.parts.every((x) => x.offers.length > 0)).toBe(true);
  });

  it('refuses a battery supply for a mains template by naming the Supply field, and saves nothing', async () => {
    const { post, database } = await demoApp();
    const before = (await listProjects(database.db)).length;
    const res = await post('/projects', {
      name: 'Nope',
      band: '7.03',
      power: '5',
      mains: 'battery',
      template: 'single-rail',
    });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('Supply: the &quot;Single-rail low-power rig&quot; template runs from the mains');
    // the typed name is kept
    expect(html).toContain('value="Nope"');
    expect((await listProjects(database.db)).length).toBe(before);
  });

  it('the battery template with a battery supply creates a battery station', async () => {
    const { post, database } = await demoApp();
    const res = await post('/projects', {
      name: 'Hilltop',
      band: '14.06',
      power: '5',
      mains: 'battery',
      template: 'battery-portable',
    });
    expect(res.status).toBe(303);
    const p = (await loadProject(database.db, res.headers.get('location')!.split('/').pop()!))!;
    expect(p.mains).toBeNull();
    expect(p.supply.rails.map((r) => r.kind)).toEqual(['battery', 'regulated']);
  });

  it('an empty project says what to do next on the overview, supply, parts and parts-list pages', async () => {
    const { post, get } = await demoApp();
    const res = await post('/projects', { name: 'Blank', band: '7.03', power: '5', mains: '230-50', template: '' });
    const id = res.headers.get('location')!.split('/').pop()!;
    const page = async (path: string) => (await (await get(`/projects/${id}${path}`)).text()).replace(/\s+/g, ' ');
    expect(await page('')).toContain('a stage draws its current from a rail, and there is none yet');
    expect(await page('/supply')).toContain('no rails yet. Add the mains transformer and its secondary windings');
    expect(await page('/parts')).toContain('the catalog is empty. Add each part you will buy below');
    expect(await page('/bom')).toContain('the catalog is empty: add parts on the');
    // a project with stages, rails and parts shows none of them
    const demo = async (path: string) => (await (await get(`/projects/demo-club-30m${path}`)).text());
    for (const path of ['', '/supply', '/parts', '/bom']) expect(await demo(path)).not.toContain('class="empty-state"');
  });

  it("an empty project's first screen says what to do next beside the verdict, and its cost is not a plain " +
    "0.00", async () => {
    const { post, get } = await demoApp();
    const res = await post('/projects', { name: 'Blank', band: '7.03', power: '5', mains: '230-50', template: '' });
    const id = res.headers.get('location')!.split('/').pop()!;
    const html = (await (await get(`/projects/${id}`)).text()).replace(/\s+/g, ' ');
    const verdictCard = html.slice(html.indexOf('id="verdict"'), html.indexOf('id="top-fixes"'));
    expect(verdictCard).toContain('set up the supply on the <a href="/projects/' + id + '/supply">Supply</a> page');
    const cost = html.slice(html.indexOf('id="cost-glance"'), html.indexOf('id="harmonic-glance"'));
    expect(cost).toContain('no parts in the list yet, so no cost');
    expect(cost).not.toContain('0.00');
    // the trough chart with no rail is tall enough for its one line (24 px, not the 8 px of zero rows)
    expect(html).toMatch(/class="plot troughs" viewBox="0 0 \d+ 24"/);
    // the RF page names the stages the RF checks need
    const rf = (await (await get(`/projects/${id}/rf`)).text()).replace(/\s+/g, ' ');
    expect(rf).toContain('add a final amplifier stage with its PA settings and a low-pass filter stage on the');
    expect(rf).toContain('Without a filter the harmonics below fail.');
    // the club demo has stages, rails, parts, a final and a filter: none of these notes
    const demo = (await (await get('/projects/demo-club-30m')).text()).replace(/\s+/g, ' ');
    expect(demo).not.toContain('Nothing designed yet');
    expect(demo).not.toContain('no parts in the list yet');
    expect(await (await get('/projects/demo-club-30m/rf')).text()).not.toContain('RF stages missing');
  });

  it("the Supply box says which supply the battery template needs, before it is refused", async () => {
    const { get } = await demoApp();
    const html = (await (await get('/')).text()).replace(/\s+/g, ' ');
    expect(html).toContain(
      'the battery portable template needs Battery / external DC; the other templates a mains voltage',
    );
  });
});
