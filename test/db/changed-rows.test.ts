// Writes store only the child rows that changed (src/db/projects.ts writeChildren). Whatever an edit does to the
// rows (reorder, remove, add, move to another parent, clear a value), reading the project back must give exactly
// what was written, as the whole rewrite did: a round trip, no computed values involved.
import { describe, it, expect } from 'vitest';
import { openDatabase } from '../../src/db/client';
import { insertProject, loadProject, changeProject } from '../../src/db/projects';
import { DEMO_PROJECTS } from '../../seed-demo/index';
import type { Project } from '../../src/core/model';

const NOW = '2026-12-01T00:00:00Z';

async function stored(change: (p: Project) => Project, prepare: (p: Project) => void = () => {}) {
  const d = await openDatabase('file::memory:');
  const club = structuredClone(DEMO_PROJECTS[0]);
  prepare(club);
  await insertProject(d, club, NOW);
  const saved = await changeProject(d, club.id, (p) => change(structuredClone(p)), NOW);
  const read = await loadProject(d.db, club.id);
  const rows = async (table: string) =>
    Number((await d.client.execute(`select count(*) as n from ${table}`)).rows[0].n);
  return { saved, read, rows, club };
}

describe('changed-row writes', () => {
  it('reads back reordered stages, a removed load row and a changed current exactly as written', async () => {
    let expected: Project | null = null;
    const { read } = await stored((p) => {
      const stages = [...p.stages].reverse();
      const loaded = stages.flatMap((s, i) => (s.loads.length ? [i] : []));
      expect(loaded.length).toBeGreaterThanOrEqual(2);
      const [a, b] = loaded;
      stages[a] = { ...stages[a], loads: stages[a].loads.slice(0, -1) };
      const [l0, ...more] = stages[b].loads;
      stages[b] = {
        ...stages[b],
        loads: [{ ...l0, currentA: { ...l0.currentA, receive: l0.currentA.receive + 0.001 } }, ...more],
      };
      expected = { ...p, stages };
      return expected;
    });
    expect(read).toEqual({ ...expected!, version: 2 });
  });

  it('moves a winding to a new transformer, clears its resistance and drops a part with its offers', async () => {
    let expected: Project | null = null;
    const { read, rows, club } = await stored(
      (p) => {
        const [first, ...rest] = p.supply.transformers;
        const [moved, ...kept] = first.windings;
        const fresh = {
          id: 'tr-new',
          name: 'Second transformer',
          construction: first.construction,
          windings: [{ ...moved, resistanceOhm: null }],
        };
        const unused = p.parts.find((part) => !p.bom.some((b) => b.partId === part.id));
        const parts = unused ? p.parts.filter((x) => x !== unused) : p.parts;
        expected = {
          ...p,
          parts,
          supply: { ...p.supply, transformers: [{ ...first, windings: kept }, ...rest, fresh] },
        };
        return expected;
      },
      (p) => void (p.supply.transformers[0].windings[0].resistanceOhm = 0.5),
    );
    expect(read).toEqual({ ...expected!, version: 2 });
    expect(read!.supply.transformers.at(-1)!.windings[0].resistanceOhm).toBeNull();
    // no orphan rows: as many offers and windings stored as the project has
    expect(await rows('offers')).toBe(expected!.parts.reduce((n, p) => n + p.offers.length, 0));
    expect(await rows('windings')).toBe(club.supply.transformers.reduce((n, t) => n + t.windings.length, 0));
  });

  it('an unchanged project writes the same rows and reads back equal', async () => {
    const { read, club } = await stored((p) => p);
    expect(read).toEqual({ ...club, version: 2 });
  });
});
