// PA stress around the circle of the worst SWR: drain peak, device current, dissipation and output at each load phase.
import type { PaParams } from '../model';
import { simulateClassE } from './class-e-sim';
import { clippedSineCoefficient } from './pa-fourier';
import { clipBalance, HARMONICS, type Balance } from './pa-clip-balance';
import type { Cx } from './lpf-analysis';
import type { FilterLoad } from './class-e-loads';

/** One load on the SWR circle, referred to the drain through an ideal transformer or network. */
export interface SwrPoint {
  /**
   * Phase of the load's reflection coefficient against the design load, degrees (0 = resistive, above it): of the
   * antenna's load when the filter is known (circleAt 'antenna'), else of the PA's own load.
   */
  phaseDeg: number;
  /** Load at the PA's output terminals (design load x z; the filter's input impedance when it is known), ohms. */
  loadReOhm: number;
  loadImOhm: number;
  /** The antenna's load on the circle, ohms; null when the circle is placed at the PA's output (no filter known). */
  antennaReOhm: number | null;
  antennaImOhm: number | null;
  /** Highest drain voltage (at the highest supply), V. */
  drainPeakV: number;
  /** Peak current of one conducting device, A. */
  peakDeviceA: number;
  /** Key-down dissipation of all devices (including bias), W. */
  dissipationW: number;
  /** Output power into this load, W. */
  outputW: number;
  /** Class B/C: the drain peak carries the ring margin (the limit takes part of the drive current here). */
  ringMargin?: boolean;
  /** Class B/C: the margin carried, a fraction of the drain peak without it (up to CLIP_RING_MARGIN). */
  ringMarginFraction?: number;
}

export interface Worst {
  value: number;
  /** The circle's reflection phase (at the antenna when known), degrees; null = the antenna at its design load. */
  phaseDeg: number | null;
  loadReOhm: number;
  loadImOhm: number;
  antennaReOhm: number | null;
  antennaImOhm: number | null;
  /** Class B/C: the value carries the ring margin (CLIP_RING_MARGIN). */
  ringMargin?: boolean;
  /** Class B/C: the margin carried, a fraction of the drain peak without it. */
  ringMarginFraction?: number;
}

/** The stage with the antenna at its design load: the load the filter as built presents at the fundamental. */
export interface DesignLoadPoint extends Omit<SwrPoint, 'phaseDeg'> {
  /** SWR of that load against the PA's design load (the filter's own input SWR with a matched antenna). */
  inputSwr: number;
}

export interface PaSwrStress {
  /** The project's worst SWR the circle is drawn for. */
  swr: number;
  /**
   * Where the circle is drawn: 'antenna' = at the antenna, each load through the low-pass filter as built (its input
   * impedance at the fundamental) to the PA; 'pa-output' = at the PA's output terminals (no filter known or refused).
   */
  circleAt: 'antenna' | 'pa-output';
  /** The antenna at its design load, through the filter (null without one: the PA's design load itself). */
  designLoad: DesignLoadPoint | null;
  /** 'load-line': classes B, C, D at a complex load; 'class-e-simulated': class E by time-domain simulation. */
  model: 'load-line' | 'class-e-simulated';
  /** Class E: highest drain voltage at switch turn-on round the circle, / Vdd (0 = zero-voltage switching). */
  classETurnOnRatio: number | null;
  /** Class E: Rds(on) over the drain load of one half the simulation used (the harmonic band's loads share it). */
  classERdsOnRatio: number | null;
  /**
   * Push-pull class D: the leakage ring included in the drain peak and device current (leakage and Coss as entered,
   * null when not; z0Ohm = √(L/C) when both are); null for other stages.
   */
  ring: { leakageH: number | null; cossF: number | null; z0Ohm: number | null } | null;
  /**
   * Classes B and C: how the clipping loads were solved ('harmonic-balance' against the network's impedance at each
   * harmonic; 'flat-top' when that is unknown or did not converge at some load: the upper end), and the margin for the
   * drain's ring carried where the limit cuts the current (CLIP_RING_MARGIN); null for D and E.
   */
  clip: {
    model: ClipModel; ringMargin: number;
    /** Harmonic balance: |V_n| / |V_1| of the drain voltage (n = 1..5, index n − 1) into the circle's highest
     * resistance (reflection phase 0, the load that clips the stage most); null when not balanced there. */
    drainHarmonicsAtPhase0: number[] | null;
  } | null;
  /**
   * The largest |z| over the design load among the loads the stage meets: with the filter known, its input impedance
   * for the antenna at its design load and every degree round the circle (it can exceed the SWR); at the PA's output
   * the circle's own largest (the SWR at phase 0).
   */
  maxLoadRatio: number;
  /** Points every 15 degrees (for a table or plot). */
  points: SwrPoint[];
  worstDrainPeak: Worst;
  worstPeakCurrent: Worst;
  worstDissipation: Worst;
  maxOutput: Worst;
  minOutput: Worst;
}

