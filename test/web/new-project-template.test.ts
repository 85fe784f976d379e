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
    const res = await post('/projects', { name: '40 m two-rail', band: '7.03', power: '20', mains: '230-50', template: 'mains-two-rail' });
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
    const res = await post('/projects', { name: 'Nope', band: '7.03', power: '5', mains: 'battery', template: 'single-rail' });
    expect(res.status).toBe(422);
    const html = await res.text();
    expect(html).toContain('Supply: the &quot;Single-rail low-power rig&quot; template runs from the mains');
    // the typed name is kept
    expect(html).toContain('value="Nope"');
    expect((await listProjects(database.db)).length).toBe(before);
  });

  it('the battery template with a battery supply creates a battery station', async () => {
    const { post, database } = await demoApp();
    const res = await post('/projects', { name: 'Hilltop', band: '14.06', power: '5', mains: 'battery', template: 'battery-portable' });
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
});
