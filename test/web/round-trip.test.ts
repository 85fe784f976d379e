// Form -> stored -> form: a value entered through a form, shown again and saved unchanged, stays the same
// number (no rounding to the short display form) and notes keep their indentation.
import { describe, it, expect } from 'vitest';
import { demoApp } from '../helpers/app';
import { formByAction } from '../helpers/html';
import { loadProject } from '../../src/db/projects';
import { inputText, percentText } from '../../src/web/input-text';

const ID = 'demo-club-30m';

describe('edit round trip', () => {
  it('settings typed with seven significant digits survive a second save of the unchanged form', async () => {
    const { get, post, database } = await demoApp();
    const action = `/projects/${ID}/settings`;
    const first = formByAction(await (await get(`/projects/${ID}`)).text(), action);
    const typed = {
      ...first.fields,
      frequency: '10.106125 MHz',
      power: '12.34567 W',
      duty: '12.34567',
      mainsLow: '7.654321',
      notes: '  indented first line\n    and a second',
    };
    expect((await post(action, typed)).status).toBe(303);
    const saved = (await loadProject(database.db, ID))!;
    // the values as typed (exact decimal parse of the text above)
    expect(saved.frequencyHz).toBe(10.106125 * 1e6);
    expect(saved.notes).toBe('  indented first line\n    and a second');

    const shown = formByAction(await (await get(`/projects/${ID}`)).text(), action);
    // the box is in MHz now (the unit stands beside it, from the settings spec), so the text is the bare number
    expect(shown.fields.frequency).toBe('10.106125');
    expect(shown.fields.notes).toBe('  indented first line\n    and a second');
    expect((await post(action, shown.fields)).status).toBe(303);
    const again = (await loadProject(database.db, ID))!;
    expect(again.version).toBe(saved.version + 1);
    for (const k of ['frequencyHz', 'targetPowerW', 'keyingDuty', 'notes'] as const) expect(again[k]).toBe(saved[k]);
    expect(again.mains!.lowFraction).toBe(saved.mains!.lowFraction);
  });

  it('input text keeps the short form when it is exact and adds digits only when needed', () => {
    expect(inputText(10.11e6, 'Hz')).toBe('10.11 MHz');
    expect(inputText(10_106_125, 'Hz')).toBe('10.106125 MHz');
    expect(inputText(4.7e-6, 'F')).toBe('4.7 µF');
    expect(inputText(23.456789, '°C')).toBe('23.456789');
    expect(inputText(null, 'A')).toBe('');
    expect(percentText(0.1)).toBe('10');
    expect(percentText(0.07654321)).toBe('7.654321');
  });
});
