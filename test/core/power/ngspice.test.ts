// Cross-check of the built-in rectifier simulation against ngspice (an independent SPICE engine) on the
// netlists from spice-netlist.ts: bridge / centre-tap / half-wave, 50 and 60 Hz, constant-current and
// resistive loads, several winding resistances. Both use the same piecewise-linear diode (Vf + r_d), so
// differences come from the integration and the steady-state search only.
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { NGSPICE, requireTool } from '../../helpers/tools';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { rectifierNetlist } from '../../../src/core/power/spice-netlist';
import { simulateRectifier, type RectifierSimInput } from '../../../src/core/power/rectifier-sim';

const hasNgspice = requireTool(NGSPICE, 'Rectifier cross-checks against ngspice', 'apt-get install ngspice');

// Tolerances (named with units)
const toleranceMeanFraction = 0.003; // DC mean, 0.3 %
const toleranceRippleFraction = 0.03; // ripple p-p, 3 %
const toleranceRippleV = 0.01; // plus 10 mV absolute for small ripple
const toleranceTroughV = 0.05; // trough, 50 mV
const toleranceRmsFraction = 0.02; // secondary RMS current, 2 %
const tolerancePeakFraction = 0.03; // repetitive peak diode current, 3 %

const base = { diodeDropV: 0.8, diodeResistanceOhm: 0.03, esrOhm: 0.02 };
const designs: { name: string; input: RectifierSimInput }[] = [
  {
    name: 'bridge 50 Hz, 3 A constant current, ref §4.2 winding (0.194 Ω)',
    input: {
      ...base,
      topology: 'bridge',
      secondaryVrms: 19.08,
      windingResistanceOhm: 0.194,
      frequencyHz: 50,
      diodeDropV: 0.75,
      diodeResistanceOhm: 0.02,
      capacitanceF: 0.01,
      esrOhm: 0,
      load: { kind: 'current', currentA: 3 },
    },
  },
  {
    name: 'bridge 60 Hz, 10 Ω resistive, 0.5 Ω winding',
    input: {
      ...base,
      topology: 'bridge',
      secondaryVrms: 17.3,
      windingResistanceOhm: 0.5,
      frequencyHz: 60,
      capacitanceF: 0.0047,
      load: { kind: 'resistance', resistanceOhm: 10 },
    },
  },
  {
    name: 'bridge 60 Hz, 0.2 A, stiff 0.05 Ω winding, small 1000 µF',
    input: {
      ...base,
      topology: 'bridge',
      secondaryVrms: 12.6,
      windingResistanceOhm: 0.05,
      frequencyHz: 60,
      capacitanceF: 0.001,
      load: { kind: 'current', currentA: 0.2 },
    },
  },
  {
    name: 'centre-tap 50 Hz, 1 A constant current, 0.3 Ω per half',
    input: {
      ...base,
      topology: 'centre-tap',
      secondaryVrms: 16.5,
      windingResistanceOhm: 0.3,
      frequencyHz: 50,
      capacitanceF: 0.0047,
      load: { kind: 'current', currentA: 1 },
    },
  },
  {
    name: 'centre-tap 60 Hz, 22 Ω resistive, 0.8 Ω per half, bleeder 2.2 kΩ',
    input: {
      ...base,
      topology: 'centre-tap',
      secondaryVrms: 26,
      windingResistanceOhm: 0.8,
      frequencyHz: 60,
      capacitanceF: 0.0022,
      esrOhm: 0.1,
      load: { kind: 'resistance', resistanceOhm: 22 },
      bleederOhm: 2200,
    },
  },
  {
    name: 'half-wave 60 Hz, 47 Ω resistive, 1 Ω winding',
    input: {
      ...base,
      topology: 'half-wave',
      secondaryVrms: 14,
      windingResistanceOhm: 1,
      frequencyHz: 60,
      capacitanceF: 0.0022,
      load: { kind: 'resistance', resistanceOhm: 47 },
    },
  },
  {
    name: 'half-wave 50 Hz, 0.1 A constant current, 2 Ω winding',
    input: {
      ...base,
      topology: 'half-wave',
      secondaryVrms: 9,
      windingResistanceOhm: 2,
      frequencyHz: 50,
      capacitanceF: 0.0033,
      load: { kind: 'current', currentA: 0.1 },
    },
  },
];

function runNgspice(netlist: string): Record<string, number> {
  const dir = mkdtempSync(join(tmpdir(), 'rigwright-spice-'));
  try {
    writeFileSync(join(dir, 'rail.cir'), netlist);
    const run = spawnSync(NGSPICE as string, ['-b', 'rail.cir'], { cwd: dir, encoding: 'utf8', timeout: 60_000 });
    const out = `${run.stdout ?? ''}\n${run.stderr ?? ''}`;
    const values: Record<string, number> = {};
    for (const m of out.matchAll(/^(vavg|vpp|vmin|vmax|isec|idpk)\s*=\s*([-+0-9.eE]+)/gm)) values[m[1]] = Number(m[2]);
    if (Object.keys(values).length < 6) throw new Error(`ngspice gave no results:\n${out.slice(-2000)}`);
    return values;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

describe.skipIf(!hasNgspice)('built-in simulation against ngspice', () => {
  for (const d of designs) {
    it(d.name, () => {
      const sim = simulateRectifier(d.input);
      expect(sim.converged).toBe(true);
      const sp = runNgspice(rectifierNetlist(d.input));
      expect(Math.abs(sim.dcMeanV / sp.vavg - 1), `mean ${sim.dcMeanV} vs ${sp.vavg}`).toBeLessThanOrEqual(
        toleranceMeanFraction,
      );
      expect(Math.abs(sim.ripplePpV - sp.vpp), `ripple ${sim.ripplePpV} vs ${sp.vpp}`).toBeLessThanOrEqual(
        toleranceRippleFraction * sp.vpp + toleranceRippleV,
      );
      expect(Math.abs(sim.troughV - sp.vmin), `trough ${sim.troughV} vs ${sp.vmin}`).toBeLessThanOrEqual(
        toleranceTroughV,
      );
      expect(Math.abs(sim.secondaryRmsA / sp.isec - 1), `RMS ${sim.secondaryRmsA} vs ${sp.isec}`).toBeLessThanOrEqual(
        toleranceRmsFraction,
      );
      expect(Math.abs(sim.diodePeakA / sp.idpk - 1), `peak ${sim.diodePeakA} vs ${sp.idpk}`).toBeLessThanOrEqual(
        tolerancePeakFraction,
      );
    });
  }
});

describe('netlist text', () => {
  it('has a source, the behavioural diodes, the reservoir with its initial charge, .tran and six .meas lines', () => {
    const net = rectifierNetlist(designs[0].input);
    expect(net).toMatch(/^Vs p sn SIN\(0 26\.98\d* 50\)$/m);
    expect(net.match(/^B\d .* I = max\(V\(/gm)).toHaveLength(4);
    expect(net).toMatch(/^C1 c1 0 0\.01 IC=25\.48/m);
    expect(net).toMatch(/^\.tran /m);
    expect(net.match(/^\.meas tran /gm)).toHaveLength(6);
    expect(net.trim().endsWith('.end')).toBe(true);
  });
});
