// What the pack reads: the evaluation report the lead assembles (structurally the same type), and options.
import type { ChecklistReport } from '../core/checklists';
import type { Paper } from './layout';
import type { PackRoles } from './sections/roles';

/** The evaluation report; the design roles and their findings when the report carries them. */
export type PackReport = ChecklistReport & PackRoles;

/**
 * Which pages: the builder's (parts for one rig without prices, budget, supply, RF, checklists, sources), the
 * organiser's (costed parts list, totals, order sheets per supplier, packing sheets per kit), or both in one file.
 */
export const PACK_PARTS = ['both', 'builder', 'organiser'] as const;
export type PackPart = (typeof PACK_PARTS)[number];
export const PACK_PART_TITLES: Record<PackPart, string> = {
  both: 'Builder’s and organiser’s pack',
  builder: 'Builder’s pack',
  organiser: 'Organiser’s pack',
};

export interface PackOptions {
  paper: Paper;
  /** Date (or date and time) the prices and results were computed, printed on every page, e.g. "2026-12-01". */
  dataDate: string;
  /** Which pages; absent = both. */
  part?: PackPart;
}
