// Another process holds the database's write lock for longer than a save will wait (here: a second connection
// in this test holding BEGIN IMMEDIATE). The save is retried, then answered 503 "busy, nothing saved, try
// again" with the typed entries kept, never a 500 page; reads still work meanwhile (WAL); once the lock is
// released, pages show what other processes committed and the same save goes through.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createClient, type Client, type Transaction } from '@libsql/client';
import { makeApp, postForm, rowCounts, type TestApp } from '../helpers/test-app';
import { formByAction } from '../helpers/html';
import { loadProject } from '../../src/db/projects';

const ID = 'demo-club-30m';
const ACTION = `/projects/${ID}/rf/settings`;
let t: TestApp;
let holder: Client;
let lock: Transaction;

beforeAll(async () => {
  // short waits so the test does not sit out the production retry window
  t = await makeApp({ db: { busyTimeoutMs: 20, retryForMs: 200 } });
  holder = createClient({ url: `file:${t.dbPath}` });
}, 60_000);
afterAll(() => {
  holder?.close();
  t?.close();
});

describe('a write that meets a lock held by another process', () => {
  it('is answered 503 with the entries kept and nothing saved; after the lock goes, it saves', async () => {
    const form = formByAction(await (await t.app.request(`http://localhost/projects/${ID}/rf`)).text(), ACTION).fields;
    const fields = { ...form, worstSwr: '3.3' };
    lock = await holder.transaction('write');
    const before = await rowCounts(t.database);
    const stored = await loadProject(t.database.db, ID);

    // a read still works while the lock is held
    expect((await t.app.request(`http://localhost/projects/${ID}`)).status).toBe(200);

    const swap = await postForm(t.app, ACTION, fields, { 'HX-Request': 'true' });
    expect(swap.status).toBe(503);
    const swapHtml = await swap.text();
    expect(swapHtml).toContain('The database is busy; nothing was saved. Try again.');
    expect(formByAction(swapHtml, ACTION).fields.worstSwr).toBe('3.3');

    const page = await postForm(t.app, ACTION, fields);
    expect(page.status).toBe(503);
    const pageHtml = await page.text();
    expect(pageHtml.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(pageHtml).toContain('The database is busy; nothing was saved. Try again.');
    expect(formByAction(pageHtml, ACTION).fields.worstSwr).toBe('3.3');

    await lock.rollback();
    expect(await rowCounts(t.database)).toEqual(before);
    expect(await loadProject(t.database.db, ID)).toEqual(stored);

    // a change another process commits now is what the next page shows (no connection kept an old snapshot)
    await holder.execute({
      sql: 'UPDATE projects SET name = ?, version = version + 1 WHERE id = ?',
      args: ['Renamed elsewhere', ID],
    });
    const fresh = await t.app.request(`http://localhost/projects/${ID}/rf`);
    expect(fresh.status).toBe(200);
    expect(await fresh.text()).toContain('Renamed elsewhere');

    // the same entries saved again (the form's version is now one behind: the rename merges with it)
    const retry = await postForm(t.app, ACTION, fields);
    expect(retry.status).toBe(303);
    const after = (await loadProject(t.database.db, ID))!;
    expect(after.rf.worstSwr).toBe(3.3);
    expect(after.name).toBe('Renamed elsewhere');
  }, 60_000);
});
