// Keyed-carrier spectrum: the FFT and the dot-train spectrum against analytic cases, necessary bandwidth per ITU.
import { describe, expect, it } from 'vitest';
import { fft } from '../../../src/core/rf/keying-fft';
import { RAISED_COSINE_10_90, RC_10_90 } from '../../../src/core/rf/keying-envelope';
import { envelopeLines, keyingSpectrum, necessaryBandwidthHz, telegraphyBaud } from '../../../src/core/rf/keying';
import { evaluateKeying } from '../../../src/core/rf/keying-eval';
import { relayParams } from './fixture';
import { near } from './helpers';

const toleranceDb = 0.05;
const sinc = (x: number) => (x === 0 ? 1 : Math.sin(Math.PI * x) / (Math.PI * x));
const db = (x: number) => 20 * Math.log10(Math.abs(x));

describe('fft', () => {
  it('matches the closed-form DFT of a rectangular sequence (Dirichlet kernel)', () => {
    // Source: A. V. Oppenheim and R. W. Schafer, Discrete-Time Signal Processing: DFT of M ones among N samples,
    // |X[k]| = |sin(πkM/N) / sin(πk/N)|, X[0] = M
    const n = 64;
    const m = 10;
    const x = Array.from({ length: n }, (_, i) => (i < m ? 1 : 0));
    const X = fft(x);
    near(X.re[0], m, 1e-12, 'X[0]');
    for (let k = 1; k < n; k++) {
      near(
        Math.hypot(X.re[k], X.im[k]),
        Math.abs(Math.sin((Math.PI * k * m) / n) / Math.sin((Math.PI * k) / n)),
        1e-9,
        `|X[${k}]|`,
      );
    }
  });
  it('matches the DFT definition term by term on a complex sequence', () => {
    // Source: definition X[k] = Σ x[n] e^(−j2πkn/N), evaluated directly
    const n = 16;
    const re = Array.from({ length: n }, (_, i) => Math.cos(i * 1.3) + 0.1 * i);
    const im = Array.from({ length: n }, (_, i) => Math.sin(i * 0.7));
    const X = fft(re, im);
    for (let k = 0; k < n; k++) {
      let sr = 0;
      let si = 0;
      for (let i = 0; i < n; i++) {
        const a = (-2 * Math.PI * k * i) / n;
        sr += re[i] * Math.cos(a) - im[i] * Math.sin(a);
        si += re[i] * Math.sin(a) + im[i] * Math.cos(a);
      }
      near(X.re[k], sr, 1e-9, `Re X[${k}]`);
      near(X.im[k], si, 1e-9, `Im X[${k}]`);
    }
  });
  it('refuses a length that is not a power of two', () => {
    expect(() => fft([1, 2, 3])).toThrow(/power of two/);
  });
});

describe('dot-train spectrum', () => {
  const wpm = 20;
  const dotS = 1.2 / wpm; // PARIS word of 50 units (common practice, no published source)
  const f0 = 1 / (2 * dotS);

  it('hard keying: lines follow the sinc of a rectangular pulse', () => {
    // Source: Fourier series of a 50 % rectangular pulse train: A_k / A_0 = sinc(k/2) (the transform of a rectangular
    // pulse is a sinc); odd k at 2/(πk), even k zero
    const a = envelopeLines(dotS, { shape: 'raised-cosine', riseS: 0, fallS: 0 });
    near(a[0], 0.5, 1e-9, 'carrier');
    for (const k of [1, 3, 5, 11, 25]) near(db(a[k] / a[0]), db(sinc(k / 2)), toleranceDb, `line ${k}`);
    expect(a[2] / a[0]).toBeLessThan(1e-6);
    near(db(a[1] / a[0]), -3.92, 0.01, 'line 1 = 20 log10(2/π)');
  });

  it('raised-cosine edges: sinc times the cosine-pulse transform, sidelobes falling faster', () => {
    // Source: the raised-cosine-edged pulse is the rectangle convolved with a half-cosine kernel of width T; the
    // kernel's transform is cos(πfT) / (1 − (2fT)²) (Fourier transform of a
    // cosine pulse, from memory, not confirmed;
    // the convolution theorem is textbook). T = the 0–100 % edge time.
    const riseS = 0.005;
    const edgeS = riseS / RAISED_COSINE_10_90;
    const a = envelopeLines(dotS, { shape: 'raised-cosine', riseS, fallS: riseS });
    for (const k of [1, 3, 7, 13, 19, 31]) {
      const f = k * f0;
      const expected = sinc(k / 2) * (Math.cos(Math.PI * f * edgeS) / (1 - (2 * f * edgeS) ** 2));
      near(db(a[k] / a[0]), db(expected), 0.1, `line ${k} (${f.toFixed(0)} Hz)`);
    }
    const hard = keyingSpectrum(wpm, { shape: 'raised-cosine', riseS: 0, fallS: 0 });
    const soft = keyingSpectrum(wpm, { shape: 'raised-cosine', riseS, fallS: riseS });
    // hard keying falls as 1/f: one octave (1 to 2 kHz) is about 6 dB; the shaped one falls as 1/f³ there
    const drop = (s: typeof hard) => s.clicks[3].levelDbc - s.clicks[4].levelDbc;
    near(drop(hard), 6.02, 0.3, 'hard keying, 1 → 2 kHz');
    expect(drop(soft)).toBeGreaterThan(12);
    expect(soft.clicks[4].levelDbc).toBeLessThan(hard.clicks[4].levelDbc - 40);
  });

  it('RC shaping: the square wave through a first-order low-pass', () => {
    // Source: steady-state response of a first-order low-pass to a periodic input: each line times 1/(1 + j2πfτ)
    const tau = 0.001;
    const a = envelopeLines(dotS, { shape: 'rc', timeConstantS: tau });
    for (const k of [1, 3, 9, 21, 45]) {
      const f = k * f0;
      near(db(a[k] / a[0]), db(sinc(k / 2) / Math.hypot(1, 2 * Math.PI * f * tau)), toleranceDb, `line ${k}`);
    }
  });

  it('occupied bandwidth of hard keying from the square wave series', () => {
    // Source: ITU RR No. 1.153 (0.5 % of the mean power outside each limit) applied to the 50 % square wave series:
    // total mean power 1/2, line k odd carries 2 (1/(πk))² two-sided; the edge is the last line needed
    let outside = 0;
    let edge = 1;
    for (let k = 100_001; k >= 1; k -= 2) {
      if (outside + 2 / (Math.PI * k) ** 2 > 0.01 * 0.5) {
        edge = k;
        break;
      }
      outside += 2 / (Math.PI * k) ** 2;
    }
    const s = keyingSpectrum(wpm, { shape: 'raised-cosine', riseS: 0, fallS: 0 });
    near(s.occupiedBandwidthHz, 2 * edge * f0, 2 * f0 + 1e-9, 'occupied bandwidth (one line step)');
  });
});

