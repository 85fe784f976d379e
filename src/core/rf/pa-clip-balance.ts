// Harmonic balance of a class B/C stage whose drain voltage reaches the rail limit: each device a current source
// (its drive pulse) that gives way only as far as keeps its drain at the saturation drop, into the load at the
// fundamental and the output network's and filter's impedance at each harmonic. A capacitor-input filter is nearly a
// short at the harmonics, so the flat top's harmonic currents flow into it and the drain voltage stays closer to a
// sinusoid than the flat-topped model (pa-swr clippedStage) says; an inductor-input filter lets the flat top form.
// Normalised: drain-to-drain design load 1, rail-limited swing 1, drive fundamental 1 (the program's design point).
import type { Cx } from './lpf-analysis';
import { cosinePulseCoefficient } from './pa-fourier';

/** Samples per period and the harmonics carried (above them the network is taken as a short). */
const N = 128;
export const HARMONICS = 31;
/** The device's on-resistance in its saturated (triode) region over the design load: a steep knee through the
 * saturation drop at the peak current that keeps the limit a well-posed piecewise-linear equation (numerical choice;
 * 0.3 % moved the ngspice comparison's power by under 1 % and took four times the steps). */
const RON = 0.01;
/** A softer knee solved first from a cold start (continuation: fewer damped Newton steps). */
const RON_STEPS = [0.03, RON];
const MAX_ITER = 200;
/** Largest residual of the drain voltage (over the swing) taken as solved. */
const TOL = 1e-9;

export interface BalanceInput {
  topology: 'push-pull' | 'single-ended';
  /** Half conduction angle of the drive pulse, rad (π/2 for class B). */
  thetaRad: number;
  /** Load at the fundamental over the design load. */
  z: Cx;
  /** Network impedance at harmonic n ≥ 2 over the design load, at the drain (drain to drain for push-pull). */
  zAt: (n: number) => Cx;
  /** Drain voltage samples of a nearby load's solution to start from (continuation round the circle). */
  start?: Float64Array;
}

export interface Balance {
  /** Fundamental of the load current over the design's (the drive's). */
  currentRatio: number;
  /** Mean device current over the undiminished drive's (the DC the supply gives). */
  dcRatio: number;
  /** Highest device current over the drive pulse's peak. */
  peakCurrentRatio: number;
  /** Largest current the limit takes from a device's drive at any instant, over the drive pulse's peak (0 = the limit
   * not reached; 1 = a device held fully off at its drive's peak, its drain carried past the limit by the network). */
  cutRatio: number;
  /** Highest drain excursion above the supply over the rail-limited swing (1 = the drain at 2 Vdd − Vsat; above it
   * the harmonic voltages carry the drain of a device that has given way, or is not driven, beyond the limit). */
  swingPeak: number;
  /** |V_n| / |V_1| of the drain voltage for n = 1..5 (index n − 1). */
  harmonicRatios: number[];
  converged: boolean;
  /** Newton steps taken. */
  iterations: number;
  /** The drain voltage samples (a start for the next load). */
  samples: Float64Array;
}

/** cos and sin of n 2π k / N for n = 1..HARMONICS (row n − 1), k = 0..N − 1. */
const COS: Float64Array[] = [];
const SIN: Float64Array[] = [];
for (let n = 1; n <= HARMONICS; n++) {
  const c = new Float64Array(N);
  const si = new Float64Array(N);
  for (let k = 0; k < N; k++) {
    c[k] = Math.cos((2 * Math.PI * n * k) / N);
    si[k] = Math.sin((2 * Math.PI * n * k) / N);
  }
  COS.push(c);
  SIN.push(si);
}

/** The network's impedance at harmonics 1..HARMONICS (over the design load). */
function impedances(inp: BalanceInput): { re: Float64Array; im: Float64Array } {
  const re = new Float64Array(HARMONICS);
  const im = new Float64Array(HARMONICS);
  for (let n = 1; n <= HARMONICS; n++) {
    const z = n === 1 ? inp.z : inp.zAt(n);
    re[n - 1] = z.re;
    im[n - 1] = z.im;
  }
  return { re, im };
}

/** Impulse response over one period: h_m = (2/N) Σ_n Re(Z_n e^{j n 2π m / N}) (discrete Fourier series of a periodic
 * current sample, no DC: the supply feed carries it; textbook). */
function impulse(z: { re: Float64Array; im: Float64Array }): Float64Array {
  const h = new Float64Array(N);
  for (let n = 0; n < HARMONICS; n++) {
    for (let m = 0; m < N; m++) h[m] += (2 / N) * (z.re[n] * COS[n][m] - z.im[n] * SIN[n][m]);
  }
  return h;
}

