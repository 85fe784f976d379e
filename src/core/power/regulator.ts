// Linear and switching regulators: output voltage from the setting, input current, dissipation, headroom checks.
import type { Finding } from '../findings';
import type { RegulatedRail, RegulatorSetting } from '../model';
import { usablePositive } from '../numeric';

// a result that cannot be computed is unknown (NaN, shown as unknown with a finding), never a silent 0
const finiteOr = (x: number, f: number) => (Number.isFinite(x) ? x : f);

/**
 * Output voltage of a regulator from its setting (V). `quiescentA` is the common-pin current, needed only for
 * the 'raised-resistor' method. Non-finite results (R1 = 0) come back unknown (NaN); validation reports them.
 */
export function regulatorOutputV(setting: RegulatorSetting, quiescentA = 0): number {
  switch (setting.method) {
    case 'fixed':
      return finiteOr(setting.nominalV, NaN);
    case 'adjustable':
      // Source: adjustable three-terminal regulator datasheets (LM317-type), Vout = Vref(1 + R2/R1) + I_adj R2 (ref
      // §6.2 [C])
      return finiteOr(setting.vrefV * (1 + setting.r2Ohm / setting.r1Ohm) + setting.adjustA * setting.r2Ohm, NaN);
    case 'raised-diodes':
      // Source: circuit notes quoted in ref §6.1 [C]: each forward-biased silicon diode in the common lead adds
      // ~0.6-0.7 V
      return finiteOr(setting.nominalV + setting.diodes * setting.diodeDropV, NaN);
    case 'raised-resistor':
      // Source: ref §6.1 [C] (resistor method): Vout = Vxx(1 + R2/R1) + Iq R2, Iq leaves the common pin through R2
      return finiteOr(setting.nominalV * (1 + setting.r2Ohm / setting.r1Ohm) + quiescentA * setting.r2Ohm, NaN);
  }
}

/** Efficiency of a switching module; unknown (NaN) when missing or absurd (its spec refuses such a value by name). */
export function switchingEfficiency(rail: RegulatedRail): number {
  const e = rail.efficiency;
  // Usable, not merely > 0: a subnormal efficiency made Pout / eff infinite (and the input current silently Iq only).
  // Floor 1 %: common practice, no published source (no working module is less efficient).
  return e !== null && usablePositive(e, 0.01) && e <= 1 ? e : NaN;
}

/**
 * Current a regulator draws from its input (A).
 * Linear/LDO: output current + quiescent current (series pass element, ref §6.1 "quiescent (ground-pin) current").
 * Switching: Pin = Pout / efficiency -> I_in = Vout I_out / (eff V_in) + I_q (energy balance; efficiency taken
 * at the lowest input voltage). A non-positive or unusable inputV is treated as V_in = Vout (the module at its limit).
 */
export function regulatorInputCurrentA(rail: RegulatedRail, outputA: number, inputV: number): number {
  const iOut = Number.isFinite(outputA) && outputA > 0 ? outputA : 0;
  const iq = Number.isFinite(rail.quiescentA) && rail.quiescentA > 0 ? rail.quiescentA : 0;
  if (rail.regulator !== 'switching') return iOut + iq;
  const vOut = regulatorOutputV(rail.setting, rail.quiescentA);
  // Below 1 mV (a subnormal included) the input is no usable voltage: treated as V_in = Vout, as a non-positive one.
  const vIn = usablePositive(inputV, 1e-3) ? inputV : Math.max(vOut, 1e-3);
  // Energy balance: Pin = Pout / efficiency
  return finiteOr((vOut * iOut) / (switchingEfficiency(rail) * vIn), NaN) + iq;
}

/**
 * Regulator dissipation (W).
 * Linear: P = (Vin - Vout) I_out + Vin I_q (series element; ref §7 worked example uses (Vin,avg - Vout) I).
 * Switching: P = Pout (1/eff - 1) (energy balance).
 */
