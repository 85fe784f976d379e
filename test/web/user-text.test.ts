// What a builder reads: no internal working-note references or confidence tags on any page, in the CLI output (text
// and --json) or in the pack text; every finding resolves to a registry source; the verdict counts only actionable
// findings, standing cautions get their own block; the Sources page lists each source with the checks it backs.
import { describe, expect, it } from 'vitest';
import { demoApp } from '../helpers/app';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import { evaluate } from '../../src/core/evaluate';
import { renderEvaluationText, evaluationJson } from '../../src/io/evaluation-output';
import { buildPack } from '../../src/pdf';
import { OverviewBody } from '../../views/pages/overview';
import { hasPoppler, pagesText, POPPLER_MISSING, writeTemp } from '../pdf/pdf-text';

// Internal references: the developers' reference notes and their section numbers, confidence tags, and labels that
// stood where a source should. (Program rule: users see only registry text.)
const INTERNAL = [
  /REFERENCE-VALUES/i,
  /reference values/i,
  /\bref\.? ?§/i,
  /§/,
  /\[(M|C|C2|D|P)\]/,
  /\binput check\b/i,
  /\bProject data\b/,
  /\bProgram check\b/,
  /\bCircuit topology\b/,
  /\bSupply tree\b/,
  /script check/i,
  /Input definition of this field/,
];
const leaks = (text: string) =>
  INTERNAL.filter((re) => re.test(text)).map(
    (re) => `${re}: …${text.slice(Math.max(0, text.search(re) - 60), text.search(re) + 60)}…`,
  );

if (!hasPoppler) console.warn(`[skip] ${POPPLER_MISSING}`);

describe('no internal references or confidence tags reach the builder', () => {
  it('pages of both demos (every project page)', async () => {
    const { get } = await demoApp();
    expect(leaks(await (await get('/')).text()), 'project list').toEqual([]);
    for (const p of DEMO_PROJECTS) {
      for (const path of ['', '/supply', '/rf', '/parts', '/bom', '/pack', '/sources']) {
        const res = await get(`/projects/${p.id}${path}`);
        expect(res.status, `${p.id}${path}`).toBe(200);
        expect(leaks(await res.text()), `${p.id}${path}`).toEqual([]);
      }
    }
  });

  it('CLI output of both demos, text and --json', () => {
    for (const p of DEMO_PROJECTS) {
      const report = evaluate(structuredClone(p));
      expect(leaks(renderEvaluationText(p, report)), `${p.id} text`).toEqual([]);
      const json = JSON.stringify(evaluationJson(p, report));
      expect(leaks(json), `${p.id} json`).toEqual([]);
      // every finding in the JSON carries the registry text and its kind
      const parsed = JSON.parse(json) as { findings: { source: string; sourceKey: string; kind: string }[] };
      for (const f of parsed.findings) {
        expect(f.source.length).toBeGreaterThan(10);
        expect(f.source).not.toBe(f.sourceKey);
        expect(['actionable', 'standing']).toContain(f.kind);
      }
    }
  });

  it.skipIf(!hasPoppler)('pack text of both demos (pdftotext)', async () => {
    for (const p of DEMO_PROJECTS) {
      const bytes = await buildPack(p, evaluate(structuredClone(p)), { paper: 'a4', dataDate: '2026-12-01' });
      const text = pagesText(writeTemp(bytes, `${p.id}.pdf`)).join('\n');
      expect(leaks(text), p.id).toEqual([]);
      expect(text).toMatch(/Sources/);
      expect(text).toMatch(/Rule set: US \(FCC\)/);
      expect(text).toMatch(/Standing cautions/);
    }
  });
});