/** v = Z * i through the harmonics: I_n = (1/N) Σ i_k e^{−jnθk}, v_k = Σ_n 2 Re(Z_n I_n e^{jnθk})
 * (discrete Fourier series). */
function convolve(z: { re: Float64Array; im: Float64Array }, x: Float64Array, out: Float64Array): void {
  out.fill(0);
  for (let n = 0; n < HARMONICS; n++) {
    let ir = 0, ii = 0;
    const c = COS[n], si = SIN[n];
    for (let k = 0; k < N; k++) {
      ir += x[k] * c[k];
      ii -= x[k] * si[k];
    }
    // V_n = Z_n I_n, scaled 2/N
    const vr = (2 / N) * (z.re[n] * ir - z.im[n] * ii);
    const vi = (2 / N) * (z.re[n] * ii + z.im[n] * ir);
    for (let k = 0; k < N; k++) out[k] += vr * c[k] - vi * si[k];
  }
}

/** Gaussian elimination with partial pivoting (textbook), in place; returns x of a x = b. */
function solve(a: number[][], b: number[]): number[] {
  const n = b.length;
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r][c]) > Math.abs(a[p][c])) p = r;
    [a[c], a[p]] = [a[p], a[c]];
    [b[c], b[p]] = [b[p], b[c]];
    for (let r = c + 1; r < n; r++) {
      const f = a[r][c] / a[c][c];
      if (f === 0) continue;
      for (let k = c; k < n; k++) a[r][k] -= f * a[c][k];
      b[r] -= f * b[c];
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r];
    for (let k = r + 1; k < n; k++) s -= a[r][k] * x[k];
    x[r] = s / a[r][r];
  }
  return x;
}

/**
 * Solve the stage: v = Z * (a − b) with a, b the devices' currents, each its drive d limited by the knee,
 * i = min(d, max(0, Ipk + margin / Ron)) (margin: the drain above its saturation drop, 1 ∓ v; the saturation drop
 * is the drain's at the drive's peak current Ipk, as the load line defines it). Semi-smooth Newton on
 * F(v) = v − Z * i(v): the Jacobian is I + G_A / Ron on the samples A in the knee, solved on A alone (Sherman–
 * Morrison–Woodbury). Source: harmonic balance of a current-source stage against its load at each harmonic (circuit
 * theory; the device as a current source with a saturation knee, as in the class B/C load-line model).
 */
