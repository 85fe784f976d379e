// Filter rejection with the PA's own source impedance (lpf-analysis sourceTransfer / harmonicsFromSource, pa-source).
// Hand checks from circuit theory (voltage divider, current divider) and the equal-termination S21 of the chain
// matrix, S21 = 2 / (A + B/Z0 + C Z0 + D) (Pozar, Microwave Engineering, 4th ed. 2012, Table 4.2, from memory); and an
// ngspice AC analysis of the same filter driven from each kind of source (netlist written here from scratch).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { NGSPICE, requireTool } from '../../helpers/tools';
import {
  harmonicsFromSource,
  inputImpedance,
  ladderOf,
  pointAt,
  sourceTransfer,
  type Ladder,
} from '../../../src/core/rf/lpf-analysis';
import { designLpf } from '../../../src/core/rf/lpf-design';
import { harmonicCurrentFinding, harmonicCurrentRatio, paSource } from '../../../src/core/rf/pa-source';
import { evaluateRf } from '../../../src/core/rf/evaluate-rf';
import { lpfParams, paParams, project } from './fixture';
import { near } from './helpers';

const one = (kind: 0 | 1, value: number, r0 = 50): Ladder => ({
  kinds: Uint8Array.from([kind]),
  values: Float64Array.from([value]),
  inductorQ: Infinity,
  capacitorQ: Infinity,
  r0Ohm: r0,
});
const mag = (c: { re: number; im: number }) => Math.hypot(c.re, c.im);

describe('source transfer, hand checks', () => {
  const f = 1e6;
  const w = 2 * Math.PI * f;
  it('stiff voltage source, series L into R: |V_L/E| = R/|R + jωL| (voltage divider)', () => {
    const l = one(1, 10e-6);
    near(mag(sourceTransfer(l, f, 'thevenin', { re: 0, im: 0 })), 50 / Math.hypot(50, w * 10e-6), 1e-12, 'H');
  });
  it('ideal current source, shunt C and R: |V_L/I| = R/|1 + jωCR| (current divider)', () => {
    const l = one(0, 1e-9);
    near(mag(sourceTransfer(l, f, 'norton', null)), 50 / Math.hypot(1, w * 1e-9 * 50), 1e-9, 'H');
  });
  it('a 50 Ω voltage source gives |S21|/2 of the chain matrix, so the relative rejection equals the 50 Ω one', () => {
    const d = designLpf(lpfParams(), 7.03e6);
    if (!d.ok) throw new Error('design');
    const l = ladderOf(d.value);
    for (const row of harmonicsFromSource(l, 7.03e6, 'thevenin', () => ({ re: 50, im: 0 }))) {
      near(row.relativeAttenuationDb, row.relative50Db, 1e-9, `n=${row.n}`);
    }
    // |S21|^2 = 10^(-IL/10): |H| = |S21|/2 at 3f
    const h = mag(sourceTransfer(l, 3 * 7.03e6, 'thevenin', { re: 50, im: 0 }));
    near(20 * Math.log10(2 * h), -pointAt(l, 3 * 7.03e6).lossDb, 1e-9, 'S21');
  });
  it('Norton with a finite impedance is the Thevenin source of E = I Zs (source transformation)', () => {
    const l = one(1, 2e-6);
    const zs = { re: 20, im: 5 };
    const hn = sourceTransfer(l, f, 'norton', zs);
    const ht = sourceTransfer(l, f, 'thevenin', zs);
    near(mag(hn), mag(ht) * mag(zs), 1e-12, 'Norton');
  });
  it('an infinite source impedance is refused for a voltage source', () => {
    expect(() => sourceTransfer(one(1, 1e-6), f, 'thevenin', null)).toThrow(/Norton/);
  });
});

