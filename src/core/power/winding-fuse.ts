// The fuse in a winding lead ahead of the rectifier: its rating, the winding's fault currents and whether the fuse
// (fitted, else recommended) clears the smallest of them within the allowed time.
import type { Finding } from '../findings';
import type { RectifiedRail, Winding } from '../model';
import type { FaultCheck, RectifiedCorner, WindingFuseReport } from './report-types';
import { FUSE_SHEET_LABEL, WINDING_FUSE_FACTOR, faultCheck, shortedOutputRmsA, shortedWindingRmsA } from './fault';
import { fittedFuseFindings, fuseMarking } from './fuses';
import { noLoadVrms, windingResistanceOhm } from './winding';
import { IEC_60127_FUSES_A, nextAtLeast } from './standard-values';

export interface WindingFuseInput {
  rail: RectifiedRail;
  winding: Winding;
  corners: RectifiedCorner[];
  mainsNominalV: number;
  lowFactor: number;
  highFactor: number;
  /** The winding's leakage inductance referred to it (H) and the mains frequency (Hz); absent = leakage left out. */
  leakageH?: number;
  frequencyHz?: number;
}

const fmtA = (a: number) => (a < 1 ? `${Math.round(a * 1000)} mA` : `${Number(a.toPrecision(3))} A`);
const SOURCE = 'supply.fuse-clearing' as const;

/** Words for a fault check: "11.0 A is 11.0 x In: IEC 60127-2 allows at most 0.3 s". */
export function faultWords(c: FaultCheck): string {
  const at = `${fmtA(c.faultA)} is ${c.multiple.toFixed(1)} x In of ${fmtA(c.fuseA)}`;
  return c.latestS === null
    ? `${at}, below 2.1 x In, where IEC 60127-2 sets no time at all: the fuse may never blow`
    : `${at}: IEC 60127-2 lets it take up to ` +
      `${c.latestS < 1 ? `${(c.latestS * 1000).toFixed(0)} ms` : `${c.latestS} s`} to melt`;
}

export function windingFuseReport(inp: WindingFuseInput): { report: WindingFuseReport; findings: Finding[] } {
  const { rail, winding } = inp;
  const emfV = noLoadVrms(winding);
  const sourceOhm = windingResistanceOhm(winding);
  const kd = inp.corners.find((c) => c.id === 'high-keyDown');
  // the centre-tap lead carries both halves' currents, each of RMS I: sqrt(2) I (RMS of two disjoint pulse trains)
  const leadRmsA = (kd?.secondaryRmsA ?? 0) * (rail.topology === 'centre-tap' ? Math.SQRT2 : 1);
  const rec = leadRmsA > 0 ? nextAtLeast(IEC_60127_FUSES_A, leadRmsA * WINDING_FUSE_FACTOR) : null;
  const fittedRaw = rail.windingFuseA ?? null;
  const fittedA = fittedRaw !== null && Number.isFinite(fittedRaw) && fittedRaw > 0 ? fittedRaw : null;
  const sheet = fittedA !== null ? (rail.windingFuseSheet ?? 'T3') : 'T3';
  const fuse = {
    ratedA: rec,
    characteristic: 'T' as const,
    loadA: leadRmsA,
    factor: WINDING_FUSE_FACTOR,
    reasoning: leadRmsA > 0
      ? `Continuous key-down winding current at high mains ${fmtA(leadRmsA)} RMS x ${WINDING_FUSE_FACTOR} = ` +
        `${fmtA(leadRmsA * WINDING_FUSE_FACTOR)}, rounded up to the IEC 60127 series: ` +
        `T${rec !== null ? fmtA(rec) : ' (beyond the series)'}, in the winding lead before the rectifier.`
      : 'No winding current: no fuse size can be computed.',
  };
  const leakageH = inp.leakageH !== undefined && inp.frequencyHz !== undefined && inp.leakageH > 0 ? inp.leakageH : 0;
  const hz = inp.frequencyHz ?? 0;
  // Source: inductive reactance X = 2 pi f L (circuit theory)
  const reactanceOhm = 2 * Math.PI * hz * leakageH;
  const inputShortLowA = shortedWindingRmsA(emfV * inp.lowFactor, sourceOhm, reactanceOhm);
  const inputShortHighA = shortedWindingRmsA(emfV * inp.highFactor, sourceOhm, reactanceOhm);
  const outputShortLowA = shortedOutputRmsA(
    rail.topology, emfV * inp.lowFactor * Math.SQRT2, sourceOhm, rail.diodeDropV, rail.diodeResistanceOhm, leakageH, hz,
  );
  const inUse = fittedA ?? rec;
  const check = inUse !== null && outputShortLowA > 0 ? faultCheck(outputShortLowA, inUse, sheet) : null;
  const turnsRatio = inp.mainsNominalV > 0 ? emfV / inp.mainsNominalV : 0;
  const through = leakageH > 0
    ? `the winding's ${sourceOhm.toFixed(2)} Ω and ${reactanceOhm.toFixed(2)} Ω leakage reactance ` +
      `(${(leakageH * 1e6).toPrecision(3)} µH)`
    : `the winding's ${sourceOhm.toFixed(2)} Ω (no leakage)`;
  const reasoning = `A shorted reservoir at low mains drives ${fmtA(outputShortLowA)} RMS through ${through} and the ` +
    `diodes; a short at the rectifier's input ${fmtA(inputShortLowA)} (low mains) to ${fmtA(inputShortHighA)} ` +
    '(high mains).';
  const findings: Finding[] = [...fittedFuseFindings(`${winding.name} fuse`, fittedA, fuse)];
  const subject = `${winding.name} fuse`;
  if (check) {
    const base = {
      rule: 'fuse.fault-clearing', subject, value: check.latestS, limit: check.allowedS, unit: 's', source: SOURCE,
    };
    const what = `A shorted reservoir on ${rail.name}: ${faultWords(check)} (${FUSE_SHEET_LABEL[check.sheet]})`;
    const fit = fittedA === null
      ? ` No winding fuse is entered: fit ${fuseMarking(check.fuseA)} in the winding lead, before the rectifier.` : '';
    if (check.clears) {
      findings.push({
        ...base, severity: fittedA === null ? 'caution' : 'ok', message: `${what}, within ${check.allowedS} s.${fit}`,
      });
    } else if (check.latestS !== null) {
      findings.push({
        ...base, severity: 'caution',
        message: `${what}, longer than the ${check.allowedS} s wanted; the winding heats meanwhile. Use a smaller ` +
          `or quicker fuse if the load allows.${fit}`,
      });
    } else {
      findings.push({
        ...base, value: check.multiple, limit: 2.1, unit: 'x In', severity: 'fail',
        message: `${what}. The winding can burn while the fuse holds; use a smaller fuse or a winding with less ` +
          `resistance.${fit}`,
      });
    }
  }
  return {
    report: {
      windingId: winding.id, windingName: winding.name, fuse, fittedA, sheet, sourceOhm, leakageH, reactanceOhm,
      inputShortLowA, inputShortHighA, outputShortLowA, check, turnsRatio, reasoning,
    },
    findings,
  };
}