export function clipBalance(inp: BalanceInput): Balance {
  const pp = inp.topology === 'push-pull';
  const th = inp.thetaRad;
  // drive pulse (cosine pulse of half angle θ), scaled so that the load current's fundamental is 1:
  // push-pull a − b has fundamental 2 α1 per unit peak, single-ended α1 (cosine-pulse coefficients, pa-fourier)
  const alpha1 = cosinePulseCoefficient(1, th);
  const peak = 1 / ((pp ? 2 : 1) * alpha1);
  const pulse = (x: number) => Math.max(0, (Math.cos(x) - Math.cos(th)) / (1 - Math.cos(th)));
  const d1 = new Float64Array(N);
  const d2 = new Float64Array(N);
  for (let k = 0; k < N; k++) {
    const x = (2 * Math.PI * k) / N;
    d1[k] = peak * pulse(x);
    d2[k] = pp ? peak * pulse(x - Math.PI) : 0;
  }
  const zs = impedances(inp);
  const h = impulse(zs);
  const devices = (v: Float64Array, k: number, ron: number) => ({
    a: Math.min(d1[k], Math.max(0, peak + (1 - v[k]) / ron)),
    b: Math.min(d2[k], Math.max(0, peak + (1 + v[k]) / ron)),
  });
  const residual = (v: Float64Array, ron: number) => {
    const i = new Float64Array(N);
    const knee: number[] = [];
    for (let k = 0; k < N; k++) {
      const { a, b } = devices(v, k, ron);
      if ((a > 0 && a < d1[k]) || (b > 0 && b < d2[k])) knee.push(k);
      i[k] = a - b;
    }
    const zi = new Float64Array(N);
    convolve(zs, i, zi);
    const f = new Float64Array(N);
    let norm = 0;
    for (let k = 0; k < N; k++) {
      f[k] = v[k] - zi[k];
      norm = Math.max(norm, Math.abs(f[k]));
    }
    return { f, norm, knee, i };
  };
  const v = new Float64Array(N);
  const drive = new Float64Array(N);
  for (let k = 0; k < N; k++) drive[k] = d1[k] - d2[k];
  convolve(zs, drive, v);
  // start from the unlimited swing held within the limits (the flat-topped guess)
  for (let k = 0; k < N; k++) v[k] = Math.max(-1, Math.min(1, v[k]));
  const warm = inp.start?.length === N;
  if (warm) v.set(inp.start!);
  let iterations = 0;
  let r = residual(v, RON);
  let converged = false;
  for (const ron of warm ? [RON] : RON_STEPS) {
    r = residual(v, ron);
    converged = r.norm < TOL;
    for (let it = 0; it < MAX_ITER && !converged; it++) {
      iterations++;
      const A = r.knee;
      // (I + G_AA / Ron) x_A = −F_A; Δv = −F − G[:, A] x_A / Ron
      const m = A.map((k, p) => A.map((j, q) => (p === q ? 1 : 0) + h[(k - j + N) % N] / ron));
      const xA = A.length ? solve(m, A.map((k) => -r.f[k])) : [];
      const step = new Float64Array(N);
      for (let k = 0; k < N; k++) {
        let s = -r.f[k];
        for (let p = 0; p < A.length; p++) s -= (h[(k - A[p] + N) % N] * xA[p]) / ron;
        step[k] = s;
      }
      // damped step: halve until the largest residual falls (backtracking line search), starting from twice the
      // last accepted step
      let t = 1;
      for (let tries = 0; tries < 30; tries++) {
        const trial = new Float64Array(N);
        for (let k = 0; k < N; k++) trial[k] = v[k] + t * step[k];
        const next = residual(trial, ron);
        if (next.norm < r.norm || tries === 29) {
          v.set(trial);
          r = next;
          break;
        }
        t /= 2;
      }
      converged = r.norm < TOL;
    }
  }
  // results from the device currents and the drain voltage (discrete Fourier series)
  const harm = (x: Float64Array, n: number) => {
    let re = 0, im = 0;
    for (let k = 0; k < N; k++) {
      re += x[k] * Math.cos((2 * Math.PI * n * k) / N);
      im -= x[k] * Math.sin((2 * Math.PI * n * k) / N);
    }
    return Math.hypot(re, im) * (2 / N);
  };
  let sumA = 0, sumD = 0, maxA = 0, swingPeak = 0, cut = 0;
  for (let k = 0; k < N; k++) {
    const { a, b } = devices(v, k, RON);
    sumA += a + b;
    sumD += d1[k] + d2[k];
    maxA = Math.max(maxA, a, b);
    // what the limit takes from each device's drive at this instant (drive less the current it carries)
    cut = Math.max(cut, d1[k] - a, d2[k] - b);
    // push-pull: each drain swings Vdd ∓ v (one device each side); single-ended: Vdd − v
    swingPeak = Math.max(swingPeak, pp ? Math.abs(v[k]) : -v[k]);
  }
  const v1 = harm(v, 1);
  return {
    currentRatio: harm(r.i, 1), dcRatio: sumA / sumD, peakCurrentRatio: maxA / peak, cutRatio: cut / peak, swingPeak,
    harmonicRatios: [1, 2, 3, 4, 5].map((n) => harm(v, n) / v1), converged, iterations, samples: v,
  };
}

/**
 * The network at harmonic n seen from the drain, over the design load: the filter's input impedance at n f (ohms at
 * the PA's output terminals) referred to the drain by the ratio drain load / output load, in parallel with the
 * device output capacitance when entered (push-pull: the two devices' in series drain to drain, Coss/2).
 * Source: impedance transformation by the turns ratio squared; admittances in parallel add (circuit theory).
 */
export function drainHarmonicLoad(
  filterOhmAt: (n: number) => Cx, o: { primaryOhm: number; loadOhm: number; cossF: number | null; frequencyHz: number;
    topology: 'push-pull' | 'single-ended' },
): (n: number) => Cx {
  const refer = o.primaryOhm / o.loadOhm;
  const c = o.cossF !== null && o.cossF > 0 ? (o.topology === 'push-pull' ? o.cossF / 2 : o.cossF) : 0;
  return (n) => {
    const f = filterOhmAt(n);
    const z = { re: (f.re * refer) / o.primaryOhm, im: (f.im * refer) / o.primaryOhm };
    // Z ∥ 1/(jωC): Z / (1 + jωC Z), with ωC scaled to the design load
    const b = 2 * Math.PI * n * o.frequencyHz * c * o.primaryOhm;
    const den = { re: 1 - b * z.im, im: b * z.re };
    const m = den.re * den.re + den.im * den.im;
    return { re: (z.re * den.re + z.im * den.im) / m, im: (z.im * den.re - z.re * den.im) / m };
  };
}
