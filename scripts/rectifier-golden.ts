// Regenerates test/fixtures/rectifier-golden/: the rectifier cases of the worked 230 V / 18 V / 3 A / 10,000 µF
// example and its source-resistance sweep, each as a netlist run in ngspice (an independent SPICE engine), with the
// ngspice version and the measured results in golden.json. The tests read that file; they never run this script.
//   npx tsx scripts/rectifier-golden.ts        (needs ngspice on PATH: apt-get install ngspice)
import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { rectifierNetlist } from '../src/core/power/spice-netlist';
import type { RectifierSimInput } from '../src/core/power/rectifier-sim';

const DIR = join(import.meta.dirname, '..', 'test', 'fixtures', 'rectifier-golden');

// 18 V rated winding, 6 % regulation: V_NL = 19.08 V, R_s = 0.06 x 18^2 / 100 = 0.194 ohm; diodes 0.75 V + 0.02 ohm
const base = (mainsFactor: number, over: Partial<RectifierSimInput> = {}): RectifierSimInput => ({
  topology: 'bridge',
  secondaryVrms: 19.08 * mainsFactor,
  windingResistanceOhm: 0.194,
  frequencyHz: 50,
  diodeDropV: 0.75,
  diodeResistanceOhm: 0.02,
  capacitanceF: 0.01,
  esrOhm: 0,
  load: { kind: 'current', currentA: 3 },
  ...over,
});
const CASES: { id: string; what: string; input: RectifierSimInput }[] = [
  { id: 'bridge-low', what: 'bridge, mains -10 %', input: base(0.9) },
  { id: 'bridge-nominal', what: 'bridge, nominal mains', input: base(1) },
  { id: 'bridge-high', what: 'bridge, mains +10 %', input: base(1.1) },
  {
    id: 'bridge-rs0',
    what: 'bridge, 18 V, no source resistance',
    input: base(1, { secondaryVrms: 18, windingResistanceOhm: 0 }),
  },
  {
    id: 'bridge-rs0097',
    what: 'bridge, 3 % regulation, 100 VA (0.097 ohm)',
    input: base(1, { secondaryVrms: 18 * 1.03, windingResistanceOhm: 0.097 }),
  },
  {
    id: 'bridge-rs0324',
    what: 'bridge, 10 % regulation, 100 VA (0.324 ohm)',
    input: base(1, { secondaryVrms: 18 * 1.1, windingResistanceOhm: 0.324 }),
  },
  {
    id: 'centre-tap-1a',
    what: 'centre-tap, 1 A, 0.3 ohm per half',
    input: base(1, {
      topology: 'centre-tap',
      secondaryVrms: 16.5,
      windingResistanceOhm: 0.3,
      capacitanceF: 0.0047,
      diodeDropV: 0.8,
      diodeResistanceOhm: 0.03,
      load: { kind: 'current', currentA: 1 },
    }),
  },
  {
    id: 'half-wave-47r',
    what: 'half-wave, 47 ohm, 1 ohm winding, 60 Hz',
    input: base(1, {
      topology: 'half-wave',
      secondaryVrms: 14,
      windingResistanceOhm: 1,
      frequencyHz: 60,
      capacitanceF: 0.0022,
      diodeDropV: 0.8,
      diodeResistanceOhm: 0.03,
      esrOhm: 0.02,
      load: { kind: 'resistance', resistanceOhm: 47 },
    }),
  },
];

const version = spawnSync('ngspice', ['-v'], { encoding: 'utf8' });
if (version.error) throw new Error('ngspice not found on PATH (apt-get install ngspice)');
const versionLine =
  `${version.stdout}`
    .split('\n')
    .find((l) => /ngspice-\d+/.test(l))
    ?.replace(/^\*+\s*/, '')
    .trim() ?? 'unknown';

mkdirSync(DIR, { recursive: true });
const results = CASES.map((c) => {
  const file = `${c.id}.cir`;
  writeFileSync(join(DIR, file), rectifierNetlist(c.input, { title: c.what }));
  const run = spawnSync('ngspice', ['-b', file], { cwd: DIR, encoding: 'utf8', timeout: 120_000 });
  const out = `${run.stdout ?? ''}\n${run.stderr ?? ''}`;
  const m: Record<string, number> = {};
  for (const x of out.matchAll(/^(vavg|vpp|vmin|vmax|isec|idpk)\s*=\s*([-+0-9.eE]+)/gm)) m[x[1]] = Number(x[2]);
  if (Object.keys(m).length < 6) throw new Error(`${c.id}: ngspice gave no results\n${out.slice(-1500)}`);
  return { id: c.id, what: c.what, netlist: file, input: c.input, ngspice: m };
});
const golden = {
  provenance: {
    tool: versionLine,
    command:
      'npx tsx scripts/rectifier-golden.ts (writes the netlists, runs "ngspice -b <netlist>" in this folder, reads ' +
        'the .meas lines)',
    netlists:
      'this folder, one per case; diodes are behavioural I = max(Vak - Vf, 0) / r_d, the same element model as the ' +
        'built-in simulation',
    units:
      'vavg, vpp, vmin, vmax in V over the last whole mains cycle; isec = winding RMS current, idpk = peak current ' +
        'of one diode, in A',
  },
  cases: results,
};
writeFileSync(join(DIR, 'golden.json'), `${JSON.stringify(golden, null, 2)}\n`);
console.log(`wrote ${results.length} cases with ${versionLine} to ${DIR}`);
