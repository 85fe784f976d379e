// The built-in rectifier simulation against committed ngspice results (test/fixtures/rectifier-golden/golden.json):
// netlists, ngspice version and the regeneration command are in that folder (scripts/rectifier-golden.ts). ngspice
// is an independent SPICE engine; both use the same piecewise-linear diode (Vf + r_d), so differences come from the
// integration and the steady-state search. This test needs no ngspice: it reads the fixture.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { simulateRectifier, type RectifierSimInput } from '../../../src/core/power/rectifier-sim';
import { rectifierNetlist } from '../../../src/core/power/spice-netlist';

const DIR = join(__dirname, '..', '..', 'fixtures', 'rectifier-golden');
interface GoldenCase {
  id: string;
  what: string;
  netlist: string;
  input: RectifierSimInput;
  ngspice: Record<'vavg' | 'vpp' | 'vmin' | 'vmax' | 'isec' | 'idpk', number>;
}
const golden = JSON.parse(readFileSync(join(DIR, 'golden.json'), 'utf8')) as {
  provenance: Record<string, string>;
  cases: GoldenCase[];
};

// Tolerances (named with units), as in the live ngspice cross-check
const toleranceMeanFraction = 0.003; // DC mean, 0.3 %
const toleranceRippleFraction = 0.03; // ripple p-p, 3 %
const toleranceRippleV = 0.01; // plus 10 mV absolute
const toleranceV = 0.05; // trough and peak, 50 mV
const toleranceRmsFraction = 0.02; // winding RMS current, 2 %
const tolerancePeakFraction = 0.03; // repetitive diode peak, 3 %

describe('rectifier simulation against the committed ngspice fixture', () => {
  it('the fixture names its tool and its regeneration command', () => {
    expect(golden.provenance.tool).toMatch(/^ngspice-\d+/);
    expect(golden.provenance.command).toMatch(/scripts\/rectifier-golden\.ts/);
    expect(golden.cases.length).toBeGreaterThanOrEqual(8);
  });
  for (const c of golden.cases) {
    it(`${c.id}: ${c.what}`, () => {
      // the committed netlist is what the netlist writer makes for this input (else: regenerate the fixture)
      expect(readFileSync(join(DIR, c.netlist), 'utf8')).toBe(rectifierNetlist(c.input, { title: c.what }));
      const sim = simulateRectifier(c.input);
      const sp = c.ngspice;
      expect(sim.converged).toBe(true);
      expect(Math.abs(sim.dcMeanV / sp.vavg - 1), `mean ${sim.dcMeanV} vs ${sp.vavg}`).toBeLessThanOrEqual(
        toleranceMeanFraction,
      );
      expect(Math.abs(sim.ripplePpV - sp.vpp), `ripple ${sim.ripplePpV} vs ${sp.vpp}`).toBeLessThanOrEqual(
        toleranceRippleFraction * sp.vpp + toleranceRippleV,
      );
      expect(Math.abs(sim.troughV - sp.vmin), `trough ${sim.troughV} vs ${sp.vmin}`).toBeLessThanOrEqual(toleranceV);
      expect(Math.abs(sim.peakV - sp.vmax), `peak ${sim.peakV} vs ${sp.vmax}`).toBeLessThanOrEqual(toleranceV);
      expect(Math.abs(sim.secondaryRmsA / sp.isec - 1), `RMS ${sim.secondaryRmsA} vs ${sp.isec}`).toBeLessThanOrEqual(
        toleranceRmsFraction,
      );
      expect(Math.abs(sim.diodePeakA / sp.idpk - 1), `peak ${sim.diodePeakA} vs ${sp.idpk}`).toBeLessThanOrEqual(
        tolerancePeakFraction,
      );
    });
  }
});
