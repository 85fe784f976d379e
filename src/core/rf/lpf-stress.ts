// Voltage across and current through each filter element at the operating frequency, for the PA's power into a load
// anywhere on the worst SWR circle (lossless ladder, solved from the load back to the input).
import type { LpfDesign } from './lpf-design';

type C = [number, number];
const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]];
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const div = (a: C, b: C): C => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
const abs = (a: C) => Math.hypot(a[0], a[1]);

export interface ElementStress {
  index: number;
  /** Largest RMS voltage across and RMS current through the element over the loads, V and A. */
  rmsV: number;
  rmsA: number;
}

/** Load impedances on the SWR circle of a Z0 line (phases every 30°), and the matched load. */
export function swrCircle(z0Ohm: number, swr: number, phases = 12): C[] {
  const g = (swr - 1) / (swr + 1);
  const out: C[] = [[z0Ohm, 0]];
  for (let i = 0; i < phases; i++) {
    const ph = (2 * Math.PI * i) / phases;
    // Source: definition of the reflection coefficient, Z = Z0 (1 + Γ) / (1 − Γ)
    out.push(mul([z0Ohm, 0], div([1 + g * Math.cos(ph), g * Math.sin(ph)], [1 - g * Math.cos(ph), -g * Math.sin(ph)])));
  }
  return out;
}

/**
 * Element stress for `powerW` delivered into the filter's input (built values, lossless), worst over the loads.
 * Series inductors carry the ladder current; shunt capacitors see the node voltage.
 */
export function elementStress(d: LpfDesign, frequencyHz: number, powerW: number, loads: C[]): ElementStress[] {
  const w = 2 * Math.PI * frequencyHz;
  const worst = d.elements.map((e) => ({ index: e.index, rmsV: 0, rmsA: 0 }));
  for (const zl of loads) {
    // 1 V RMS across the load; walk back to the input: a series element adds I Z to the voltage, a shunt element
    // adds V Y to the current (Kirchhoff's laws)
    let v: C = [1, 0];
    let i: C = div(v, zl);
    const raw: { v: number; i: number }[] = new Array(d.elements.length);
    for (let k = d.elements.length - 1; k >= 0; k--) {
      const e = d.elements[k];
      if (e.kind === 'shunt-capacitor') {
        const iC = mul(v, [0, w * e.builtValue]);
        raw[k] = { v: abs(v), i: abs(iC) };
        i = add(i, iC);
      } else {
        const vL = mul(i, [0, w * e.builtValue]);
        raw[k] = { v: abs(vL), i: abs(i) };
        v = add(v, vL);
      }
    }
    // Source: complex power P = Re(V I*); scale every voltage and current by √(P / P_in)
    const pIn = v[0] * i[0] + v[1] * i[1];
    const s = Math.sqrt(powerW / pIn);
    raw.forEach((r, k) => {
      worst[k].rmsV = Math.max(worst[k].rmsV, r.v * s);
      worst[k].rmsA = Math.max(worst[k].rmsA, r.i * s);
    });
  }
  return worst;
}
