// The pack's one disclaimer, on the cover: the other pages do not repeat it.
import { CAUTION, type Layout } from '../layout';

export const PACK_NOTICE =
  'Read first. This pack is a planning aid: its checks are planning checks, not a certification or an approval. ' +
  'Local electrical codes, local rules and your licence conditions (RF exposure included) govern, and the practice ' +
  'of a ' +
  'licensed electrician or a qualified person takes precedence over anything here. Mains voltages, stored charge, ' +
  'hot ' +
  'heatsinks and RF can injure or kill: measure before you trust.';

export function packNotice(l: Layout): void {
  l.gap(6);
  l.text(PACK_NOTICE, { sizePt: 9, color: CAUTION, afterPt: 8 });
}
