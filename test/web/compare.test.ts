// Variants, the comparison page and the sweep page through app.request: the link a variant keeps, differences said in
// words, bad sweep inputs refused by name with the typed text shown back and nothing stored.
import { describe, it, expect } from 'vitest';
import { demoApp, ORIGIN } from '../helpers/app';
import { changeProject, listProjects, loadProject } from '../../src/db/projects';
import { unescapeHtml } from '../helpers/html';

const CLUB = 'demo-club-30m';
const PORTABLE = 'demo-portable-20m';
const NOW = '2026-12-01T12:00:00.000Z';

async function withVariant() {
  const t = await demoApp();
  const res = await t.post(`/projects/${CLUB}/variant`, {});
  expect(res.status).toBe(303);
  const variant = (await listProjects(t.database.db)).find((p) => p.variantOf === CLUB)!;
  return { ...t, variantId: variant.id };
}

const text = async (r: Response) => unescapeHtml(await r.text());

describe('clone as variant', () => {
  it('makes a copy that names its original, shown on the list', async () => {
    const { database, get, variantId } = await withVariant();
    const v = (await loadProject(database.db, variantId))!;
    expect(v.variantOf).toBe(CLUB);
    expect(v.name).toBe(`Variant of ${(await loadProject(database.db, CLUB))!.name}`);
    expect(await text(await get('/'))).toContain('(variant of Club build');
  });

  it('keeps the link through export and import while the original exists, drops it when it does not', async () => {
    const { app, database, get, post, variantId } = await withVariant();
    const exported = await (await get(`/projects/${variantId}/export.json`)).text();
    expect(JSON.parse(exported).project.variantOf).toBe(CLUB);
    const upload = () => {
      const form = new FormData();
      form.set('file', new File([exported], 'v.json', { type: 'application/json' }));
      return app.request(`${ORIGIN}/import`, { method: 'POST', body: form, headers: { Origin: ORIGIN } });
    };
    expect((await upload()).status).toBe(303);
    const linked = (await listProjects(database.db)).filter((p) => p.variantOf === CLUB);
    expect(linked.length).toBe(2);
    // deleting the original leaves its variants standing alone
    const club = (await loadProject(database.db, CLUB))!;
    expect((await post(`/projects/${CLUB}/delete`, { version: String(club.version) })).status).toBe(303);
    expect((await loadProject(database.db, variantId))!.variantOf).toBeUndefined();
    expect((await upload()).status).toBe(303);
    expect((await listProjects(database.db)).every((p) => p.variantOf === null)).toBe(true);
  });
});

describe('compare page', () => {
  it('a project’s Compare link opens it beside its original', async () => {
    const { get, variantId } = await withVariant();
    const res = await get(`/projects/${variantId}/compare`);
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe(`/compare?p1=${CLUB}&p2=${variantId}`);
  });

  it('an unchanged variant differs in nothing; a bigger PA reservoir shows as a difference in words', async () => {
    const { database, get, variantId } = await withVariant();
    const same = await text(await get(`/compare?p1=${CLUB}&p2=${variantId}`));
    expect(same).toContain('No figure differs.');
    expect(same).not.toContain('≠ differs');
    await changeProject(
      database,
      variantId,
      (p) => ({
        ...p,
        supply: {
          ...p.supply,
          rails: p.supply.rails.map((r) =>
            r.kind === 'rectified' && r.name.startsWith('PA rail') ? { ...r, reservoirF: 0.0136 } : r,
          ),
        },
      }),
      NOW,
    );
    const html = await text(await get(`/compare?p1=${CLUB}&p2=${variantId}`));
    const row = /<tr class="differs" data-key="trough:PA rail[^"]*">([\s\S]*?)<\/tr>/.exec(html);
    expect(row, 'the PA rail row is marked as differing').not.toBeNull();
    expect(row![1]).toContain('≠ differs');
    // twice the reservoir, less ripple, a higher trough: better (hand reasoning, see test/core/compare)
    expect(row![1]).toMatch(/\+\d+\.\d\d V, better/);
    expect(html).toMatch(/\d+ of \d+ figures differ/);
  });

  it('three projects: the battery portable has no transformer, said in words', async () => {
    const { get, variantId } = await withVariant();
    const html = await text(await get(`/compare?p1=${CLUB}&p2=${PORTABLE}&p3=${variantId}`));
    const row = /<tr class="differs" data-key="transformerVA">([\s\S]*?)<\/tr>/.exec(html)!;
    expect(row[1]).toContain('no mains transformer');
    expect(row[1]).toContain('not in this one');
  });

  it.each([
    [`p1=${CLUB}&p2=nope`, 'Second: there is no project "nope"'],
    [`p2=${CLUB}`, 'First (reference): choose a project'],
  ])('%s is refused by name', async (q, says) => {
    const { get } = await demoApp();
    const res = await get(`/compare?${q}`);
    expect(res.status).toBe(422);
    expect(await text(res)).toContain(says);
  });

  it('one project (its list link when it has no variants) asks for a second, without an error', async () => {
    const { get } = await demoApp();
    const redirect = await get(`/projects/${PORTABLE}/compare`);
    expect(redirect.headers.get('location')).toBe(`/compare?p1=${PORTABLE}`);
    const res = await get(`/compare?p1=${PORTABLE}`);
    expect(res.status).toBe(200);
    const html = await text(res);
    expect(html).toContain('Choose a second project to compare with.');
    expect(html).toMatch(/<option value="demo-portable-20m" selected/);
  });
});

