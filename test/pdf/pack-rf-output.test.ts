// The builder's pack carries the RF page's output parts: the output transformer's flux and fit (club), the L and pi
// networks and the class-E shunt capacitance against the device's own (portable, matched by a network), and the
// filter parts' flux and capacitor ratings beside their RF voltage and current. Values entered in the demos are read
// back; the class-E shunt capacitance is checked against the published design equation.
import { describe, expect, it, beforeAll } from 'vitest';
import { club30m } from '../../seed-demo/club-30m';
import { portable20m } from '../../seed-demo/portable-20m';
import type { Project } from '../../src/core/model';
import { buildPack } from '../../src/pdf';
import { evaluationFor } from './fixture';
import { hasPoppler, POPPLER_MISSING, pagesText, writeTemp } from './pdf-text';

if (!hasPoppler) console.warn(POPPLER_MISSING);
const DATE = '2026-12-02';
const NETWORK_OHM = 12.5;
const COSS_F = 150e-12;

const textOf = async (p: Project, name: string) =>
  pagesText(writeTemp(await buildPack(p, evaluationFor(p), { paper: 'a4', dataDate: DATE, part: 'builder' }), name))
    .join('\n')
    .replace(/\s+/g, ' ');

/**
 * The portable demo matched by a network to 12.5 Ω at the drain, its device's
 * output capacitance and a 56 V clamp entered.
 */
const networked: Project = {
  ...portable20m,
  stages: portable20m.stages.map((s) =>
    s.pa ? { ...s, pa: { ...s.pa, networkLoadOhm: NETWORK_OHM, deviceCossF: COSS_F, drainClampV: 56 } } : s,
  ),
};

/** The club's push-pull stage matched by a network (no transformer): the pi network is the balanced form. */
const balanced: Project = {
  ...club30m,
  stages: club30m.stages.map((s) =>
    s.pa
      ? { ...s, pa: { ...s.pa, turnsRatio: null, networkLoadOhm: 25, outputCoreId: null, outputPrimaryTurns: null } }
      : s,
  ),
};

describe.skipIf(!hasPoppler)('pack: RF output parts', () => {
  let club = '';
  let net = '';
  let bal = '';
  beforeAll(async () => {
    club = await textOf(club30m, 'club.pdf');
    net = await textOf(networked, 'net.pdf');
    bal = await textOf(balanced, 'balanced.pdf');
  });

  it('club matched by a network: the balanced pi, its series inductance split into two legs', () => {
    expect(bal).toMatch(
      /Pi network 25 Ω drain to drain to 50 Ω, loaded Q [\d.]+; balanced: the series inductance split into two legs/,
    );
    expect(bal).toMatch(/Series inductor [\d.]+ [nµ]H ideal \([\d.]+ [nµ]H a leg\)/);
  });

  it('club: the output transformer on its catalog core, its flux against the limit and the winding fit', () => {
    expect(club).toMatch(/Push-pull MOSFET final: output network/);
    // the club's binocular catalog core, 2 primary turns (seed-demo/club-30m.ts)
    expect(club).toMatch(/Output transformer core Ferrite binocular core[^:]*: 2 primary and \d+ secondary turns/);
    expect(club).toMatch(
      /Flux density \(peak\) [\d.]+ mT at [\d.]+ V RMS and [\d.]+ MHz \(B = V \/ \(4\.44 f N Ae\)\) against the core's 30 mT/,
    );
    expect(club).toMatch(/Winding fit \d+ turns of the entered wire; room for about \d+/);
  });

  it('club: the filter parts table shows the flux limit and the capacitors\' entered ratings (500 V, 3 A)', () => {
    expect(club).toContain('Limit / rating');
    // the 12.7 mm catalog toroid's flux limit 15 mT (seed-demo/cores.ts), the capacitors rated 500 V and 3 A
    expect(club).toMatch(/flux ≤ 15\.0 mT/);
    expect(club).toMatch(/500 V, 3 A/);
  });

  it('portable with a network: L network, pi network with standard capacitors and turns, class-E shunt', () => {
    expect(net).toMatch(/L network 12\.5 Ω to 50 Ω/);
    expect(net).toMatch(/Pi network 12\.5 Ω drain load to 50 Ω, loaded Q/);
    expect(net).toMatch(/Drain-side capacitor [\d.]+ [pn]F ideal; fit [^=]+ = [\d.]+ [pn]F/);
    expect(net).toMatch(/Series inductor [\d.]+ [nµ]H ideal; \d+ turns on the chosen core/);
    expect(net).toMatch(/Load-side capacitor [\d.]+ [pn]F ideal; fit/);
    // Source: nominal class-E shunt capacitance C1 = 0.1836 / (ω R) (N. O. Sokal and A. D. Sokal, IEEE JSSC
    // SC-10(3), 1975): at 14.06 MHz and 12.5 Ω, 0.1836 / (2π × 14.06e6 × 12.5) = 166.3 pF
    const m = /Class-E shunt capacitance ([\d.]+) pF per switch needed; the device gives 150 pF; add/.exec(net);
    expect(m).not.toBeNull();
    const handF = 0.1836 / (2 * Math.PI * 14.06e6 * NETWORK_OHM);
    expect(Math.abs(Number(m![1]) * 1e-12 - handF) / handF).toBeLessThan(0.01);
  });

  it('portable with a clamp: the pack names the fitted clamp and what it does at the design and the worst load', () => {
    expect(net).toMatch(/Drain clamp 56 V fitted; design load: [^;]+; worst load \([^)]*reflection phase \d+°\)\)?: /);
  });
  it('club: the PA output says where each figure is (at the PA or the antenna connector; design load, as built)',
    () => {
    // wording only: the figures are the program's own, so any number stands in their place
    expect(club).toMatch(new RegExp(String.raw`Output [\d.]+ W \([\d.]+ dBm\) at the PA into its design load at ` +
      String.raw`[\d.]+ V; [\d.]+ W at the antenna connector after the filter's [\d.]+ dB loss`));
    expect(club).toMatch(new RegExp(String.raw`Matched antenna through the filter as built the PA sees [^(]*` +
      String.raw`\(filter input SWR [\d.]+\): [\d.]+ W \([\d.]+ W into the design load\)`));
    expect(club).toMatch(/efficiency 70 % \(class default, common practice\)/);
    expect(club).toContain('(chosen from the band)');
    expect(club).toMatch(/Phase is the angle of the antenna's reflection coefficient/);
    // floor −70 dBc (common practice) against 43 dB (47 CFR 97.307(d)): a margin of at least 70 − 43 = 27 dB
    expect(club).toMatch(/by construction by construction by construction at least 27 dB/);
    // the supply section's recommended-winding row names the winding it recommends and what the PA gives with it
    expect(club).toMatch(new RegExp(String.raw`20 V winding, recommended [\d.]+ V with it the rail is [\d.]+ V at ` +
      String.raw`low mains, key-down, and Push-pull MOSFET final gives about [\d.]+ W \([\d.]+ W with the winding ` +
      'as fitted\\)'));
  });
});