/** What the stage does into its design load (the centre of the circle). */
export interface MatchedPoint {
  /** Drain peak at the highest supply (matched), V. */
  drainPeakV: number;
  /** Highest supply, V. */
  maxRailV: number;
  peakDeviceA: number;
  outputW: number;
  /** DC input of the RF part (without bias), W. */
  dcInputW: number;
  /** Bias idle power, W. */
  biasW: number;
  /**
   * Push-pull class D on a centre-tapped transformer (hard-switched): the leakage inductance between the primary
   * halves and the device output capacitance ring at every switching edge. Absent for other stages; null values =
   * not entered (the ring is then bounded by its step alone and the turn-off current's share is left out).
   */
  ring?: { leakageH: number | null; cossF: number | null };
  /**
   * Class B/C: the output network's and filter's impedance at each harmonic n ≥ 2 over the design load, at the drain
   * (drain to drain for push-pull), and the drive's half conduction angle: the clipped stage is then solved by harmonic
   * balance (pa-clip-balance). Absent (no filter known): the drain voltage flat-topped at the rails, the upper end.
   */
  harmonics?: { zAt: (n: number) => Cx; thetaRad: number; topology: 'push-pull' | 'single-ended' };
}

/**
 * Class B/C at a clipping load: where the limit takes a device's drive current, the current switched out of the
 * transformer's leakage rings with the drain capacitance; a device held fully off cannot hold its drain, which rings
 * below its limit while the transformer carries the opposite drain as far above 2 Vdd. Leakage is not entered for
 * these classes, so the drain peak carries this margin times the share of the drive the limit takes at its largest
 * (Balance cutRatio; the whole margin for the flat-topped model wherever it cuts the current). Common practice, no
 * published source; evidence: ngspice, push-pull class B and C (k = 0.9995, 50 pF per drain) into SWR 2 at the
 * antenna through the filter: drain 7-11 % above 2 Vdd where a device is held fully off (0° and 315°), about 1 %
 * where the limit takes half the drive or less (270°: the device stays in its knee, which holds its drain and damps
 * the ring, so the margin in proportion is the safe side there, 5 % above ngspice)
 * (test/core/rf/ngspice-pushpull-c-chain).
 */
export const CLIP_RING_MARGIN = 0.12;
/** Below this share of the drive taken by the limit no margin is carried (numerical: the knee's own rounding). */
const RING_CUT_MIN = 0.01;

/** Undamped leakage ring at a hard switching edge: drain overshoot above the load-line peak and its current. */
export interface Ring {
  /** Overshoot amplitude above the load-line drain peak, V. */
  overshootV: number;
  /** Ring current through the conducting device, A (null without leakage and Coss). */
  currentA: number | null;
  /** Characteristic impedance √(L/C), Ω (null without leakage and Coss). */
  z0Ohm: number | null;
}

