// The air inside the enclosure as the ambient of every thermal check of a part inside it: the findings say so.
import type { Finding } from '../findings';

/** Rules of the thermal findings whose ambient is the air around the part. */
const THERMAL_RULES = /^(thermal\.|pa\.heatsink|pa\.tj-)/;

/**
 * Add "inside the box at X °C" to each thermal finding when the checks used the enclosure's inside temperature.
 * Source: the enclosure rise ΔT = P / (U A) over the room (heat-budget.ts); the checks themselves are unchanged.
 */
export function insideNote(findings: Finding[], insideC: number | null, roomC: number): Finding[] {
  if (insideC === null || !Number.isFinite(insideC)) return findings;
  const note =
    ` (Ambient: inside the box at ${insideC.toFixed(0)} °C, the ${roomC.toFixed(0)} °C room plus the enclosure's ` +
    'rise; a heatsink mounted outside the box sees the room, so there this is conservative.)';
  const noted = (f: Finding) => THERMAL_RULES.test(f.rule) && !f.kind && !f.message.includes('inside the box');
  return findings.map((f) => (noted(f) ? { ...f, message: f.message + note } : f));
}
