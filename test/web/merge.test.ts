// Several open forms of one project (a club night with several people on one build): a save from a form loaded
// at an older version applies when the fields it changes were not changed since; only the same field changed
// by both is refused, with both values; a save into a deleted item says so and keeps the text.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { formByAction } from '../helpers/html';
import { loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';
const HX = { 'HX-Request': 'true' };

async function open(get: (p: string) => Response | Promise<Response>, page: string, action: string) {
  return formByAction(await (await get(page)).text(), action).fields;
}

describe('merging edits from forms loaded at an older version', () => {
  it('two people edit different fields of one stage form: both saves apply', async () => {
    const { get, post, database } = await demoApp();
    const action = `/projects/${ID}/stages/st-drv`;
    const a = await open(get, action, action);
    const b = await open(get, action, action);
    expect(a.version).toBe(b.version);
    expect((await post(action, { ...a, notes: 'Bias set for 60 mA idle' })).status).toBe(303);
    const res = await post(action, { ...b, name: 'Driver (2N3866)' }, HX);
    expect(res.status).toBe(200);
    expect(await res.text()).toContain('Saved.');
    const stage = (await loadProject(database.db, ID))!.stages.find((s) => s.id === 'st-drv')!;
    expect(stage.notes).toBe('Bias set for 60 mA idle');
    expect(stage.name).toBe('Driver (2N3866)');
  });

  it('a save on one page applies after saves on other pages of the same project', async () => {
    const { get, post, database } = await demoApp();
    const settings = await open(get, `/projects/${ID}`, `/projects/${ID}/settings`);
    const rf = await open(get, `/projects/${ID}/rf`, `/projects/${ID}/rf/settings`);
    const loads = await open(get, `/projects/${ID}`, `/projects/${ID}/stages/st-rx/loads`);
    expect((await post(`/projects/${ID}/rf/settings`, { ...rf, worstSwr: '2.5' })).status).toBe(303);
    expect((await post(`/projects/${ID}/stages/st-rx/loads`, { ...loads, l0_receive: '60 mA' })).status).toBe(303);
    expect((await post(`/projects/${ID}/settings`, { ...settings, kits: '12' })).status).toBe(303);
    const p = (await loadProject(database.db, ID))!;
    expect(p.kits).toBe(12);
    expect(p.rf.worstSwr).toBe(2.5);
    expect(p.stages.find((s) => s.id === 'st-rx')!.loads[0].currentA.receive).toBeCloseTo(0.06, 12);
    expect(p.version).toBe(Number(settings.version) + 3);
  });

  it('the same field changed by both is refused with both values; the re-shown form keeps the other ' +
    'change', async () => {
    const { get, post, database } = await demoApp();
    const action = `/projects/${ID}/settings`;
    const a = await open(get, `/projects/${ID}`, action);
    const b = await open(get, `/projects/${ID}`, action);
    expect((await post(action, { ...a, name: 'Club 30 m build', kits: '10' })).status).toBe(303);
    const res = await post(action, { ...b, name: 'Thirty metre club rig' }, HX);
    expect(res.status).toBe(409);
    const html = await res.text();
    expect(html).toContain(
      'Changed by someone else to “Club 30 m build” since you opened this page; you typed “Thirty metre club ' +
        'rig”',
    );
    const shown = formByAction(html, action).fields;
    expect(shown.name).toBe('Thirty metre club rig'); // the typed text is kept
    expect(shown.kits).toBe('10'); // the other person's change is shown, so saving again does not undo it
    const stored = (await loadProject(database.db, ID))!;
    expect(stored.name).toBe('Club 30 m build');
    expect(shown.version).toBe(String(stored.version));
    // saving the re-shown form applies the user's name and keeps the other change
    expect((await post(action, shown)).status).toBe(303);
    const after = (await loadProject(database.db, ID))!;
    expect(after.name).toBe('Thirty metre club rig');
    expect(after.kits).toBe(10);
  });

  it('a form older than every kept snapshot is refused as before (409), with the entries kept', async () => {
    const { get, post } = await demoApp();
    const action = `/projects/${ID}/rf/settings`;
    const f = await open(get, `/projects/${ID}/rf`, action);
    const res = await post(action, { ...f, version: '999', worstSwr: '3' }, HX);
    expect(res.status).toBe(409);
    const html = await res.text();
    expect(html).toContain('changed in another tab or window');
    expect(formByAction(html, action).fields.worstSwr).toBe('3');
  });

  it('a save into a part deleted in another window says so, shows the typed text and changes nothing', async () => {
    const { get, post, database } = await demoApp();
    const page = `/projects/${ID}/parts`;
    const action = `/projects/${ID}/parts/p-pcb`;
    const part = await open(get, `${page}?open=p-pcb`, action);
    // the PCB is on the parts list, so take it off first, then delete it (as another window would)
    let p = (await loadProject(database.db, ID))!;
    for (const line of p.bom.filter((l) => l.partId === 'p-pcb')) {
      p = (await loadProject(database.db, ID))!;
      expect((await post(`/projects/${ID}/bom/lines/${line.id}/delete`, { version: String(p.version) })).status).toBe(
        303,
      );
    }
    p = (await loadProject(database.db, ID))!;
    expect((await post(`/projects/${ID}/parts/p-pcb/delete`, { version: String(p.version) })).status).toBe(303);
    const before = (await loadProject(database.db, ID))!;
    for (const headers of [{}, HX]) {
      const res = await post(action, { ...part, description: 'PCB rev C, gold flash' }, headers);
      expect(res.status).toBe(409);
      const html = await res.text();
      expect(html).toContain('no longer exists');
      expect(html).toContain('>PCB rev C, gold flash</textarea>');
    }
    expect(await loadProject(database.db, ID)).toEqual(before);
  });
});