describe('necessary bandwidth (ITU RR Appendix 1)', () => {
  it('reproduces the 25 words per minute example: B = 20, K = 5, 100 Hz', () => {
    // Source: ITU Radio Regulations Appendix 1 / ITU-R SM.1138, continuous-wave telegraphy example (as quoted; the
    // primary text was not consulted here)
    expect(necessaryBandwidthHz(20, 5)).toBe(100);
    expect(necessaryBandwidthHz(20, 3)).toBe(60);
  });
  it('takes B = WPM / 1.2 from the PARIS word (the ITU example uses 20 Bd at 25 WPM, a 48-unit word)', () => {
    // Common practice, no published source: 50 units a word, dot 1.2/WPM s
    near(telegraphyBaud(25), 25 / 1.2, 1e-12, 'baud at 25 WPM');
  });
});

describe('evaluateKeying', () => {
  it('flags edges harder than 5 ms and states the click levels', () => {
    const { result, findings } = evaluateKeying(relayParams({ keyRiseS: 0.001 }), 'T/R');
    const f = findings.find((x) => x.rule === 'keying.edges')!;
    expect(f.severity).toBe('caution');
    expect(f.limit).toBe(0.005);
    expect(f.message).toMatch(/dBc at 500 Hz/);
    expect(result!.fallS).toBe(0.001);
  });
  it('accepts 5 ms shaped edges', () => {
    const { findings } = evaluateKeying(relayParams({ keyRiseS: 0.005, keyFallS: 0.006 }), 'T/R');
    expect(findings.find((x) => x.rule === 'keying.edges')!.severity).toBe('ok');
  });
  it('an RC network gives 10–90 % edges of τ ln 9', () => {
    // Source: step response of a first-order RC network (algebra): 10–90 % = τ ln 9 = 2.197 τ
    const { result } = evaluateKeying(relayParams({ keyShapingRcS: 0.001 }), 'T/R');
    near(result!.riseS, 2.197e-3, 1e-6, 'rise');
    expect(RC_10_90).toBeCloseTo(2.1972, 4);
  });
  it('first element: half-amplitude width dot − delay, above 90 % for half the edges less', () => {
    // 20 WPM: dot 60 ms; 8 ms delay: 52 ms wide; raised cosine 5 ms edges lose 2.5 ms on each side (hand-worked)
    const { result } = evaluateKeying(relayParams({ keyRiseS: 0.005, txDelayS: 0.008 }), 'T/R');
    near(result!.firstElementHalfS, 0.052, 1e-12, 'half width');
    near(result!.firstElementFullS, 0.047, 1e-12, 'above 90 %');
    const late = evaluateKeying(relayParams({ keyRiseS: 0.02, txDelayS: 0.045 }), 'T/R');
    expect(late.findings.find((x) => x.rule === 'keying.first-element')!.severity).toBe('caution');
  });
  it('says when no edges are entered', () => {
    const { result, findings } = evaluateKeying(relayParams(), 'T/R');
    expect(result).toBeNull();
    expect(findings[0].rule).toBe('keying.not-entered');
  });
});
