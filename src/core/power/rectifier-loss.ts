// Diode dissipation of a rectifier from the simulated currents, per corner and averaged over the keying duty.
import type { RectifierTopology } from '../model';
import type { RectifiedCorner, RectifierLoss } from './report-types';

/**
 * Dissipation of all the rectifier's diodes (W) with the piecewise-linear diode model of the simulation
 * (drop Vf plus resistance r_d): each diode dissipates Vf I_avg + r_d I_rms^2. Source: diode conduction-loss model,
 * power-electronics textbooks (P = V_F0 I_F(AV) + r_F I_F(RMS)^2, as in rectifier makers' loss formulas; from memory).
 * Bridge: the winding current passes two diodes at every instant, so P = 2 (Vf I_dc + r_d I_w,rms^2).
 * Centre-tap: each half's current passes its own diode: P = Vf I_dc + r_d (2 I_half,rms^2).
 * Half-wave: one diode carries the winding current: P = Vf I_dc + r_d I_w,rms^2.
 * I_dc is the rail's mean load current (the mean rectified current in steady state; the bleeder's share is neglected).
 */
export function rectifierDissipationW(
  topology: RectifierTopology,
  diodeDropV: number,
  diodeOhm: number,
  dcA: number,
  windingRmsA: number,
): number {
  const vf = Number.isFinite(diodeDropV) ? Math.max(0, diodeDropV) : 0;
  const rd = Number.isFinite(diodeOhm) ? Math.max(0, diodeOhm) : 0;
  const i = Number.isFinite(dcA) ? Math.max(0, dcA) : 0;
  const irms = Number.isFinite(windingRmsA) ? Math.max(0, windingRmsA) : 0;
  if (topology === 'bridge') return 2 * (vf * i + rd * irms * irms);
  if (topology === 'centre-tap') return vf * i + rd * 2 * irms * irms;
  return vf * i + rd * irms * irms;
}

/** Rectifier loss at high mains: key-down, key-up, averaged over the keying duty (d P_kd + (1-d) P_ku) and tune-up. */
export function rectifierLoss(
  topology: RectifierTopology,
  diodeDropV: number,
  diodeOhm: number,
  corners: RectifiedCorner[],
  keyingDuty: number,
): RectifierLoss {
  const at = (id: string) => {
    const c = corners.find((x) => x.id === id);
    return c ? rectifierDissipationW(topology, diodeDropV, diodeOhm, c.loadA, c.secondaryRmsA) : 0;
  };
  const keyDownW = at('high-keyDown');
  const keyUpW = at('high-keyUp');
  // Heat averages over time: the duty-weighted mean of the two states' dissipations
  const d = Number.isFinite(keyingDuty) ? Math.min(1, Math.max(0, keyingDuty)) : 0;
  return { keyDownW, keyUpW, thermalW: d * keyDownW + (1 - d) * keyUpW, tuneUpW: keyDownW };
}
