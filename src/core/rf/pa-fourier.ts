// Fourier coefficients of the PA's idealised waveforms: the drain-current cosine pulse (plain, and flat-topped when
// the stage saturates) and the switched drain voltage with finite edges (trapezoid). Each returns the amplitude of
// the cos nωt term for a waveform of unit height, so ratios give harmonic levels and n = 0, 1 give DC and power.

/**
 * Fourier coefficient n (n = 0, 1, 2, ...) of a cosine pulse of unit peak and half conduction angle theta (rad).
 * Source: cosine-pulse coefficients as tabulated in Krauss, Bostian & Raab, Solid State Radio Engineering (1980)
 * (equations from memory): α0 = (sin θ − θ cos θ)/(π(1 − cos θ)),
 * α1 = (θ − sin θ cos θ)/(π(1 − cos θ)),
 * αn = 2 (sin nθ cos θ − n cos nθ sin θ)/(π n (n² − 1)(1 − cos θ)).
 */
export function cosinePulseCoefficient(n: number, thetaRad: number): number {
  const c = Math.cos(thetaRad);
  const s = Math.sin(thetaRad);
  const k = Math.PI * (1 - c);
  if (n === 0) return (s - thetaRad * c) / k;
  if (n === 1) return (thetaRad - s * c) / k;
  return (2 * (Math.sin(n * thetaRad) * c - n * Math.cos(n * thetaRad) * s)) / (k * n * (n * n - 1));
}

/**
 * Coefficient n of a rectangular pulse of unit height over |ωt| < θ (the hard-saturated limit of the pulse).
 * Source: Fourier series of a pulse train, c0 = θ/π, cn = 2 sin(nθ)/(nπ) (textbook relation, from memory)
 */
export function rectangularPulseCoefficient(n: number, thetaRad: number): number {
  if (n === 0) return thetaRad / Math.PI;
  return (2 * Math.sin(n * thetaRad)) / (n * Math.PI);
}

/**
 * Coefficient n of a cosine pulse of half angle theta overdriven by `drive` (≥ 1) and flattened at its saturation
 * level 1: min(drive · p_θ(ωt), 1). drive 1 is the plain pulse (the edge of saturation), Infinity the rectangular
 * pulse. Above the clip the excess drive·p_θ − 1 is itself a cosine pulse of half angle φ with
 * cos φ = cos θ + (1 − cos θ)/drive, so by superposition
 * c_n = drive (α_n(θ) − (1 − cos φ)/(1 − cos θ) α_n(φ)) (Fourier series,
 * linearity; derivation, no published source).
 */
export function flattenedPulseCoefficient(n: number, thetaRad: number, drive: number): number {
  if (!(drive > 1)) return cosinePulseCoefficient(n, thetaRad);
  if (!Number.isFinite(drive)) return rectangularPulseCoefficient(n, thetaRad);
  const c = Math.cos(thetaRad);
  const cosPhi = c + (1 - c) / drive;
  const phi = Math.acos(Math.min(1, cosPhi));
  if (phi < 1e-6) return cosinePulseCoefficient(n, thetaRad);
  return drive * (cosinePulseCoefficient(n, thetaRad) - ((1 - cosPhi) / (1 - c)) * cosinePulseCoefficient(n, phi));
}

/** Harmonic n of a rectangular wave of duty D relative to its fundamental. */
// Source: Fourier series of a pulse train, |sin nπD| / (n |sin πD|)
export function rectangularHarmonic(n: number, duty: number): number {
  return Math.abs(Math.sin(n * Math.PI * duty)) / (n * Math.abs(Math.sin(Math.PI * duty)));
}

const sinc = (x: number) => (Math.abs(x) < 1e-12 ? 1 : Math.sin(x) / x);

/**
 * Amplitude of harmonic n (n ≥ 1) of a trapezoidal wave of unit height, duty D (pulse width between the 50 % points
 * over the period) and equal rise and fall times of `tau` periods (0 ≤ tau ≤ min(D, 1 − D)).
 * Source: spectrum of a trapezoidal pulse train, c_n = 2 A D |sinc(nπD)| |sinc(nπ t_r/T)| (C. R. Paul, Introduction
 * to Electromagnetic Compatibility, 2nd ed. (2006), §3.2, from memory). tau = 0 is the rectangular wave.
 */
export function trapezoidCoefficient(n: number, duty: number, tau: number): number {
  return 2 * duty * Math.abs(sinc(n * Math.PI * duty) * sinc(n * Math.PI * tau));
}

/** Harmonic n of that trapezoidal wave relative to its fundamental (|sin nπD|/(n |sin πD|) at tau = 0). */
export function trapezoidHarmonic(n: number, duty: number, tau: number): number {
  return trapezoidCoefficient(n, duty, tau) / trapezoidCoefficient(1, duty, tau);
}

/**
 * Coefficient of sin nωt (n ≥ 1; signed, its magnitude is harmonic n's amplitude) of a sinusoid of amplitude `drive`
 * (in units of the clip level) flat-topped at ±1 (the drain voltage held at the rail limits):
 * min(1, max(−1, drive sin ωt)). Even harmonics are 0 (half-wave
 * symmetry); drive ≤ 1 is the plain sinusoid; drive → ∞ tends to the square wave, 4/(nπ) for odd n.
 * Source: Fourier series of the clipped sinusoid, the saturation describing function (Gelb & Vander Velde,
 * Multiple-Input Describing Functions and Nonlinear System Design, 1968; from memory): with sin β = 1/drive,
 * b1 = (2 drive/π)(β + sin β cos β),
 * bn = (4/π)[(drive/2)(sin((n−1)β)/(n−1) − sin((n+1)β)/(n+1)) + cos(nβ)/n] for odd n ≥ 3.
 */
export function clippedSineCoefficient(n: number, drive: number): number {
  if (n % 2 === 0) return 0;
  if (!(drive > 1)) return n === 1 ? Math.max(0, drive) : 0;
  if (!Number.isFinite(drive)) return 4 / (n * Math.PI);
  const beta = Math.asin(1 / drive);
  if (n === 1) return ((2 * drive) / Math.PI) * (beta + Math.sin(beta) * Math.cos(beta));
  const a = (drive / 2) * (Math.sin((n - 1) * beta) / (n - 1) - Math.sin((n + 1) * beta) / (n + 1));
  return (4 / Math.PI) * (a + Math.cos(n * beta) / n);
}