export function regulatorDissipationW(rail: RegulatedRail, outputA: number, inputMeanV: number): number {
  const vOut = regulatorOutputV(rail.setting, rail.quiescentA);
  const iOut = Number.isFinite(outputA) && outputA > 0 ? outputA : 0;
  if (rail.regulator === 'switching') return finiteOr(vOut * iOut * (1 / switchingEfficiency(rail) - 1), NaN);
  const vIn = Number.isFinite(inputMeanV) ? inputMeanV : 0;
  const iq = Number.isFinite(rail.quiescentA) && rail.quiescentA > 0 ? rail.quiescentA : 0;
  return Math.max(0, (vIn - vOut) * iOut + vIn * iq);
}

const SOURCE_DROPOUT = 'supply.regulator-dropout' as const;

/** Headroom finding at the trough of the worst corner. */
export function headroomFinding(rail: RegulatedRail, troughV: number, cornerLabel: string): Finding {
  const vOut = regulatorOutputV(rail.setting, rail.quiescentA);
  const need = vOut + Math.max(0, rail.dropoutV);
  const headroom = troughV - vOut;
  const base = {
    rule: 'regulator.headroom',
    subject: rail.name,
    value: troughV,
    limit: need,
    unit: 'V',
    source: SOURCE_DROPOUT,
  };
  if (troughV < need) {
    return {
      ...base,
      severity: 'fail',
      message: `${cornerLabel}: the input dips to ${troughV.toFixed(2)} V but ${rail.name} needs ${need.toFixed(2)}` +
        ` V (output ${vOut.toFixed(2)} V + dropout ${rail.dropoutV.toFixed(2)} V); the output will drop out and ` +
        `carry ripple. Use a higher secondary voltage, more reservoir capacitance or a low-dropout regulator.`,
    };
  }
  if (headroom - rail.dropoutV < 0.5) {
    return {
      ...base,
      severity: 'caution',
      message: `${cornerLabel}: only ${(headroom - rail.dropoutV).toFixed(2)} V above dropout at the ripple trough; ` +
        `mains dips or a weaker transformer will make it drop out.`,
    };
  }
  return {
    ...base,
    severity: 'ok',
    message: `${cornerLabel}: the input stays ${(headroom - rail.dropoutV).toFixed(2)} V above what ${rail.name}` +
      ` needs at the ripple trough.`,
  };
}

/** Checks of the regulator's own ratings: maximum input voltage and output current. */
export function ratingFindings(rail: RegulatedRail, maxInputSeenV: number, maxOutputSeenA: number): Finding[] {
  const out: Finding[] = [];
  const vOut = regulatorOutputV(rail.setting, rail.quiescentA);
  if (!(vOut > 0)) {
    out.push({
      severity: 'fail',
      rule: 'regulator.setting',
      subject: rail.name,
      value: vOut,
      limit: null,
      unit: 'V',
      source: 'design.input',
      message: `The setting gives no usable output voltage; check the resistor values.`,
    });
  }
  if (rail.maxInputV !== null && Number.isFinite(rail.maxInputV) && maxInputSeenV > rail.maxInputV) {
    out.push({
      severity: 'fail',
      rule: 'regulator.max-input',
      subject: rail.name,
      value: maxInputSeenV,
      limit: rail.maxInputV,
      unit: 'V',
      source: 'supply.regulator-max-input',
      message: `With no load at high mains the input reaches ${maxInputSeenV.toFixed(1)} V, above the ` +
        `${rail.maxInputV} V maximum.`,
    });
  }
  if (rail.maxOutputA !== null && Number.isFinite(rail.maxOutputA) && maxOutputSeenA > rail.maxOutputA) {
    out.push({
      severity: 'fail',
      rule: 'regulator.max-output',
      subject: rail.name,
      value: maxOutputSeenA,
      limit: rail.maxOutputA,
      unit: 'A',
      source: 'design.maker-rating',
      message: `Key-down load ${maxOutputSeenA.toFixed(2)} A exceeds its ${rail.maxOutputA} A rating.`,
    });
  }
  return out;
}
