// Rows <-> core Project. A project is written whole inside one serialised transaction. Each write bumps its
// version number and keeps a snapshot of the stored result (project_versions), so the web layer can merge a
// form loaded at an older version field by field (src/web/edit.ts); a plain version check refuses stale writes.
import { eq, asc, inArray, and, lte, getTableColumns } from 'drizzle-orm';
import type { Database, Tx, Db } from './client';
import { STAGE_DATA, type StageDataKey } from '../core/spec/stage-data';
import * as t from './schema';
import type { FuseSheet, TransformerSizing } from '../core/model';
import type { Project, Rail, Stage, Part, BomLine, Transformer, RfSettings, Costing, CatalogCore } from '../core/model';
import { withRailDefaults } from '../core/spec/supply-rails';

import type { ProjectSummary } from '../core/project-summary';

export type { ProjectSummary };

export class VersionConflict extends Error {
  constructor(
    readonly expected: number,
    readonly actual: number,
  ) {
    super(`This project was changed elsewhere (version ${actual}, your page had ${expected}).`);
  }
}

export class NotFound extends Error {}

export async function listProjects(db: Db): Promise<ProjectSummary[]> {
  const rows = await db.select().from(t.projects).orderBy(asc(t.projects.name));
  const stageRows = await db.select({ projectId: t.stages.projectId }).from(t.stages);
  const counts = new Map<string, number>();
  for (const s of stageRows) counts.set(s.projectId, (counts.get(s.projectId) ?? 0) + 1);
  return rows.map((r) => ({
    id: r.id,
    name: r.name,
    frequencyHz: r.frequencyHz,
    targetPowerW: r.targetPowerW,
    kits: r.kits,
    stageCount: counts.get(r.id) ?? 0,
    version: r.version,
    updatedAt: r.updatedAt,
    variantOf: r.variantOf,
  }));
}

const jsonObject = (v: unknown): Record<string, unknown> =>
  v !== null && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : {};

/** Only the data blocks the registry knows from the params column (an odd key must not overwrite the loads). */
function stageData(v: unknown): Partial<Pick<Stage, StageDataKey>> {
  const o = jsonObject(v);
  return Object.fromEntries(STAGE_DATA.filter((d) => o[d.key] !== undefined).map((d) => [d.key, o[d.key]]));
}