describe('the PA as a source by class', () => {
  const base = { primaryOhm: 12.5, peakDeviceA: 2, classESimulated: false };
  it('push-pull class D: 4 Rds(on) on the full primary, x 50/12.5 at the filter: 4 x 0.1 x 4 = 1.6 Ω', () => {
    const s = paSource({
      ...base,
      pa: paParams({ amplifierClass: 'D', topology: 'push-pull', rdsOnOhm: 0.1, saturationV: null }),
    });
    expect(s.kind).toBe('thevenin');
    near(s.zsAt(3)!.re, 1.6, 1e-12, 'Zs');
  });
  it('class B/C: a current source (Norton, infinite impedance)', () => {
    const s = paSource({ ...base, pa: paParams({ amplifierClass: 'C' }) });
    expect(s.kind).toBe('norton');
    expect(s.zsAt(2)).toBeNull();
  });
  it('class E: the series network at 2f is j R_L (30 x 2 − 28.8475/2) = j 2278.8 Ω for 50 Ω (L0 = QL R/ω, ' +
    'class-e-sim)', () => {
    const s = paSource({
      ...base,
      pa: paParams({ amplifierClass: 'E', topology: 'single-ended' }),
      classESimulated: true,
    });
    expect(s.kind).toBe('design-load');
    near(s.zsAt(2)!.im, 50 * (60 - (30 - 1.1525) / 2), 1e-9, 'X');
    near(s.zsAt(1)!.im, 50 * 1.1525, 1e-9, 'X at f: the excess reactance');
  });
});

describe('harmonic current a stiff source drives into the filter (Ohm\'s law)', () => {
  // one shunt capacitor of 1 nF across 50 Ω at 7 MHz: Z_in(n f) = 50 / (1 + j n ωCR) (current divider); Zs = 1 Ω
  const f = 7e6;
  const l = one(0, 1e-9);
  const zin = (n: number) => inputImpedance(l, n * f);
  const zs = () => ({ re: 1, im: 0 });
  it('input impedance of R ∥ C is R / (1 + jωCR)', () => {
    const b = 2 * Math.PI * f * 1e-9 * 50;
    near(zin(1).re, 50 / (1 + b * b), 1e-9, 're');
    near(zin(1).im, (-50 * b) / (1 + b * b), 1e-9, 'im');
  });
  it('3rd harmonic at 1/3 of the voltage: I3/I1 = (1/3) |1 + Zin(f)| / |1 + Zin(3f)|, worked out here', () => {
    const w = 2 * Math.PI * f;
    const z = (n: number) => {
      const b = n * w * 1e-9 * 50;
      return { re: 1 + 50 / (1 + b * b), im: (-50 * b) / (1 + b * b) };
    };
    const expected = ((1 / 3) * Math.hypot(z(1).re, z(1).im)) / Math.hypot(z(3).re, z(3).im);
    near(harmonicCurrentRatio(zs, zin, 3, 1 / 3), expected, 1e-12, 'ratio');
    // about 0.91 here (21.1 Ω against 7.7 Ω, over 3): above the 30 % threshold
    // (common practice), so the finding is given
    expect(harmonicCurrentFinding(expected, 3, 'PA')?.severity).toBe('caution');
  });
  it('a series inductor first keeps the current low: no finding', () => {
    const li = one(1, 2e-6);
    const r = harmonicCurrentRatio(zs, (n) => inputImpedance(li, n * f), 3, 1 / 3);
    expect(r).toBeLessThan(0.3);
    expect(harmonicCurrentFinding(r, 3, 'PA')).toBeNull();
  });
});

