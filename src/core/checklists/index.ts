// Public API of the checklists generator.
export { buildChecklist, stagesInBuildOrder } from './build';
export { safetyChecklist, SAFETY_PREAMBLE, withSubject } from './safety';
export { rfView, type RfView, type RfReport } from './rf-view';
export type { ChecklistItem, ChecklistSection, ChecklistReport } from './types';