describe('verdict: only actionable findings count', () => {
  it("the club demo's Needs attention lists no standing caution; the standing block lists each once", async () => {
    const { get } = await demoApp();
    const html = await (await get('/projects/demo-club-30m')).text();
    const needs = html.slice(html.indexOf('Needs attention'), html.indexOf('standing-cautions'));
    const report = evaluate(structuredClone(DEMO_PROJECTS[0]));
    const standingRules = new Set(report.findings.filter((x) => x.kind === 'standing').map((x) => x.rule));
    expect(standingRules.size).toBeGreaterThan(3);
    for (const rule of standingRules) expect(needs.includes(`data-rule="${rule}"`), rule).toBe(false);
    // and every actionable caution or failure is there
    for (const f of report.findings.filter((x) => x.kind !== 'standing' && x.severity !== 'ok'))
      expect(needs.includes(`data-rule="${f.rule}"`), f.rule).toBe(true);
    const standingBlock = html.slice(html.indexOf('standing-cautions'));
    for (const rule of ['spurious.measure', 'exposure.local-rules', 'pa.heat-safety']) {
      expect(standingBlock.split(`data-rule="${rule}"`).length - 1, rule).toBe(1);
    }
  });

  it('a design with no actionable problem shows OK on the page and on the pack cover', async () => {
    // the portable demo's report with its actionable cautions and failures removed (as if fixed); standing ones kept
    const p = structuredClone(DEMO_PROJECTS[1]);
    const r = evaluate(p);
    const keep = (fs: typeof r.findings) => fs.filter((f) => f.severity === 'ok' || f.kind === 'standing');
    const clean = {
      ...r,
      findings: keep(r.findings),
      budget: { ...r.budget, findings: keep(r.budget.findings) },
      supply: r.supply && { ...r.supply, findings: keep(r.supply.findings) },
      rf: { ...r.rf, findings: keep(r.rf.findings) },
      cost: { ...r.cost, findings: keep(r.cost.findings) },
      catalog: keep(r.catalog),
    };
    expect(clean.findings.some((f) => f.kind === 'standing' && f.severity === 'caution')).toBe(true);
    const html = String(OverviewBody({ project: p, report: clean }));
    expect(html).toMatch(/data-verdict="ok"/);
    expect(html).toMatch(/Standing cautions/);
    if (!hasPoppler) return;
    const text = pagesText(writeTemp(await buildPack(p, clean, { paper: 'a4', dataDate: '2026-12-01' }), 'ok.pdf'))[0];
    expect(text).toMatch(/overall: OK/);
  });
});

describe('Sources page', () => {
  it('lists the rule set and every source the club demo cites, each with the checks it backs', async () => {
    const { get } = await demoApp();
    const html = await (await get('/projects/demo-club-30m/sources')).text();
    expect(html).toMatch(/Rule set: <strong>US \(FCC\)<\/strong>/);
    expect(html).toMatch(/Local rules and your licence conditions govern/);
    const report = evaluate(structuredClone(DEMO_PROJECTS[0]));
    for (const f of report.findings) expect(html.includes(`data-source="${f.source}"`), f.source).toBe(true);
    // the checks a source backs are named in the pages' words, never by the program's rule keys
    for (const f of report.findings) expect(html.includes(`(${f.rule})`), f.rule).toBe(false);
    expect(html).toMatch(/47 CFR 97\.307\(d\)/);
    expect(html).toMatch(/PARIS word convention/);
  });
});

describe('a new 230 V project shows its rule set, its limits and its sources', () => {
  it('created through the form with the 230 V / 50 Hz preset: ITU / CEPT on the RF page, the Sources page and the ' +
    'pack', async () => {
    const { post, get } = await demoApp();
    const res = await post('/projects', { name: '40 m 230 V', band: '7.03 MHz', power: '10 W', mains: '230-50' });
    expect(res.status).toBe(303);
    const path = res.headers.get('Location')!;
    const rf = await (await get(`${path}/rf`)).text();
    expect(rf).toMatch(/data-rule-set="itu-app3"/);
    expect(rf).toMatch(/Rule set: ITU \/ CEPT\./);
    expect(rf).toMatch(/ICNIRP \(1998\)/);
    expect(rf).toMatch(/IEC 60038/);
    expect(rf).toMatch(/Local rules and your licence conditions govern/);
    expect(leaks(rf)).toEqual([]);
    const sources = await (await get(`${path}/sources`)).text();
    expect(sources).toMatch(/Rule set: <strong>ITU \/ CEPT<\/strong>/);
    expect(sources).toMatch(/Radio Regulations, Appendix 3/);
    expect(leaks(sources)).toEqual([]);
  });
});
