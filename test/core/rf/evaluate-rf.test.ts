import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Finding } from '../../../src/core/findings';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { lineMaxima } from '../../../src/core/rf/tr-relay';
import { lpfParams, paParams, project, relayParams } from './fixture';
import { near, nonFinitePaths } from './helpers';
import { propertyOptions } from '../../helpers/property';

const RANK = { fail: 0, caution: 1, ok: 2 } as const;
/** Finding messages that print a non-finite number. */
const nonFiniteText = (f: Finding[]) => f.map((x) => x.message).filter((m) => /Infinity|NaN/.test(m));
const sorted = (f: Finding[]) => f.every((x, i) => i === 0 || RANK[f[i - 1].severity] <= RANK[x.severity]);

describe('evaluateRf on a 40 m push-pull rig', () => {
  const p = project();
  const r = evaluateRf(p, { paRailV: { pa: 13.8 } });
  it('has a result per RF stage and JSON-friendly values', () => {
    expect(r.stages.map((s) => s.kind)).toEqual(['final', 'lpf', 'tr']);
    expect(nonFinitePaths(r)).toEqual([]);
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(sorted(r.findings)).toBe(true);
  });
  it('the PA designs a practical ratio near 10 W (textbook push-pull load line: 4:5 gives 10.24 W)', () => {
    const pa = r.stages[0].pa!;
    expect(pa.turnsRatio).toBe(1.25);
    // Source: REFERENCE-VALUES §8.3 sinusoidal push-pull model, class C: P = 2 (13.8 - 1)^2 / 32
    near(pa.outputW, 10.24, 0.01, 'P');
  });
  it('harmonics table uses the as-built filter and passes 43 dB for this design', () => {
    expect(r.harmonics!.rows).toHaveLength(4);
    expect(r.harmonics!.rows.every((x) => x.marginDb > 0)).toBe(true);
    expect(r.harmonics!.rows.every((x) => x.worstMarginDb !== null)).toBe(true);
  });
  it('relay voltage at SWR 2: the standing-wave maximum of a lossless line, written out here (not the ' +
    'code under test)', () => {
    const relay = r.stages[2].relay!;
    // Source: transmission-line theory (textbook): V_max,rms = sqrt(P Z0 S), peak = sqrt(2 P Z0 S); Z0 = 50 ohm, S = 2
    // at the most the stage delivers as built (the larger of its saturated drive at the highest supply, the band's
    // ratio times hotOutputW, and the most round the SWR circle) less the filter's loss
    const pa = r.stages[0].pa!;
    const sat = (pa.waveform!.bandMaxOutputW / pa.waveform!.designOutputW) * pa.hotOutputW;
    const most = Math.max(sat, pa.swr?.maxOutput.value ?? 0, pa.hotOutputW);
    const stressW = most * (r.outputPowerW / pa.outputW);
    near(relay.rfPeakV, Math.sqrt(2 * stressW * 50 * 2), 1e-9, 'Vpk');
    // Worked value for 25 W at S = 2 (sqrt(2 x 25 x 50 x 2) = sqrt(5000) = 70.71 V
    // peak), against the helper the RF code uses
    near(lineMaxima(25, 50, 2).peakV, 70.71, 0.005, 'Vpk 25 W');
  });
  it('consistency check (no external reference): exposure uses the most delivered power and always cautions', () => {
    near(r.exposure!.peakPowerW, r.stages[0].pa!.hotOutputW * (r.outputPowerW / r.stages[0].pa!.outputW), 1e-9, 'P');
    expect(r.findings.some((f) => f.rule === 'exposure.local-rules')).toBe(true);
  });
  it('missing PA rail voltage is a fail finding', () => {
    const x = evaluateRf(p, { paRailV: {} });
    expect(x.findings.some((f) => f.rule === 'pa.input' && f.severity === 'fail')).toBe(true);
    expect(nonFinitePaths(x)).toEqual([]);
  });
  it('a PA rail of 1.5e-322 V (subnormal) is refused with a finding, not turned into Infinity (regression)', () => {
    // Found by the corruption property below: with saturationV 0 the rail passed `railV > 0` and the bias heat
    // 0.05 A x 1.5e-322 V made the heatsink quotient (Tj,target - Ta) / P infinite.
    const base = project();
    const x = evaluateRf(
      project({ stages: [{ ...base.stages[0], pa: paParams({ saturationV: 0 }) }, base.stages[1], base.stages[2]] }),
      { paRailV: { pa: 1.5e-322 } },
    );
    expect(nonFinitePaths(x)).toEqual([]);
    expect(
      x.findings.some((f) => f.rule === 'pa.input' && f.severity === 'fail' && /supply voltage/.test(f.message)),
    ).toBe(true);
  });
  it('a target power of 5e-324 W (subnormal) is an input error, not "Infinity dB" (regression)', () => {
    const x = evaluateRf(project({ targetPowerW: 5e-324 }), { paRailV: { pa: 13.8 } });
    expect(x.inputErrors.map((e) => e.field)).toEqual(['targetPowerW']);
    expect(nonFiniteText(x.findings)).toEqual([]);
    expect(nonFinitePaths(x)).toEqual([]);
  });
  it('a reference power of 5e-324 W (subnormal) is refused, not compared as "Infinity dB" (regression)', () => {
    const base = project();
    const x = evaluateRf(
      project({
        stages: [{ ...base.stages[0], pa: paParams({ referencePowerW: 5e-324 }) }, base.stages[1], base.stages[2]],
      }),
      { paRailV: { pa: 13.8 } },
    );
    expect(nonFinitePaths(x)).toEqual([]);
    expect(x.findings.filter((f) => f.rule === 'pa.input' && f.severity === 'fail')).toHaveLength(1);
  });
  it('zero power and zero frequency are input errors, not crashes', () => {
    const x = evaluateRf(project({ targetPowerW: 0, frequencyHz: 0 }), { paRailV: { pa: 13.8 } });
    expect(x.inputErrors.map((e) => e.field).sort()).toEqual(['frequencyHz', 'targetPowerW']);
    expect(nonFinitePaths(x)).toEqual([]);
  });
});