/**
 * The opposite device turns on hard: the drain just released steps by `stepV` towards the load-line peak through the
 * leakage inductance L into its output capacitance C, with the turn-off current iOffA already in L.
 * Source: undamped series LC from initial conditions (circuit theory, textbook): v(t) = ΔV (1 − cos ω0t) +
 * I Z0 sin ω0t about the start, so the peak above the new level is √(ΔV² + (I Z0)²), Z0 = √(L/C); the loop
 * current amplitude is the same over Z0: √((ΔV/Z0)² + I²). Losses only lower both (an upper bound).
 */
export function leakageRing(stepV: number, iOffA: number, leakageH: number | null, cossF: number | null): Ring {
  if (leakageH === null || cossF === null || !(leakageH > 0) || !(cossF > 0)) {
    return { overshootV: stepV, currentA: null, z0Ohm: null };
  }
  const z0Ohm = Math.sqrt(leakageH / cossF);
  return {
    overshootV: Math.hypot(stepV, iOffA * z0Ohm), currentA: Math.hypot(stepV / z0Ohm, iOffA), z0Ohm,
  };
}

/** Normalised load z = (1 + Γ)/(1 − Γ) for Γ = ρ e^{jφ}. */
export function loadOnCircle(swr: number, phaseDeg: number): { re: number; im: number } {
  // Source: definition of SWR, |Γ| = (S - 1)/(S + 1)
  const rho = (swr - 1) / (swr + 1);
  const ph = (phaseDeg * Math.PI) / 180;
  const gr = rho * Math.cos(ph);
  const gi = rho * Math.sin(ph);
  // Source: definition of the reflection coefficient, z = (1 + Γ)/(1 − Γ)
  const den = (1 - gr) ** 2 + gi ** 2;
  return { re: ((1 + gr) * (1 - gr) - gi * gi) / den, im: (2 * gi) / den };
}

/** The stage into one normalised load z (1 = design load). */
type Stress = Omit<SwrPoint, 'phaseDeg' | 'loadReOhm' | 'loadImOhm' | 'antennaReOhm' | 'antennaImOhm'>;

export function stressAt(cls: PaParams['amplifierClass'], m: MatchedPoint, z: { re: number; im: number }): Stress {
  const mag = Math.hypot(z.re, z.im);
  if (cls === 'D') {
    // Voltage-switching stage: fundamental drain voltage fixed by the supply, current I1 = V1/|Z| (load line at a
    // complex load); P = V1^2 Re(Y)/2 = P0 Re(z)/|z|^2; conduction loss scales with current^2 (common practice)
    const currentRatio = 1 / mag;
    const outputW = (m.outputW * z.re) / mag ** 2;
    const lossW = Math.max(0, m.dcInputW - m.outputW) * currentRatio ** 2;
    const peakDeviceA = m.peakDeviceA * currentRatio;
    if (!m.ring) return { drainPeakV: m.drainPeakV, peakDeviceA, dissipationW: lossW + m.biasW, outputW };
    // Device current i = Ipk sin(θ − φ), φ = arg z (current lags an
    // inductive load), at turn-off θ = π: Ipk sin φ
    const iOffA = peakDeviceA * Math.sin(Math.atan2(z.im, z.re));
    const r = leakageRing(m.drainPeakV, iOffA, m.ring.leakageH, m.ring.cossF);
    return {
      drainPeakV: m.drainPeakV + r.overshootV, peakDeviceA: peakDeviceA + (r.currentA ?? 0),
      dissipationW: lossW + m.biasW, outputW,
    };
  }
  // Classes B and C (and B/AB): the drive sets the fundamental current I1; the load line's swing I1|Z| is |z| times
  // the swing at the design load (which just reaches the supply less saturation). Above it the devices give way at
  // the rail limit: by harmonic balance against the network at each harmonic when it is known, else the drain
  // voltage flat-topped at the rail limits (the clipped sinusoid's fundamental, clippedStage: the upper end).
  const hb = m.harmonics ? clipBalance({ ...m.harmonics, z }) : null;
  const { clipModel: _c, ...st } = hb && hb.converged ? balancedStress(m, z, hb) : flatTopStress(m, z);
  void _c;
  return st;
}

