// The supply choices and the new rail inputs travel with the project (database, project file), and their results
// reach the evaluation JSON and the builder's pack.
import { describe, expect, it } from 'vitest';
import { openDatabase } from '../../src/db/client';
import { insertProject, loadProject } from '../../src/db/projects';
import { parseProjectFile, toProjectFile } from '../../src/io/project-file';
import { evaluate } from '../../src/core/evaluate';
import { evaluationJson } from '../../src/io/evaluation-output';
import { buildPack } from '../../src/pdf';
import type { Project } from '../../src/core/model';
import { club30m } from '../../seed-demo/club-30m';
import { hasPoppler, pagesText, writeTemp } from '../pdf/pdf-text';

const chosen: Project = {
  ...club30m,
  supply: {
    ...club30m.supply,
    primaryFuseSheet: 'T5',
    transformerSizing: 'tune-up',
    enclosureAreaM2: 0.116,
    enclosureUWPerM2K: 5.5,
    rails: club30m.supply.rails.map((r) =>
      r.kind === 'rectified' && r.id === 'rail-pa'
        ? {
            ...r,
            bridgeMount: { thetaJcKPerW: 2.2, thetaCsKPerW: 0.5, thetaSaKPerW: 5, tjMaxC: 150 },
            bridgeFreeAirKPerW: 22,
          }
        : r.kind === 'regulated'
          ? { ...r, outputF: 100e-6, bleederOhm: 1000, bleederRatedW: 0.25 }
          : r,
    ),
  },
};

describe('supply choices and rail inputs travel with the project', () => {
  it('database: stored and loaded unchanged', async () => {
    const d = await openDatabase('file::memory:');
    await insertProject(d, chosen, '2026-01-01T00:00:00Z');
    const back = (await loadProject(d.db, chosen.id))!;
    expect(back.supply.primaryFuseSheet).toBe('T5');
    expect(back.supply.transformerSizing).toBe('tune-up');
    expect(back.supply.rails).toEqual(chosen.supply.rails.map((r) => expect.objectContaining(r)));
  });
  it('project file: exported and imported unchanged; a file without the choices reads T3 and duty (absent)', () => {
    const res = parseProjectFile(toProjectFile(chosen, '2026-01-01T00:00:00Z'));
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    expect(res.project.supply.primaryFuseSheet).toBe('T5');
    expect(res.project.supply.transformerSizing).toBe('tune-up');
    const pa = res.project.supply.rails.find((r) => r.id === 'rail-pa');
    expect(pa).toMatchObject({ bridgeMount: { thetaSaKPerW: 5 }, bridgeFreeAirKPerW: 22 });
    const old = parseProjectFile(toProjectFile(club30m, '2026-01-01T00:00:00Z'));
    expect(old.ok && old.project.supply.primaryFuseSheet === undefined).toBe(true);
  });
  it('a file with a fuse type outside the sheets is refused, naming the place', () => {
    const text = toProjectFile(chosen, '2026-01-01T00:00:00Z')
      .replace('"primaryFuseSheet": "T5"', '"primaryFuseSheet": "X9"')
      .replace('"primaryFuseSheet":"T5"', '"primaryFuseSheet":"X9"');
    const res = parseProjectFile(text);
    expect(res.ok).toBe(false);
    if (!res.ok) expect(res.errors.join(' ')).toContain('primaryFuseSheet');
  });
});

describe('results in the JSON and the pack', () => {
  const report = evaluate(chosen);
  it('JSON: per rectified rail its rectifier heat, per regulated rail its output bleeder, the choices and the air ' +
    'used', () => {
    const json = JSON.parse(JSON.stringify(evaluationJson(chosen, report)));
    const pa = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-pa');
    expect(pa.bridgeThermal).toMatchObject({ basis: 'tune-up', inside: true, heatsinkFitted: true, assumed: false });
    const reg = json.supply.rails.find((r: { railId: string }) => r.railId === 'rail-13v8');
    expect(reg.bleeder.fittedOhm).toBe(1000);
    expect(reg.bleeder.fittedTimeS).toBeGreaterThan(0);
    expect(json.supply.choices).toEqual({ primaryFuseSheet: 'T5', transformerSizing: 'tune-up' });
    expect(json.supply.thermalAmbient.inside).toBe(true);
    expect(json.supply.primary.inrush.sheet).toBe('T5');
  });
  it.skipIf(!hasPoppler)(
    'pack: the rectifier heat, the output bleeder, the fuse type and the sizing basis',
    async () => {
      const bytes = await buildPack(chosen, report, { paper: 'a4', dataDate: '2026-11-28' });
      const text = pagesText(writeTemp(bytes, 'pack.pdf')).join('\n').replace(/\s+/g, ' ');
      expect(text).toContain('Rectifier heat');
      expect(text).toContain('inside the box at');
      expect(text).toContain('Output bleeder');
      expect(text).toContain('IEC 60127-2 sheet 5');
      expect(text).toContain('sized for tune-up');
    },
  );
});
