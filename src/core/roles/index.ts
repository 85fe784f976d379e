export { designRoles } from './design-roles';
export { checkRoles, judgeRule, partMeetsRole, type RoleCheck, type RuleOutcome } from './role-checks';
export type { DesignRole, RoleRule, RoleStatus } from './types';
export { candidatesFor, partCost, roleNeededQty, type Candidate } from './candidates';