/** The rail-limited swing (the design load's peak less the supply), V. */
const swingV = (m: MatchedPoint) => m.drainPeakV - m.maxRailV;

function flatTopStress(m: MatchedPoint, z: { re: number; im: number }): Stress & { clipModel: ClipModel } {
  const mag = Math.hypot(z.re, z.im);
  const { currentRatio } = clippedStage(mag);
  const swingRatio = Math.min(1, mag);
  // Source: P = |V1|^2 Re(Y)/2 = I1^2 Re(Z)/2 = P0 (I1/I1,0)^2 Re(z); DC current proportional to I1 at a fixed
  // conduction angle (textbook load line)
  const outputW = m.outputW * currentRatio ** 2 * z.re;
  const dcW = m.dcInputW * currentRatio;
  // the ring margin where the limit cuts the current by more than 1 % (CLIP_RING_MARGIN)
  const ring = currentRatio < 0.99 ? 1 + CLIP_RING_MARGIN : 1;
  return {
    drainPeakV: (m.maxRailV + swingV(m) * swingRatio) * ring,
    peakDeviceA: m.peakDeviceA * currentRatio,
    dissipationW: Math.max(0, dcW - outputW) + m.biasW,
    outputW,
    ...(ring > 1 ? { ringMargin: true, ringMarginFraction: ring - 1 } : {}),
    clipModel: 'flat-top',
  };
}

function balancedStress(
  m: MatchedPoint, z: { re: number; im: number }, hb: Balance,
): Stress & { clipModel: ClipModel } {
  // Source: P = |I1|^2 Re(Z)/2 = P0 (I1/I1,0)^2 Re(z) (load line); DC input = supply x the devices' mean current,
  // its ratio to the design's from the balanced waveform (energy balance)
  const outputW = m.outputW * hb.currentRatio ** 2 * z.re;
  const dcW = m.dcInputW * hb.dcRatio;
  // the ring margin in proportion to the share of the drive the limit takes (ring amplitude = Z0 x the current
  // switched out of the leakage, undamped series LC as leakageRing; Z0 not entered: CLIP_RING_MARGIN at the whole)
  const fraction = hb.cutRatio > RING_CUT_MIN ? CLIP_RING_MARGIN * Math.min(1, hb.cutRatio) : 0;
  return {
    drainPeakV: (m.maxRailV + swingV(m) * hb.swingPeak) * (1 + fraction),
    peakDeviceA: m.peakDeviceA * hb.peakCurrentRatio,
    dissipationW: Math.max(0, dcW - outputW) + m.biasW,
    outputW,
    ...(fraction > 0 ? { ringMargin: true, ringMarginFraction: fraction } : {}),
    clipModel: 'harmonic-balance',
  };
}

/** How a class B/C stage's clipping was modelled at a load. */
export type ClipModel = 'flat-top' | 'harmonic-balance';

/** A class B/C stage into a load |z| times its design load (|z| = 1: the swing just reaches the rail limits). */
export interface ClippedStage {
  /** The load line's swing over the rail limit (|z|); above 1 the drain voltage is flat-topped. */
  overdrive: number;
  /** Fundamental of the drain voltage over the rail-limited swing (1 unclipped, → 4/π hard-limited). */
  fundamentalRatio: number;
  /** Fundamental load current over the design load's, V1/|Z| against V/R. */
  currentRatio: number;
}

/**
 * The drain voltage into a load |z| times the design load: the load-line swing |z| V, flat-topped at ±V (the rail
 * limits) when |z| > 1. Its fundamental is V b1(|z|) and the load's fundamental current falls as b1(|z|)/|z|.
 * Source: Fourier series of the clipped sinusoid (pa-fourier clippedSineCoefficient; saturation describing function,
 * Gelb & Vander Velde 1968, from memory); below the clip, the current held by the drive (textbook load line).
 */
