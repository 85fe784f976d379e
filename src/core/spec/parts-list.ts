// One parts-list (BOM) line: which part, how many per rig, on which stage, with its designators.
import { defineSpec, U } from './field';
import { num, ref, text } from './make';

export const bomLineSpec = defineSpec({
  name: 'bom-line',
  label: 'Parts-list line',
  fields: {
    stageId: ref('Stage', 'stage', true),
    partId: ref('Part', 'part', false),
    // fractional quantities are allowed (0.5 m of wire)
    qtyPerRig: num('Quantity per rig', '', U.none, 0, 100_000, 1, { form: 'qty', exclusiveMin: true, example: '2' }),
    refs: text('Reference designators', 300, false, '', { help: 'e.g. R1, R2 or C1–C4' }),
    notes: text('Notes', 500, false),
    // the design role this line fills (src/core/roles); the roles come from the evaluation,
    // so existence is checked there
    roleId: ref('Design role', 'role', true, {
      form: 'role',
      help: 'the part of the design this line fills; its ratings are checked against it',
    }),
  },
});