describe('in the evaluation: push-pull class D into each filter form', () => {
  const rig = (form: 'capacitor-input' | 'inductor-input') => {
    const p = project();
    return evaluateRf(
      {
        ...p,
        stages: p.stages.map((st) =>
          st.pa
            ? { ...st, pa: paParams({ amplifierClass: 'D', rdsOnOhm: 0.1, saturationV: null }) }
            : st.lpf
              ? { ...st, lpf: lpfParams({ form }) }
              : st,
        ),
      },
      { paRailV: { pa: 13.8 } },
    );
  };
  it('capacitor-input: the harmonic-current caution, and the rows say the filter is judged from a stiff source', () => {
    const r = rig('capacitor-input');
    expect(r.findings.some((f) => f.rule === 'pa.harmonic-current')).toBe(true);
    expect(r.harmonics!.rows[1].sourceBasis).toMatch(/stiff voltage source/);
  });
  it('inductor-input: no such caution', () => {
    expect(rig('inductor-input').findings.some((f) => f.rule === 'pa.harmonic-current')).toBe(false);
  });
});

const haveNgspice = requireTool(NGSPICE, 'SPICE check of the sourced filter rejection', 'apt-get install ngspice');
const dir = haveNgspice ? mkdtempSync(join(tmpdir(), 'rw-src-')) : '';
afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

// ngspice AC analysis of the lossless filter (as built) between a source of each kind and 50 Ω; the program's
// relative rejection must agree within 0.05 dB (both solve the same linear circuit; 7-digit values in the netlist)
describe.skipIf(!haveNgspice)('sourced rejection vs ngspice AC analysis', () => {
  const F0 = 7.03e6;
  const d = designLpf(lpfParams({ form: 'inductor-input', inductorQ: 10000, capacitorQ: 100000 }), F0);
  if (!d.ok) throw new Error('design');
  const l = ladderOf(d.value, 'built', true);
  const ladder = d.value.elements
    .map((e, i) =>
      e.kind === 'series-inductor'
        ? `L${i} n${i} n${i + 1} ${e.builtValue.toPrecision(7)}`
        : `C${i} n${i} 0 ${e.builtValue.toPrecision(7)}\nV${i} n${i} n${i + 1} 0`,
    )
    .join('\n');
  const last = `n${d.value.elements.length}`;
  const spice = (source: string, name: string) => {
    const lines = ['* sourced filter', source, ladder, `RL ${last} 0 50`, '.control'];
    for (const n of [1, 2, 3, 4, 5]) lines.push(`ac lin 1 ${n * F0} ${n * F0}`, `print vm(${last})`);
    lines.push('.endc', '.end');
    const file = join(dir, `${name}.cir`);
    writeFileSync(file, lines.join('\n'));
    const out = spawnSync(NGSPICE as string, ['-b', file], { encoding: 'utf8' }).stdout;
    return [...out.matchAll(/^vm\(\S+\)\s*=\s*(\S+)/gm)].map((m) => Number(m[1]));
  };
  const cases: [string, string, 'thevenin' | 'norton', { re: number; im: number } | null][] = [
    ['stiff source 1.6 ohm', 'VS s 0 AC 1\nRS s n0 1.6', 'thevenin', { re: 1.6, im: 0 }],
    ['ideal current source', 'IS 0 n0 AC 1', 'norton', null],
  ];
  for (const [name, src, kind, zs] of cases) {
    it(`${name}: rejection at 2f..5f relative to f`, () => {
      const v = spice(src, name.replace(/\W+/g, '_'));
      expect(v.length, 'five AC points').toBe(5);
      const rows = harmonicsFromSource(l, F0, kind, () => zs);
      for (const r of rows) {
        const spiceDb = 20 * Math.log10(v[0] / v[r.n - 1]);
        near(r.relativeAttenuationDb, spiceDb, 0.05, `n=${r.n}: ngspice ${spiceDb.toFixed(2)} dB`);
      }
    });
  }
  it('the stiff source rejects the 3rd harmonic less than a 50 Ω source would (the issue: a few dB apart)', () => {
    const rows = harmonicsFromSource(l, F0, 'thevenin', () => ({ re: 1.6, im: 0 }));
    const third = rows.find((r) => r.n === 3)!;
    expect(third.relativeAttenuationDb).not.toBeCloseTo(third.relative50Db, 0);
  });
});
