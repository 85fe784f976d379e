// One line of the project list: what the list page shows of a stored project (src/db fills it).
export interface ProjectSummary {
  id: string;
  name: string;
  frequencyHz: number;
  targetPowerW: number;
  kits: number;
  stageCount: number;
  version: number;
  updatedAt: string;
  /** id of the project this one is a variant of, or null */
  variantOf: string | null;
}
