// A stage's load row can create the rail it draws from: "(a new rail, named below)" with the new rail's name and
// source on the stage form adds the rail (typical values, as the supply page's Add rail does) and the load on it.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { loadProject } from '../../src/db/projects';
import { formByAction } from '../helpers/html';
import { NEW_RAIL, NEW_RAIL_FORM } from '../../src/core/edits/rail-in-place';
import { loadFormName } from '../../src/core/spec/stage';

const ID = 'demo-club-30m';
const action = `/projects/${ID}/stages/st-keyer`;

describe('a new rail from the stage form', () => {
  it('adds the rail fed from the chosen rail and puts the new row on it', async () => {
    const { get, post, database } = await demoApp();
    const fields = formByAction(await (await get(action)).text(), action).fields;
    const before = (await loadProject(database.db, ID))!;
    // the keyer already draws from the 13.8 V rail (row 0); row 1 is the empty new row
    const res = await post(action, {
      ...fields,
      [loadFormName(1, 'railId')]: NEW_RAIL,
      [loadFormName(1, 'currentA.receive')]: '5',
      [loadFormName(1, 'currentA.keyUp')]: '5',
      [loadFormName(1, 'currentA.keyDown')]: '5',
      [NEW_RAIL_FORM.name]: '5 V keyer rail',
      [NEW_RAIL_FORM.source]: 'r:rail-13v8',
    });
    expect(res.status).toBe(303);
    const after = (await loadProject(database.db, ID))!;
    expect(after.supply.rails.length).toBe(before.supply.rails.length + 1);
    const rail = after.supply.rails.at(-1)!;
    expect(rail).toMatchObject({ kind: 'regulated', name: '5 V keyer rail', parentId: 'rail-13v8' });
    const keyer = after.stages.find((s) => s.id === 'st-keyer')!;
    // 5 in a mA box is 5 mA
    expect(keyer.loads.at(-1)).toEqual({ railId: rail.id, currentA: { receive: 0.005, keyUp: 0.005, keyDown: 0.005 } });
  });

  it('refuses a new rail without a name by naming the field, and saves nothing', async () => {
    const { get, post, database } = await demoApp();
    const fields = formByAction(await (await get(action)).text(), action).fields;
    const before = await loadProject(database.db, ID);
    const res = await post(action, {
      ...fields,
      [loadFormName(1, 'railId')]: NEW_RAIL,
      [NEW_RAIL_FORM.name]: ' ',
      [NEW_RAIL_FORM.source]: 'battery',
    });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain('New rail: Rail name must not be empty');
    expect(await loadProject(database.db, ID)).toEqual(before);
  });

  it('leaves the supply alone when no row chooses a new rail', async () => {
    const { get, post, database } = await demoApp();
    const fields = formByAction(await (await get(action)).text(), action).fields;
    const before = (await loadProject(database.db, ID))!;
    const res = await post(action, { ...fields, notes: 'changed', [NEW_RAIL_FORM.name]: 'ignored rail' });
    expect(res.status).toBe(303);
    expect((await loadProject(database.db, ID))!.supply.rails).toEqual(before.supply.rails);
  });
});