export function clippedStage(mag: number): ClippedStage {
  if (!(mag > 1)) return { overdrive: mag, fundamentalRatio: 1, currentRatio: 1 };
  const fundamentalRatio = clippedSineCoefficient(1, mag);
  return { overdrive: mag, fundamentalRatio, currentRatio: fundamentalRatio / mag };
}

/**
 * Class E into the normalised load z: the simulated stage's figures at z over those at the design load, times the
 * matched figures (so the entered efficiency and the matched model stay the reference).
 */
export function classEStressAt(
  m: MatchedPoint, z: { re: number; im: number }, rdsOnRatio: number,
): { stress: Stress; turnOnRatio: number } {
  const ref = simulateClassE(1, 0, rdsOnRatio);
  const e = simulateClassE(z.re, z.im, rdsOnRatio);
  const outputW = (m.outputW * e.outputRatio) / ref.outputRatio;
  const dcW = (m.dcInputW * e.dcInputRatio) / ref.dcInputRatio;
  return {
    turnOnRatio: e.turnOnRatio,
    stress: {
      drainPeakV: (m.drainPeakV * e.drainPeakRatio) / ref.drainPeakRatio,
      peakDeviceA: (m.peakDeviceA * e.switchPeakRatio) / ref.switchPeakRatio,
      dissipationW: Math.max(0, dcW - outputW) + m.biasW,
      outputW,
    },
  };
}

/** Balanced sweeps already solved (the passes of one evaluation, and evaluations of one project, share them). */
const SWEEPS = new Map<string, Balance[]>();
const SWEEPS_KEPT = 32;

/**
 * The stage balanced at each load in turn, each load starting from the previous one's waveform (continuation round the
 * circle). Kept by the inputs, loads and harmonic impedances to six significant figures.
 */
function balancedSweep(b: NonNullable<MatchedPoint['harmonics']>, loads: readonly Cx[]): Balance[] {
  const zs: string[] = [];
  for (let n = 2; n <= HARMONICS; n++) {
    const z = b.zAt(n);
    zs.push(z.re.toPrecision(6), z.im.toPrecision(6));
  }
  for (const z of loads) zs.push(z.re.toPrecision(6), z.im.toPrecision(6));
  const key = [b.topology, b.thetaRad.toPrecision(9), ...zs].join(' ');
  const hit = SWEEPS.get(key);
  if (hit) return hit;
  const out: Balance[] = [];
  let start: Float64Array | undefined;
  for (const z of loads) {
    const hb = clipBalance({ ...b, z, start });
    if (hb.converged) start = hb.samples;
    out.push(hb);
  }
  if (SWEEPS.size >= SWEEPS_KEPT) SWEEPS.delete(SWEEPS.keys().next().value!);
  SWEEPS.set(key, out);
  return out;
}

const STEPS = 360;
/** Class-E simulation and class B/C harmonic-balance points round the circle (every 15°). */
const E_STEPS = 24;

/**
 * Sweep the load phase once round the circle of `swr` (1° steps; class E every 15°, by simulation). For class E
 * rdsOnRatio = Rds(on) / the drain load of one class-E half; its figures scale the matched ones by the simulated
 * ratio to the simulated design load, so the entered efficiency and the matched model stay the reference.
 */
