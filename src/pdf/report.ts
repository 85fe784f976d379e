// What the pack reads: the evaluation report the lead assembles (structurally the same type), and options.
import type { ChecklistReport } from '../core/checklists';
import type { Paper } from './layout';

export type PackReport = ChecklistReport;

export interface PackOptions {
  paper: Paper;
  /** Date (or date and time) the prices and results were computed, printed on every page, e.g. "2026-12-01". */
  dataDate: string;
}
