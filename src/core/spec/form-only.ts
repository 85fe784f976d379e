// Specs of forms that store nothing: the new-project form (it builds a project from a template) and the sweep's GET
// forms. They are not in ALL_SPECS, whose objects live in a Project (project-check.ts LOCATIONS) and are edited by
// POST forms; the spec sweeps iterate ALL_SPECS and these together (test/security/spec-sweep.test.ts, and
// test/faults/get-form-sweep.test.ts types every bad value into these forms on their pages).
import type { Spec } from './field';
import { newProjectSpec } from './settings';
import { SWEEP_PARAMETERS, SWEEP_SPECS } from './sweep';

export const FORM_ONLY_SPECS: Spec[] = [newProjectSpec, ...SWEEP_PARAMETERS.map((p) => SWEEP_SPECS[p])];