describe('evaluateRf never produces NaN/Infinity or throws for odd inputs (fast-check, seeded)', () => {
  // Subnormals (5e-324, 1.5e-322) pass `x > 0` and overflow a quotient: listed so every seed tries them
  const num = fc.oneof(
    fc.constant(0),
    fc.constant(-1),
    fc.constant(1e12),
    fc.double({ min: -10, max: 1e3, noNaN: true }),
    fc.constant(Number.NaN),
    fc.constantFrom(5e-324, 1.5e-322, -5e-324),
  );
  it('random parameter corruption', () => {
    fc.assert(
      fc.property(
        num,
        num,
        num,
        num,
        num,
        num,
        num,
        fc.integer({ min: -2, max: 12 }),
        (f, pw, rail, al, q, swr, tr, order) => {
          const p = project({
            frequencyHz: Math.abs(f) * 1e5,
            targetPowerW: pw,
            stages: [
              {
                id: 'a',
                kind: 'final',
                name: 'PA',
                notes: '',
                loads: [],
                dissipationW: null,
                pa: paParams({ turnsRatio: tr > 0 ? tr : null, saturationV: Number.isFinite(q) ? q : 1 }),
              },
              {
                id: 'b',
                kind: 'lpf',
                name: 'LPF',
                notes: '',
                loads: [],
                dissipationW: null,
                lpf: lpfParams({ coreAlHPerTurn2: al * 1e-9, order, inductorQ: q, monteCarloTrials: 50 }),
              },
              {
                id: 'c',
                kind: 'tr',
                name: 'TR',
                notes: '',
                loads: [],
                dissipationW: null,
                relay: relayParams({ wpm: Math.abs(pw) + 1 }),
              },
            ],
            rf: { ...project().rf, worstSwr: swr },
          });
          const r = evaluateRf(p, { paRailV: { pa: rail } });
          expect(nonFinitePaths(r)).toEqual([]);
          expect(nonFiniteText(r.findings)).toEqual([]);
          expect(sorted(r.findings)).toBe(true);
        },
      ),
      propertyOptions(20261202, 400),
    );
  });
  it('corrupted project, PA, relay and exposure settings', () => {
    fc.assert(
      fc.property(num, num, num, num, num, num, num, num, (amb, duty, eff, tj, gain, loss, even, iso) => {
        const base = project();
        const p = project({
          ambientC: amb,
          keyingDuty: duty,
          stages: [
            {
              ...base.stages[0],
              pa: paParams({
                efficiency: eff,
                mount: { thetaJcKPerW: 1, thetaCsKPerW: 1, thetaSaKPerW: Number.isNaN(gain) ? null : gain, tjMaxC: tj },
              }),
            },
            base.stages[1],
            { ...base.stages[2], relay: relayParams({ isolationDb: iso, position: 'before-lpf' }) },
          ],
          rf: {
            ...base.rf,
            antennaGainDbi: gain,
            feedlineLossDb: loss,
            evenHarmonicDbc: even,
            exposureDutyFactor: duty,
            exposureOnFraction: eff,
          },
        });
        const r = evaluateRf(p, { paRailV: { pa: 13.8 } });
        expect(nonFinitePaths(r)).toEqual([]);
        expect(nonFiniteText(r.findings)).toEqual([]);
      }),
      propertyOptions(20261203, 400),
    );
  });
});

describe('evaluateRf rule selection and missing filter', () => {
  it('ITU rule at ~10 W requires min(43 + 10 log10 P, 50) = 50 dB and is marked from memory', () => {
    const r = evaluateRf(project({ rf: { ...project().rf, spuriousRule: 'itu-app3' } }), { paRailV: { pa: 13.8 } });
    expect(r.harmonics!.requiredDb).toBe(50);
    expect(r.harmonics!.ruleFromMemory).toBe(true);
    expect(r.findings.some((f) => f.rule === 'spurious.rule-source')).toBe(true);
  });
  it('no filter stage: harmonics fail and the worst finding comes first', () => {
    const p = project();
    const r = evaluateRf(project({ stages: p.stages.filter((s) => s.kind !== 'lpf') }), { paRailV: { pa: 13.8 } });
    expect(r.harmonics!.rows.every((x) => x.severity === 'fail')).toBe(true);
    expect(r.findings[0].severity).toBe('fail');
  });
});