export async function loadProject(db: Db | Tx, id: string): Promise<Project | null> {
  const [p] = await db.select().from(t.projects).where(eq(t.projects.id, id));
  if (!p) return null;
  const trafoRows = await db
    .select()
    .from(t.transformers)
    .where(eq(t.transformers.projectId, id))
    .orderBy(asc(t.transformers.position));
  const windingRows = trafoRows.length
    ? await db
        .select()
        .from(t.windings)
        .where(
          inArray(
            t.windings.transformerId,
            trafoRows.map((r) => r.id),
          ),
        )
        .orderBy(asc(t.windings.position))
    : [];
  const railRows = await db.select().from(t.rails).where(eq(t.rails.projectId, id)).orderBy(asc(t.rails.position));
  const stageRows = await db.select().from(t.stages).where(eq(t.stages.projectId, id)).orderBy(asc(t.stages.position));
  const loadRows = stageRows.length
    ? await db
        .select()
        .from(t.stageLoads)
        .where(
          inArray(
            t.stageLoads.stageId,
            stageRows.map((r) => r.id),
          ),
        )
        .orderBy(asc(t.stageLoads.position))
    : [];
  const partRows = await db.select().from(t.parts).where(eq(t.parts.projectId, id)).orderBy(asc(t.parts.position));
  const offerRows = partRows.length
    ? await db
        .select()
        .from(t.offers)
        .where(
          inArray(
            t.offers.partId,
            partRows.map((r) => r.id),
          ),
        )
        .orderBy(asc(t.offers.position))
    : [];
  const bomRows = await db
    .select()
    .from(t.bomLines)
    .where(eq(t.bomLines.projectId, id))
    .orderBy(asc(t.bomLines.position));
  const coreRows = await db.select().from(t.cores).where(eq(t.cores.projectId, id)).orderBy(asc(t.cores.position));

  const transformers: Transformer[] = trafoRows.map((tr) => ({
    id: tr.id,
    name: tr.name,
    construction: tr.construction as Transformer['construction'],
    // optional in the model: a null column reads as absent (no tolerance corner; leakage split from regulation)
    ...(tr.secondaryToleranceFraction !== null ? { secondaryToleranceFraction: tr.secondaryToleranceFraction } : {}),
    windings: windingRows
      .filter((w) => w.transformerId === tr.id)
      .map((w) => ({
        id: w.id,
        name: w.name,
        ratedVrms: w.ratedVrms,
        ratedA: w.ratedA,
        regulationFraction: w.regulationFraction,
        resistanceOhm: w.resistanceOhm,
        ...(w.leakageH !== null ? { leakageH: w.leakageH } : {}),
      })),
  }));
  // JSON columns are not trusted: a non-object reads as no data, and evaluate() checks every field against its spec
  // (src/core/spec/project-check.ts), so a bad stored value is a fail finding naming it, never replaced silently.
  // rows written before a rail field existed read it as not stated (withRailDefaults)
  const rails = railRows.map((r) =>
    withRailDefaults({ ...jsonObject(r.params), id: r.id, name: r.name, kind: r.kind } as Rail),
  );
  const stages: Stage[] = stageRows.map((s) => ({
    id: s.id,
    kind: s.kind as Stage['kind'],
    name: s.name,
    notes: s.notes,
    dissipationW: s.dissipationW,
    loads: loadRows
      .filter((l) => l.stageId === s.id)
      .map((l) => ({ railId: l.railId, currentA: { receive: l.receiveA, keyUp: l.keyUpA, keyDown: l.keyDownA } })),
    ...stageData(s.params),
  }));
  const parts: Part[] = partRows.map((r) => ({
    id: r.id,
    description: r.description,
    category: r.category,
    ratings: r.ratings as Part['ratings'],
    offers: offerRows
      .filter((o) => o.partId === r.id)
      .map((o) => ({
        id: o.id,
        supplier: o.supplier,
        sku: o.sku,
        currency: o.currency,
        breaks: o.breaks as Part['offers'][number]['breaks'],
        minOrder: o.minOrder,
        orderMultiple: o.orderMultiple,
        stockNote: o.stockNote,
      })),
  }));
  const bom: BomLine[] = bomRows.map((b) => ({
    id: b.id,
    stageId: b.stageId,
    partId: b.partId,
    qtyPerRig: b.qtyPerRig,
    refs: b.refs,
    notes: b.notes,
    roleId: b.roleId,
  }));
  const mains =
    p.mainsNominalV !== null && p.mainsFrequencyHz !== null
      ? {
          nominalV: p.mainsNominalV,
          frequencyHz: p.mainsFrequencyHz,
          lowFraction: p.mainsLowFraction ?? 0.1,
          highFraction: p.mainsHighFraction ?? 0.1,
        }
      : null;
  return {
    id: p.id,
    name: p.name,
    notes: p.notes,
    frequencyHz: p.frequencyHz,
    targetPowerW: p.targetPowerW,
    mains,
    ambientC: p.ambientC,
    currency: p.currency,
    kits: p.kits,
    keyingDuty: p.keyingDuty,
    ...(p.variantOf ? { variantOf: p.variantOf } : {}),
    version: p.version,
    supply: {
      transformers,
      rails,
      primaryFuseA: p.primaryFuseA,
      enclosureAreaM2: p.enclosureAreaM2,
      enclosureUWPerM2K: p.enclosureUWPerM2K,
      // null columns (rows written before migration 0006) stay absent: read as T3 and duty
      ...(p.primaryFuseSheet !== null ? { primaryFuseSheet: p.primaryFuseSheet as FuseSheet } : {}),
      ...(p.transformerSizing !== null ? { transformerSizing: p.transformerSizing as TransformerSizing } : {}),
    },
    stages,
    rf: p.rf as RfSettings,
    parts,
    bom,
    costing: p.costing as Costing,
    // JSON not trusted here either: the core spec's check reports a bad stored value by name
    ...(coreRows.length
      ? { cores: coreRows.map((c) => ({ ...jsonObject(c.params), id: c.id, name: c.name }) as CatalogCore) }
      : {}),
  };
}

