// The project settings, RF settings and new-project forms through the app: a bad value is refused naming the field
// (page and htmx swap), what was typed is kept and nothing is saved; the page's own text saves back unchanged.
// Limits are the specs' (src/core/spec/settings.ts, rf-settings.ts); no expected value comes from running the program.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { formByAction } from '../helpers/html';
import { listProjects, loadProject } from '../../src/db/projects';

const IDS = ['demo-club-30m', 'demo-portable-20m'];
// the full page (no JavaScript) and the htmx swap
const PAGE_AND_SWAP: Record<string, string>[] = [{}, { 'HX-Request': 'true' }];

describe('project settings form', () => {
  for (const id of IDS) {
    it(`${id}: the form as shown saves back without changing the project`, async () => {
      const { get, post, database } = await demoApp();
      const before = (await loadProject(database.db, id))!;
      for (const [page, action] of [
        [`/projects/${id}`, `/projects/${id}/settings`],
        [`/projects/${id}/rf`, `/projects/${id}/rf/settings`],
      ]) {
        const form = formByAction(await (await get(page)).text(), action);
        const res = await post(action, form.fields);
        expect(res.status, action).toBe(303);
      }
      const after = (await loadProject(database.db, id))!;
      expect({ ...after, version: before.version }).toEqual(before);
    });
  }

  it.each([
    ['frequency', '70', 'Operating frequency must be at least 100 kHz and at most 60 MHz'],
    ['power', '0', 'Target RF output must be at least 1 mW and at most 2 kW'],
    ['mainsHz', '5', 'Mains frequency must be at least 40 Hz and at most 500 Hz'],
    ['ambient', '85', 'Ambient temperature must be at least -40 °C and at most 70 °C'],
    ['duty', '140', 'Keying duty (heating) must be at least 0 % and at most 100 %'],
    ['kits', '2.5', 'Kits to build must be a whole number'],
    ['currency', 'euro', 'Project currency must be a three-letter code such as USD or EUR'],
  ])('%s = "%s" is refused naming the field, kept as typed, nothing saved', async (field, typed, message) => {
    const { get, post, database } = await demoApp();
    const id = IDS[0];
    const action = `/projects/${id}/settings`;
    const form = formByAction(await (await get(`/projects/${id}`)).text(), action);
    const before = await loadProject(database.db, id);
    for (const headers of PAGE_AND_SWAP) {
      const res = await post(action, { ...form.fields, [field]: typed }, headers);
      expect(res.status).toBe(422);
      const html = await res.text();
      expect(html).toContain(message);
      expect(html).toContain(`name="${field}" type="text" value="${typed}"`);
    }
    expect(await loadProject(database.db, id)).toEqual(before);
  });

  it('a battery station saves with the mains boxes empty; choosing mains then asks for them', async () => {
    const { get, post, database } = await demoApp();
    const id = IDS[1];
    const action = `/projects/${id}/settings`;
    const form = formByAction(await (await get(`/projects/${id}`)).text(), action);
    const empty = { ...form.fields, mainsV: '', mainsHz: '', mainsLow: '', mainsHigh: '' };
    expect((await post(action, { ...empty, supplyKind: 'dc' })).status).toBe(303);
    expect((await loadProject(database.db, id))!.mains).toBeNull();
    const before = await loadProject(database.db, id);
    const res = await post(action, { ...empty, version: String(before!.version), supplyKind: 'mains' });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain(
      'Mains nominal voltage is empty: enter a value (or choose a battery / DC supply)',
    );
    expect(await loadProject(database.db, id)).toEqual(before);
  });
});

describe('RF settings form', () => {
  it.each([
    // 30 dB is the one feedline-loss limit now (the form allowed 100 dB, core 30 dB)
    ['feedlineLoss', '31', 'Feedline loss must be at least 0 dB and at most 30 dB'],
    ['worstSwr', '0.5', 'Worst-case SWR must be at least 1 and at most 100'],
    ['antennaGain', '45 dBi', 'Antenna gain must be at least -30 dBi and at most 30 dBi'],
    ['evenHarmonic', '10', '2nd-harmonic balance residual must be at least -120 dBc and at most 0 dBc'],
    ['dutyFactor', '120', 'Mode duty factor must be at least 0 % and at most 100 %'],
    ['onFraction', '-5', 'Worst share of the averaging time on the air must be at least 0 % and at most 100 %'],
  ])('%s = "%s" is refused naming the field, kept as typed, nothing saved', async (field, typed, message) => {
    const { get, post, database } = await demoApp();
    const id = IDS[0];
    const action = `/projects/${id}/rf/settings`;
    const form = formByAction(await (await get(`/projects/${id}/rf`)).text(), action);
    const before = await loadProject(database.db, id);
    for (const headers of PAGE_AND_SWAP) {
      const res = await post(action, { ...form.fields, [field]: typed }, headers);
      expect(res.status).toBe(422);
      const html = await res.text();
      expect(html).toContain(message);
      expect(html).toContain(`value="${typed}"`);
    }
    expect(await loadProject(database.db, id)).toEqual(before);
  });

  it('levels typed with their reference ("-25 dBc", "6 dBi") are read as dB', async () => {
    const { get, post, database } = await demoApp();
    const id = IDS[0];
    const action = `/projects/${id}/rf/settings`;
    const form = formByAction(await (await get(`/projects/${id}/rf`)).text(), action);
    expect((await post(action, { ...form.fields, evenHarmonic: '-25 dBc', antennaGain: '6 dBi' })).status).toBe(303);
    const rf = (await loadProject(database.db, id))!.rf;
    expect([rf.evenHarmonicDbc, rf.antennaGainDbi]).toEqual([-25, 6]);
  });
});

describe('new project form', () => {
  it.each([
    ['power', '0', 'Target RF output must be at least 1 mW and at most 2 kW'],
    ['band', '100', 'Band must be at least 100 kHz and at most 60 MHz'],
    ['mains', '240-50', 'Supply: choose one of'],
  ])('%s = "%s" is refused naming the field, nothing created', async (field, typed, message) => {
    const { post, database } = await demoApp();
    const res = await post('/projects', { name: 'Forty', band: '7.03', power: '5 W', mains: '230-50', [field]: typed });
    expect(res.status).toBe(422);
    expect(await res.text()).toContain(message);
    expect((await listProjects(database.db)).length).toBe(2);
  });

  it('creates a battery project on the chosen band with the spec defaults', async () => {
    const { post, database } = await demoApp();
    const res = await post('/projects', { name: 'Forty', band: '7.03', power: '5 W', mains: 'battery' });
    expect(res.status).toBe(303);
    const id = res.headers.get('location')!.split('/').pop()!;
    const p = (await loadProject(database.db, id))!;
    expect([p.frequencyHz, p.targetPowerW, p.mains]).toEqual([7.03e6, 5, null]);
    // Source: FCC OET Bulletin 65 Supplement B (1997), Table 2: conversational CW duty factor 40 %
    expect(p.keyingDuty).toBe(0.4);
  });
});
