// Core realisation of the filter's inductors: toroid effective parameters, flux density at the highest output, the
// winding's fit in the window and self-resonance estimates. Pure formulas; stress comes from lpf-stress.ts.

/** Permeability of free space, H/m. */
const MU0_H_PER_M = 4e-7 * Math.PI;

/** Effective path length and area of a toroid with a rectangular cross-section, m and m². */
export function toroidEffective(outerM: number, innerM: number, heightM: number): { leM: number; aeM2: number } {
  const ln = Math.log(outerM / innerM);
  const k = 1 / innerM - 1 / outerM;
  // Source: IEC 60205 core constants of a toroid (from memory, not confirmed): C1 = 2π / (h ln(D/d)),
  // C2 = 4π (1/d − 1/D) / (h² ln³(D/d)); le = C1²/C2 = π ln(D/d) / (1/d − 1/D), Ae
  // = C1/C2 = h ln²(D/d) / (2 (1/d − 1/D))
  return { leM: (Math.PI * ln) / k, aeM2: (heightM * ln * ln) / (2 * k) };
}

/** Relative permeability the AL implies on a core of these effective dimensions. */
export function effectivePermeability(alHPerTurn2: number, leM: number, aeM2: number): number {
  // Source: IEC 60205 definition of the inductance factor, AL = μ0 μe Ae / le
  return (alHPerTurn2 * leM) / (MU0_H_PER_M * aeM2);
}

/** Peak flux density for a sinusoidal winding voltage of RMS value vRms, T. */
export function peakFluxDensityT(vRms: number, frequencyHz: number, turns: number, aeM2: number): number {
  // Source: transformer EMF equation E_rms = 4.44 f N Ae B_peak (4.44 = 2π/√2), from Faraday's law v = N Ae dB/dt
  return vRms / ((2 * Math.PI / Math.SQRT2) * frequencyHz * turns * aeM2);
}

/** Turns of a wire of diameter d that fit in one layer around the inside of a toroid of inner diameter ID. */
export function singleLayerTurns(innerM: number, wireM: number): number {
  // Geometry (from memory, not confirmed as a published rule): the wire centres lie on a circle of diameter ID − d,
  // one wire diameter apart
  return Math.floor((Math.PI * (innerM - wireM)) / wireM);
}

/** Stray capacitance assumed across a small single-layer toroidal winding, F. */
// From memory, not confirmed: a few pF for windings on cores up to about 25 mm
export const WINDING_CAPACITANCE_F = 2e-12;
/** Series inductance assumed of a leaded capacitor with short leads, H. */
// From memory, not confirmed: about 1 nH per mm of lead, 5 mm in all
export const CAPACITOR_LEAD_INDUCTANCE_H = 5e-9;

/** Resonance of an inductance with a capacitance, Hz. */
export function resonanceHz(inductanceH: number, capacitanceF: number): number {
  // Source: resonance of an LC circuit, f = 1 / (2π √(LC)) (textbook)
  return 1 / (2 * Math.PI * Math.sqrt(inductanceH * capacitanceF));
}