/** The child rows of a project, table by table, parents before children (the order they are inserted in). */
function childRows(project: Project) {
  const id = project.id;
  const rows = {
    transformers: [] as Row[],
    windings: [] as Row[],
    rails: [] as Row[],
    stages: [] as Row[],
    stageLoads: [] as Row[],
    parts: [] as Row[],
    offers: [] as Row[],
    bomLines: [] as Row[],
    cores: [] as Row[],
  };
  for (const [i, tr] of project.supply.transformers.entries()) {
    rows.transformers.push({
      id: tr.id,
      projectId: id,
      position: i,
      name: tr.name,
      construction: tr.construction,
      secondaryToleranceFraction: tr.secondaryToleranceFraction ?? null,
    });
    for (const [j, w] of tr.windings.entries())
      rows.windings.push({ ...w, leakageH: w.leakageH ?? null, transformerId: tr.id, position: j });
  }
  for (const [i, rail] of project.supply.rails.entries()) {
    const { id: railId, name, kind, ...params } = rail;
    rows.rails.push({ id: railId, projectId: id, position: i, name, kind, params });
  }
  for (const [i, s] of project.stages.entries()) {
    const own = STAGE_DATA.find((d) => s[d.key] !== undefined);
    const params = own ? { [own.key]: s[own.key] } : null;
    const { kind, name, notes, dissipationW } = s;
    rows.stages.push({ id: s.id, projectId: id, position: i, kind, name, notes, dissipationW, params });
    for (const [j, l] of s.loads.entries()) {
      const currents = { receiveA: l.currentA.receive, keyUpA: l.currentA.keyUp, keyDownA: l.currentA.keyDown };
      rows.stageLoads.push({ id: `${s.id}:${j}`, stageId: s.id, railId: l.railId, position: j, ...currents });
    }
  }
  for (const [i, part] of project.parts.entries()) {
    const { description, category, ratings } = part;
    rows.parts.push({ id: part.id, projectId: id, position: i, description, category, ratings });
    for (const [j, o] of part.offers.entries()) rows.offers.push({ ...o, partId: part.id, position: j });
  }
  for (const [i, b] of project.bom.entries()) rows.bomLines.push({ ...b, projectId: id, position: i });
  for (const [i, c] of (project.cores ?? []).entries()) {
    const { id: coreId, name, ...params } = c;
    rows.cores.push({ id: coreId, projectId: id, position: i, name, params });
  }
  return rows;
}

type Row = { id: string } & Record<string, unknown>;
type ChildTable = keyof ReturnType<typeof childRows>;
const CHILD_TABLES: ChildTable[] = ['transformers', 'windings', 'rails', 'stages', 'stageLoads', 'parts', 'offers',
  'bomLines', 'cores'];
/** Rows per multi-row INSERT (well under SQLite's bound-variable limit for these tables). */
const INSERT_CHUNK = 200;

/** The row as its table stores it: only the table's columns, a missing value as null, JSON for comparison. */
function storedForm(table: ChildTable, row: Row): string {
  return JSON.stringify(Object.keys(getTableColumns(t[table])).map((k) => row[k] ?? null));
}

/** Every column of a changed row, as an INSERT would store it: a missing value is the column's default, else null. */
function updateSet(table: ChildTable, row: Row): Record<string, unknown> {
  const columns = Object.entries(getTableColumns(t[table])).filter(([k]) => k !== 'id');
  const value = (k: string, c: { default?: unknown }) =>
    row[k] !== undefined ? row[k] : c.default !== undefined ? c.default : null;
  return Object.fromEntries(columns.map(([k, c]) => [k, value(k, c)]));
}

/**
 * Write the project's child rows over `before` (what is stored now, as loadProject read it; null when there are
 * none): rows that are new are inserted (several per statement), changed rows updated, and rows no longer there
 * deleted. An edit of one field so writes one row rather than every row of the project. Parents are inserted and
 * updated before their children and deleted after them, so a row moved to a new parent keeps its foreign key.
 */
async function writeChildren(tx: Tx, project: Project, before: Project | null): Promise<void> {
  const next = childRows(project);
  const prev = before ? childRows(before) : null;
  for (const table of CHILD_TABLES) {
    const old = new Map((prev?.[table] ?? []).map((r) => [r.id, r]));
    const added: Row[] = [];
    for (const row of next[table]) {
      const was = old.get(row.id);
      if (!was) added.push(row);
      else if (storedForm(table, was) !== storedForm(table, row)) {
        await tx.update(t[table]).set(updateSet(table, row)).where(eq(t[table].id, row.id));
      }
    }
    for (let i = 0; i < added.length; i += INSERT_CHUNK) {
      await tx.insert(t[table]).values(added.slice(i, i + INSERT_CHUNK) as never[]);
    }
  }
  if (!prev) return;
  for (const table of [...CHILD_TABLES].reverse()) {
    const kept = new Set(next[table].map((r) => r.id));
    const gone = prev[table].filter((r) => !kept.has(r.id)).map((r) => r.id);
    for (let i = 0; i < gone.length; i += INSERT_CHUNK) {
      await tx.delete(t[table]).where(inArray(t[table].id, gone.slice(i, i + INSERT_CHUNK)));
    }
  }
}

function projectColumns(p: Project) {
  return {
    name: p.name,
    notes: p.notes,
    frequencyHz: p.frequencyHz,
    targetPowerW: p.targetPowerW,
    mainsNominalV: p.mains?.nominalV ?? null,
    mainsFrequencyHz: p.mains?.frequencyHz ?? null,
    mainsLowFraction: p.mains?.lowFraction ?? null,
    mainsHighFraction: p.mains?.highFraction ?? null,
    ambientC: p.ambientC,
    currency: p.currency,
    kits: p.kits,
    keyingDuty: p.keyingDuty,
    variantOf: p.variantOf ?? null,
    primaryFuseA: p.supply.primaryFuseA,
    enclosureAreaM2: p.supply.enclosureAreaM2 ?? null,
    enclosureUWPerM2K: p.supply.enclosureUWPerM2K ?? null,
    primaryFuseSheet: p.supply.primaryFuseSheet ?? null,
    transformerSizing: p.supply.transformerSizing ?? null,
    rf: p.rf,
    costing: p.costing,
  };
}

