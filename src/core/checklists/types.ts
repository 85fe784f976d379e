// Checklist types: plain data a page, the CLI or the PDF pack can print. Pure; no I/O.
import type { HeatBudget } from '../power/heat-budget';
import type { BudgetReport } from '../budget';
import type { Finding } from '../findings';
import type { SupplyReport } from '../power/report-types';
import type { CostReport } from '../cost/report-types';
import type { RfReport } from './rf-view';

/** One line to tick off. `value`/`unit` carry the computed number the line came from (SI), when there is one. */
export interface ChecklistItem {
  text: string;
  /** The computed number behind the line (SI units), null when the line is a plain instruction. */
  value: number | null;
  /** Unit symbol of `value` ("V", "A", "W", "s", "m", "°C", "dB", ""). */
  unit: string;
  /** Where the number came from, e.g. "supply: low mains, TX key-down"; '' for a plain instruction. */
  basis: string;
  /** 'caution' marks a line where a mistake can hurt someone or destroy a part. */
  emphasis: 'normal' | 'caution';
}

export interface ChecklistSection {
  /** Stable id: "stage:<stageId>", "supply", "safety:mains", ... */
  id: string;
  title: string;
  /** The stage the section belongs to, null for supply-wide or safety sections. */
  stageId: string | null;
  items: ChecklistItem[];
}

/** What the checklists read: the evaluation report the lead assembles (structurally). */
export interface ChecklistReport {
  budget: BudgetReport;
  supply: SupplyReport | null;
  /** Heat inside the enclosure (absent in reports made without it). */
  heat?: HeatBudget | null;
  rf: RfReport | null;
  cost: CostReport | null;
  findings: Finding[];
}