describe('sweep page', () => {
  it('offers five plain GET forms, prefilled round the item the PA depends on; a missing item is said', async () => {
    const { get } = await demoApp();
    const html = await text(await get(`/projects/${CLUB}/sweep`));
    expect(html.match(/<form method="get" action="\/projects\/demo-club-30m\/sweep"/g)?.length).toBe(5);
    expect(html).toMatch(/<option value="rail-pa" selected/);
    const portable = await text(await get(`/projects/${PORTABLE}/sweep`));
    expect(portable).toContain('Not available: this project has no mains supply');
  });

  it('plots the margins and lists every point', async () => {
    const { get } = await demoApp();
    const res = await get(`/projects/${CLUB}/sweep?param=reservoirF&target=rail-pa&from=2200&to=15000&points=5`);
    expect(res.status).toBe(200);
    const html = await text(res);
    expect(html).toContain('<svg');
    expect(html).toContain('limit (0 V)');
    const body = /<table class="sweep-table">[\s\S]*?<tbody>([\s\S]*?)<\/tbody>/.exec(html)![1];
    // 2200 to 15000 µF in 5 points: 2200, 5400, 8600, 11800, 15000 (step 3200)
    expect([...body.matchAll(/<th scope="row">([^<]*)<\/th>/g)].map((m) => m[1])).toEqual([
      '2200',
      '5400',
      '8600',
      '11800',
      '15000',
    ]);
  });

  it.each([
    ['param=reservoirF&target=rail-pa&from=abc&to=15000&points=5', 'From (reservoir capacitance)', 'abc'],
    [
      'param=reservoirF&target=rail-pa&from=9000&to=3000&points=5',
      'To (reservoir capacitance) must be above From',
      '3000',
    ],
    ['param=mainsV&target=mains&from=100&to=140&points=40', 'Points', '40'],
    ['param=reservoirF&target=rail-13v8&from=1000&to=3000&points=3', 'Item to vary: there is no such item', null],
    ['param=voltage&from=1&to=2&points=3', 'Parameter: "voltage" is not one that can be swept', null],
  ])('%s is refused by name, the typed text kept, nothing stored', async (q, says, typed) => {
    const { database, get } = await demoApp();
    const before = await loadProject(database.db, CLUB);
    const res = await get(`/projects/${CLUB}/sweep?${q}`);
    expect(res.status).toBe(422);
    const html = await text(res);
    expect(html).toContain(says);
    if (typed) expect(html).toContain(`value="${typed}"`);
    expect(await loadProject(database.db, CLUB)).toEqual(before);
  });

  it('the portable cannot sweep mains: refused by name', async () => {
    const { get } = await demoApp();
    const res = await get(`/projects/${PORTABLE}/sweep?param=mainsV&target=&from=100&to=140&points=3`);
    expect(res.status).toBe(422);
    expect(await text(res)).toContain('Item to vary: this project has no mains supply');
  });
});