export function swrStress(
  cls: PaParams['amplifierClass'], m: MatchedPoint, swr: number, designLoadOhm: number, rdsOnRatio = 0,
  filterLoads?: (phases: number) => FilterLoad[],
): PaSwrStress {
  const all: SwrPoint[] = [];
  const ref = cls === 'E' ? simulateClassE(1, 0, rdsOnRatio) : null;
  let worstTurnOn = 0;
  const balanced = (cls === 'B' || cls === 'C') && m.harmonics ? m.harmonics : null;
  let clipModel: ClipModel = balanced ? 'harmonic-balance' : 'flat-top';
  let atPhase0: number[] | null = null;
  // at SWR 1 every phase is the design load: one point says it all
  const steps = swr <= 1 ? 1 : cls === 'E' || balanced ? E_STEPS : STEPS;
  // the loads the stage meets, normalised to its design load (the transformer or network scales all alike): through
  // the filter as built with the circle at the antenna when it is known, else the circle at the PA's output
  const through = filterLoads ? filterLoads(steps) : null;
  const norm = (z: Cx): Cx => ({ re: z.re / designLoadOhm, im: z.im / designLoadOhm });
  const zs = through ? through.slice(1).map((l) => norm(l.input))
    : Array.from({ length: steps }, (_, i) => loadOnCircle(swr, (360 * i) / steps));
  const design = through ? norm(through[0].input) : null;
  // each load starts from the previous one's waveform (continuation round the circle, then the design load)
  const sweep = balanced ? balancedSweep(balanced, design ? [...zs, design] : zs) : null;
  const stressOf = (zl: Cx, i: number): Stress => {
    if (ref) {
      const e = classEStressAt(m, zl, rdsOnRatio);
      worstTurnOn = Math.max(worstTurnOn, e.turnOnRatio);
      return e.stress;
    }
    if (sweep) {
      const hb = sweep[i];
      if (!hb.converged) clipModel = 'flat-top';
      if (i === 0 && hb.converged) atPhase0 = hb.harmonicRatios;
      const { clipModel: _c, ...st } = hb.converged ? balancedStress(m, zl, hb) : flatTopStress(m, zl);
      void _c;
      return st;
    }
    return stressAt(cls, m, zl);
  };
  for (let i = 0; i < steps; i++) {
    const zl = zs[i];
    const antenna = through ? through[i + 1].antenna : null;
    all.push({
      phaseDeg: (360 * i) / steps, loadReOhm: designLoadOhm * zl.re, loadImOhm: designLoadOhm * zl.im,
      antennaReOhm: antenna?.re ?? null, antennaImOhm: antenna?.im ?? null, ...stressOf(zl, i),
    });
  }
  let designLoad: DesignLoadPoint | null = null;
  if (through && design) {
    // Source: definitions of the reflection coefficient and SWR, Γ = (z − 1)/(z + 1), S = (1 + |Γ|)/(1 − |Γ|)
    const g = Math.hypot(design.re - 1, design.im) / Math.hypot(design.re + 1, design.im);
    designLoad = {
      loadReOhm: designLoadOhm * design.re, loadImOhm: designLoadOhm * design.im,
      antennaReOhm: through[0].antenna.re, antennaImOhm: through[0].antenna.im, ...stressOf(design, steps),
      inputSwr: g < 1 ? (1 + g) / (1 - g) : Infinity,
    };
  }
  // the worst of each over the circle and the design load (a filter's input need not map the antenna's design load
  // inside the circle's worst)
  const candidates: (Omit<SwrPoint, 'phaseDeg'> & { phaseDeg: number | null })[] = designLoad
    ? [...all, { ...designLoad, phaseDeg: null }] : all;
  const pick = (key: 'drainPeakV' | 'peakDeviceA' | 'dissipationW' | 'outputW', sign: 1 | -1): Worst => {
    const best = candidates.reduce((a, b) => (sign * (b[key] - a[key]) > 1e-12 ? b : a));
    return {
      value: best[key], phaseDeg: best.phaseDeg, loadReOhm: best.loadReOhm, loadImOhm: best.loadImOhm,
      antennaReOhm: best.antennaReOhm, antennaImOhm: best.antennaImOhm,
      ...(key === 'drainPeakV' && best.ringMargin
        ? { ringMargin: true, ringMarginFraction: best.ringMarginFraction ?? CLIP_RING_MARGIN } : {}),
    };
  };
  // the largest load the stage meets: through the filter every degree (its input impedance alone, cheap), else the
  // circle's own largest, the SWR at phase 0
  const fine = through && filterLoads ? filterLoads(STEPS).map((l) => norm(l.input)) : null;
  const mags = (fine ?? (design ? [...zs, design] : zs)).map((z) => Math.hypot(z.re, z.im));
  return {
    swr,
    circleAt: through ? 'antenna' : 'pa-output',
    maxLoadRatio: Math.max(...mags),
    designLoad,
    model: cls === 'E' ? 'class-e-simulated' : 'load-line',
    classETurnOnRatio: ref ? worstTurnOn : null,
    clip: cls === 'B' || cls === 'C'
      ? { model: clipModel, ringMargin: CLIP_RING_MARGIN, drainHarmonicsAtPhase0: atPhase0 } : null,
    classERdsOnRatio: ref ? rdsOnRatio : null,
    ring: m.ring && cls === 'D'
      ? { ...m.ring, z0Ohm: leakageRing(0, 0, m.ring.leakageH, m.ring.cossF).z0Ohm } : null,
    points: all.filter((p) => p.phaseDeg % 15 === 0),
    worstDrainPeak: pick('drainPeakV', 1),
    worstPeakCurrent: pick('peakDeviceA', 1),
    worstDissipation: pick('dissipationW', 1),
    maxOutput: pick('outputW', 1),
    minOutput: pick('outputW', -1),
  };
}

