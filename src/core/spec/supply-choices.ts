// Supply-wide choices: the fitted primary fuse's type (IEC 60127-2 standard sheet) and what the transformer is sized
// for. Stored on the project (columns primary_fuse_sheet, transformer_sizing); absent in older data reads T3 and duty.
import { defineSpec } from './field';
import { choice } from './make';
import { FUSE_SHEETS } from './supply-rails';
import type { FuseSheet, Supply, TransformerSizing } from '../model';

export const TRANSFORMER_SIZINGS = [
  ['duty', 'CW at the keying duty'],
  ['tune-up', 'Tune-up: continuous key-down'],
] as const;

export const supplyChoicesSpec = defineSpec({
  name: 'supply-choices',
  label: 'Supply choices',
  fields: {
    primaryFuseSheet: choice('Primary fuse type', FUSE_SHEETS, 'T3', {
      form: 'primaryFuseSheet',
      help: 'IEC 60127-2 sheet of the mains fuse fitted or to be fitted',
    }),
    transformerSizing: choice('Size the transformer for', TRANSFORMER_SIZINGS, 'duty', {
      form: 'transformerSizing',
      help: 'windings rated for CW keying, or for a carrier held down',
    }),
  },
});

export interface SupplyChoices {
  primaryFuseSheet: FuseSheet;
  transformerSizing: TransformerSizing;
}

/** The supply's choices with the defaults of older data filled in. */
export function supplyChoices(s: Pick<Supply, 'primaryFuseSheet' | 'transformerSizing'>): SupplyChoices {
  return { primaryFuseSheet: s.primaryFuseSheet ?? 'T3', transformerSizing: s.transformerSizing ?? 'duty' };
}
