// Heat in the enclosure: every source's dissipation averaged over the keying duty, summed, and the internal
// temperature rise from the enclosure's surface and heat transfer coefficient.
import type { Finding } from '../findings';
import type { SupplyReport } from './report-types';

export interface HeatSource {
  /** What dissipates, e.g. "PA rail bridge rectifier". */
  name: string;
  kind: 'regulator' | 'rectifier' | 'transformer' | 'pa' | 'bleeder';
  /** Dissipation averaged over the keying duty (W). */
  watts: number;
  /** How it was found, in words. */
  note: string;
}

export interface HeatBudget {
  sources: HeatSource[];
  /** Sum of the sources (W). */
  totalW: number;
  /** Enclosure surface (m²), null = not stated. */
  areaM2: number | null;
  /** Heat transfer coefficient (W/(m² K)), null = not stated. */
  uWPerM2K: number | null;
  /** Internal temperature rise over the room (K), null when the enclosure is not stated. */
  riseK: number | null;
  /** Room ambient (°C). */
  ambientC: number;
  /** Air inside the enclosure (°C), null when the rise is unknown. */
  insideC: number | null;
  findings: Finding[];
}

/** The ambient small mains transformers are commonly rated for, their ta marking (°C). From memory, not confirmed. */
export const TRANSFORMER_RATED_AMBIENT_C = 40;

/** A rise above which the box is worth ventilating (K). Common practice, no published source. */
export const ENCLOSURE_RISE_CAUTION_K = 10;

export interface PaHeat {
  name: string;
  /** Duty-averaged dissipation of all the PA's devices (W). */
  averageW: number;
}

const ok = (x: number | null | undefined): x is number => typeof x === 'number' && Number.isFinite(x) && x > 0;

export function heatBudget(
  supply: SupplyReport | null, pas: PaHeat[], areaM2: number | null | undefined, uWPerM2K: number | null | undefined,
  ambientC: number,
): HeatBudget {
  const sources: HeatSource[] = [];
  for (const r of supply?.rails ?? []) {
    if (r.kind === 'regulated') {
      sources.push({
        name: `${r.railName} regulator`, kind: 'regulator', watts: r.thermalDissipationW,
        note: 'high mains, averaged over the keying duty',
      });
      const ob = r.bleeder?.fittedW;
      if (ob !== undefined && ob !== null) {
        sources.push({
          name: `${r.railName} output bleeder`, kind: 'bleeder', watts: ob, note: 'at the set output voltage',
        });
      }
    } else if (r.kind === 'rectified') {
      sources.push({
        name: `${r.railName} rectifier`, kind: 'rectifier', watts: r.rectifierLoss.thermalW,
        note: `diodes, high mains, duty-averaged (${r.rectifierLoss.keyDownW.toFixed(2)} W key-down)`,
      });
      const wf = r.windingFuse;
      if (wf && r.winding) {
        const halves = r.winding.halves;
        // Source: Joule heating P = I^2 R, with the winding's resistance referred to the secondary (primary share
        // included)
        const w = halves * r.winding.thermalRmsA * r.winding.thermalRmsA * wf.sourceOhm;
        sources.push({
          name: `${wf.windingName} copper`, kind: 'transformer', watts: w,
          note: `I² R with ${r.winding.thermalRmsA.toFixed(2)} A RMS (duty-averaged) in ${wf.sourceOhm.toFixed(2)} Ω`,
        });
      }
      if (r.bleeder.fittedW !== null) {
        sources.push({
          name: `${r.railName} bleeder`, kind: 'bleeder', watts: r.bleeder.fittedW,
          note: 'at the no-load peak at high mains (an upper bound)',
        });
      }
    }
  }
  for (const p of pas) {
    sources.push({
      name: `${p.name} devices`, kind: 'pa', watts: p.averageW,
      note: 'duty-averaged (key-down share of DC in minus RF out, bias idle otherwise)',
    });
  }
  const clean = sources.map((s) => ({ ...s, watts: Number.isFinite(s.watts) ? Math.max(0, s.watts) : 0 }));
  const totalW = clean.reduce((a, s) => a + s.watts, 0);
  const area = ok(areaM2) ? areaM2 : null;
  const u = ok(uWPerM2K) ? uWPerM2K : null;
  // Source: enclosure sizing relation Q = U A ΔT (sealed enclosure, natural convection; U from a vendor's sizing page)
  const riseK = area !== null && u !== null ? totalW / (u * area) : null;
  const insideC = riseK !== null ? ambientC + riseK : null;
  const findings: Finding[] = [];
  const base = { rule: 'enclosure.rise', subject: 'Enclosure', unit: 'K', source: 'thermal.enclosure' as const };
  if (riseK === null) {
    if (totalW > 0) {
      findings.push({
        ...base, severity: 'caution', value: null, limit: ENCLOSURE_RISE_CAUTION_K,
        message: `About ${totalW.toFixed(1)} W is dissipated inside the box; enter the enclosure's surface and heat ` +
          'transfer coefficient on the supply page to see how warm it gets inside.',
      });
    }
  } else if (riseK > ENCLOSURE_RISE_CAUTION_K) {
    findings.push({
      ...base, severity: 'caution', value: riseK, limit: ENCLOSURE_RISE_CAUTION_K,
      message: `${totalW.toFixed(1)} W inside raises the air in the box about ${riseK.toFixed(1)} K, to ` +
        `${insideC!.toFixed(0)} °C; the heatsink and junction checks of the rectifiers, regulators and PA use that ` +
        `air, not the ${ambientC} °C room. Ventilate the box or mount hot parts outside.`,
    });
  } else {
    findings.push({
      ...base, severity: 'ok', value: riseK, limit: ENCLOSURE_RISE_CAUTION_K,
      message: `${totalW.toFixed(1)} W inside raises the air in the box about ${riseK.toFixed(1)} K, to ` +
        `${insideC!.toFixed(0)} °C, the ambient of the heatsink and junction checks inside.`,
    });
  }
  // the transformers sit in the same air: their current ratings hold at their rated ambient
  if (insideC !== null && insideC > TRANSFORMER_RATED_AMBIENT_C) {
    for (const t of supply?.transformers ?? []) {
      findings.push({
        rule: 'transformer.ambient', subject: t.name, severity: 'caution', value: insideC,
        limit: TRANSFORMER_RATED_AMBIENT_C, unit: '°C', source: 'thermal.transformer-ambient',
        message: `${t.name} sits inside the box at ${insideC.toFixed(0)} °C, above the ` +
          `${TRANSFORMER_RATED_AMBIENT_C} °C ambient small transformers are commonly rated for: its current ` +
          'ratings are optimistic there. Check the ta marked on it, derate its current, ventilate the box or ' +
          'mount it outside.',
      });
    }
  }
  return { sources: clean, totalW, areaM2: area, uWPerM2K: u, riseK, ambientC, insideC, findings };
}