/** How many versions of each project keep a snapshot: a form older than that can no longer be merged. */
export const KEEP_VERSIONS = 50;

/** The stored project as it was at `version`, or null when that snapshot is not (or no longer) kept. */
export async function loadSnapshot(db: Db | Tx, id: string, version: number): Promise<Project | null> {
  const [row] = await db
    .select({ snapshot: t.projectVersions.snapshot })
    .from(t.projectVersions)
    .where(and(eq(t.projectVersions.projectId, id), eq(t.projectVersions.version, version)));
  return row ? (row.snapshot as Project) : null;
}

/** Keep what was stored at this version (read back, so it is exactly what a page shows) and drop old ones. */
async function keepSnapshot(tx: Tx, id: string): Promise<Project> {
  const stored = await loadProject(tx, id);
  if (!stored) throw new NotFound(`No project ${id}`);
  await tx
    .insert(t.projectVersions)
    .values({ projectId: id, version: stored.version, snapshot: stored })
    .onConflictDoNothing();
  await tx
    .delete(t.projectVersions)
    .where(and(eq(t.projectVersions.projectId, id), lte(t.projectVersions.version, stored.version - KEEP_VERSIONS)));
  return stored;
}

/** Insert a complete new project (import, clone, seed). Atomic: all rows or none. */
export async function insertProject(database: Database, project: Project, nowIso: string): Promise<Project> {
  return database.write(async (tx) => {
    // a variant whose original is not in this database (an imported file) stands alone
    const original = project.variantOf
      ? await tx.select({ id: t.projects.id }).from(t.projects).where(eq(t.projects.id, project.variantOf))
      : [];
    const columns = { ...projectColumns(project), variantOf: original.length ? project.variantOf! : null };
    await tx
      .insert(t.projects)
      .values({ id: project.id, ...columns, version: 1, createdAt: nowIso, updatedAt: nowIso });
    await writeChildren(tx, project, null);
    return keepSnapshot(tx, project.id);
  });
}

/**
 * Write `change(current)` over the stored project, whatever its version, and bump the version. `change` runs
 * inside the write transaction on the latest stored project (again, if a busy lock makes the write retry);
 * it may throw to write nothing. Returns the project as stored.
 */
export async function changeProject(
  database: Database,
  id: string,
  change: (current: Project, tx: Tx) => Project | Promise<Project>,
  nowIso: string,
): Promise<Project> {
  return database.write(async (tx) => {
    const current = await loadProject(tx, id);
    if (!current) throw new NotFound(`No project ${id}`);
    const next = { ...(await change(current, tx)), id, version: current.version + 1 };
    await tx
      .update(t.projects)
      .set({ ...projectColumns(next), version: next.version, updatedAt: nowIso })
      .where(eq(t.projects.id, id));
    await writeChildren(tx, next, current);
    return keepSnapshot(tx, id);
  });
}

/**
 * Apply `change` to the stored project if its version still equals `expectedVersion` (else VersionConflict);
 * bumps the version. `change` returns the new project (pure) and runs inside the write transaction.
 */
export async function updateProject(
  database: Database,
  id: string,
  expectedVersion: number,
  change: (p: Project) => Project,
  nowIso: string,
): Promise<Project> {
  return changeProject(
    database,
    id,
    (current) => {
      if (current.version !== expectedVersion) throw new VersionConflict(expectedVersion, current.version);
      return change(current);
    },
    nowIso,
  );
}

/** Delete a project and its rows. With `expectedVersion`, a project changed since then is refused (VersionConflict). */
export async function deleteProject(database: Database, id: string, expectedVersion?: number): Promise<boolean> {
  return database.write(async (tx) => {
    if (expectedVersion !== undefined) {
      const [row] = await tx.select({ version: t.projects.version }).from(t.projects).where(eq(t.projects.id, id));
      if (row && row.version !== expectedVersion) throw new VersionConflict(expectedVersion, row.version);
    }
    await tx.delete(t.bomLines).where(eq(t.bomLines.projectId, id));
    // its variants stand alone from now on (the link is a plain column, see schema.ts)
    await tx.update(t.projects).set({ variantOf: null }).where(eq(t.projects.variantOf, id));
    const res = await tx.delete(t.projects).where(eq(t.projects.id, id)).returning({ id: t.projects.id });
    return res.length > 0;
  });
}

export async function countProjects(db: Db): Promise<number> {
  const rows = await db.select({ id: t.projects.id }).from(t.projects);
  return rows.length;
}
