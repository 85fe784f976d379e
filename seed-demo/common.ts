// Small builders shared by the demo projects.
import type { Offer, PerMode } from '../src/core/model';

export const perMode = (receive: number, keyUp: number, keyDown: number): PerMode => ({ receive, keyUp, keyDown });

export function offer(
  id: string,
  supplier: string,
  sku: string,
  currency: string,
  breaks: [number, number][],
  minOrder = 1,
  orderMultiple = 1,
  stockNote = '',
): Offer {
  return {
    id,
    supplier,
    sku,
    currency,
    breaks: breaks.map(([minQty, unitPriceCents]) => ({ minQty, unitPriceCents })),
    minOrder,
    orderMultiple,
    stockNote,
  };
}

export { defaultRfSettings as defaultRf, defaultLpfParams as defaultLpf } from '../src/core/new-project';