/** "25.0 − j12.5 Ω". */
export function ohmText(re: number, im: number): string {
  return `${re.toFixed(1)} ${im < 0 ? '−' : '+'} j${Math.abs(im).toFixed(1)} Ω`;
}

/** The loads of a worst case, without its value. */
type LoadOf = Pick<Worst, 'phaseDeg' | 'loadReOhm' | 'loadImOhm' | 'antennaReOhm' | 'antennaImOhm'>;

/**
 * The load in words for a finding: with the circle at the PA's output "25.0 − j12.5 Ω (reflection phase 240°)"; at
 * the antenna "41.0 − j12.0 Ω at the PA (antenna 63.2 + j38.1 Ω, reflection phase 30°)", or "... (antenna at
 * its design load, 50.0 + j0.0 Ω)".
 */
export function describeLoad(w: LoadOf): string {
  const z = ohmText(w.loadReOhm, w.loadImOhm);
  if (w.antennaReOhm === null || w.antennaImOhm === null) {
    return `${z} (reflection phase ${(w.phaseDeg ?? 0).toFixed(0)}°)`;
  }
  const za = ohmText(w.antennaReOhm, w.antennaImOhm);
  return w.phaseDeg === null ? `${z} at the PA (antenna at its design load, ${za})`
    : `${z} at the PA (antenna ${za}, reflection phase ${w.phaseDeg.toFixed(0)}°)`;
}

/**
 * Where a worst case lies, after "reaches ... V": "at SWR 2 at the antenna, reflection phase 30° (63.2 + j38.1 Ω),
 * where the PA sees 41.0 − j12.0 Ω"; "with the antenna at its design load (50.0 + j0.0 Ω), where the PA sees ...";
 * with the circle at the PA's output "at SWR 2 into 25.0 − j12.5 Ω (reflection
 * phase 240°)" or "into the design load".
 */
export function whereLoad(w: LoadOf, swr: number): string {
  if (w.antennaReOhm === null || w.antennaImOhm === null) {
    return swr <= 1 ? 'into the design load' : `at SWR ${swr} into ${describeLoad(w)}`;
  }
  const za = ohmText(w.antennaReOhm, w.antennaImOhm);
  const sees = `where the PA sees ${ohmText(w.loadReOhm, w.loadImOhm)}`;
  return w.phaseDeg === null || swr <= 1 ? `with the antenna at its design load (${za}), ${sees}`
    : `at SWR ${swr} at the antenna, reflection phase ${w.phaseDeg.toFixed(0)}° (${za}), ${sees}`;
}

