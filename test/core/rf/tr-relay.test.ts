import { describe, expect, it } from 'vitest';
import type { Stage } from '../../../src/core/model';
import { dotLengthS, evaluateRelay, lineMaxima, relayCoilLoads } from '../../../src/core/rf/tr-relay';
import { relayParams } from './fixture';
import { near } from './helpers';

const toleranceV = 0.1;
const toleranceA = 0.005;

describe('line maxima (REFERENCE-VALUES §9 worked values)', () => {
  it('100 W, S = 3: 173.2 V peak, 2.449 A rms, 3.46 A peak', () => {
    const m = lineMaxima(100, 50, 3);
    near(m.rmsV, 122.5, toleranceV, 'Vrms');
    near(m.peakV, 173.2, toleranceV, 'Vpk');
    near(m.rmsA, 2.449, toleranceA, 'Irms');
    near(m.peakA, 3.46, toleranceA, 'Ipk');
  });
  it('25 W at S = 2 and 3; 100 W matched', () => {
    near(lineMaxima(25, 50, 2).peakV, 70.7, toleranceV, '25 W S2');
    near(lineMaxima(25, 50, 2).rmsA, 1.0, toleranceA, '25 W S2 I');
    near(lineMaxima(25, 50, 3).peakV, 86.6, toleranceV, '25 W S3');
    near(lineMaxima(25, 50, 3).rmsA, 1.225, toleranceA, '25 W S3 I');
    near(lineMaxima(100, 50, 1).rmsV, 70.7, toleranceV, '100 W matched');
  });
  it('agrees with the forward-power derivation (|Γ| = (S-1)/(S+1))', () => {
    for (const s of [1.5, 2, 4]) {
      const g = (s - 1) / (s + 1);
      const pf = 100 / (1 - g * g);
      near(lineMaxima(100, 50, s).rmsV, Math.sqrt(pf * 50) * (1 + g), 1e-9, `S=${s}`);
    }
  });
});

describe('relay checks', () => {
  it('dot length 1.2/WPM (PARIS word convention, 50 dot units a word): 60 ms at 20 WPM', () => {
    // 20 words/min x 50 units = 1000 units/min -> 60 s / 1000 = 0.060 s per dot
    near(dotLengthS(20), 0.06, 1e-12, 'dot');
  });
  it('hot switching when the TX delay is shorter than operate + bounce', () => {
    const r = evaluateRelay(relayParams({ txDelayS: 0.003 }), {
      powerW: 10,
      swr: 2,
      harmonicAmplitudeSum: 0.6,
      subject: 'T/R',
    });
    expect(r.findings.find((f) => f.rule === 'relay.hot-switch')?.severity).toBe('fail');
    const ok = evaluateRelay(relayParams({ txDelayS: 0.008 }), {
      powerW: 10,
      swr: 2,
      harmonicAmplitudeSum: 0.6,
      subject: 'T/R',
    });
    expect(ok.findings.find((f) => f.rule === 'relay.hot-switch')?.severity).toBe('ok');
  });
  it('before the filter the peak bound includes harmonics; isolation gives receiver power', () => {
    const r = evaluateRelay(relayParams({ position: 'before-lpf', isolationDb: 30 }), {
      powerW: 10,
      swr: 2,
      harmonicAmplitudeSum: 0.6,
      subject: 'T/R',
    });
    near(r.peakWithHarmonicsV as number, lineMaxima(10, 50, 2).peakV * 1.6, 1e-9, 'bound');
    near(r.receiverPowerW, 0.01, 1e-12, '10 W - 30 dB');
  });
  it('coil loads per mode for the supply budget', () => {
    const st: Stage = {
      id: 't',
      kind: 'tr',
      name: 'T/R',
      notes: '',
      loads: [],
      dissipationW: null,
      relay: relayParams(),
    };
    expect(relayCoilLoads(st)).toEqual({
      ok: true,
      load: { railId: 'sig', currentA: { receive: 0, keyUp: 0.03, keyDown: 0.03 } },
    });
    expect(relayCoilLoads({ ...st, relay: undefined })).toEqual({ ok: true, load: null });
    expect(relayCoilLoads({ ...st, relay: relayParams({ coilA: 0, coilRailId: null }) })).toEqual({
      ok: true,
      load: null,
    });
  });
  it('a coil drawing current from no rail, from a missing rail, or with a refused current is a fail finding', () => {
    const st: Stage = {
      id: 't',
      kind: 'tr',
      name: 'T/R',
      notes: '',
      loads: [],
      dissipationW: null,
      relay: relayParams(),
    };
    const subjects = (r: ReturnType<typeof relayCoilLoads>) =>
      r.ok ? [] : r.findings.map((f) => `${f.severity} ${f.subject}`);
    expect(subjects(relayCoilLoads({ ...st, relay: relayParams({ coilRailId: null }) }))).toEqual([
      'fail T/R: relay coil rail',
    ]);
    expect(subjects(relayCoilLoads(st, new Set(['other'])))).toEqual(['fail T/R: relay coil rail']);
    expect(subjects(relayCoilLoads({ ...st, relay: relayParams({ coilA: -0.03 }) }))).toEqual([
      'fail T/R: relay coil current',
    ]);
    expect(subjects(relayCoilLoads({ ...st, relay: relayParams({ coilA: NaN }) }))).toEqual([
      'fail T/R: relay coil current',
    ]);
  });
});

describe('relay DC contacts and isolation limits', () => {
  it('DC current above the switching rating fails; leakage above the receiver maximum fails', () => {
    const r = evaluateRelay(
      relayParams({ dcSwitchedA: 1.5, contactSwitchA: 1, isolationDb: 20, receiverMaxInputW: 0.02 }),
      { powerW: 10, swr: 1.5, harmonicAmplitudeSum: 0, subject: 'T/R' },
    );
    expect(r.findings.find((f) => f.rule === 'relay.dc-contacts')?.severity).toBe('fail');
    // 10 W - 20 dB = 100 mW > 20 mW
    near(r.receiverPowerW, 0.1, 1e-12, 'leak');
    expect(r.findings.find((f) => f.rule === 'relay.isolation')?.severity).toBe('fail');
  });
  it('invalid relay parameters become fail findings with zeroed numbers', () => {
    const r = evaluateRelay(relayParams({ wpm: 0 }), { powerW: 10, swr: 2, harmonicAmplitudeSum: 0, subject: 'T/R' });
    expect(r.findings.every((f) => f.severity === 'fail')).toBe(true);
    expect(r.findings[0].subject).toContain('wpm');
  });
});
