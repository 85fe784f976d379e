// Costing settings: attrition allowance, spares per line and exchange rates into the project currency.
// (The supplier list is its own spec, see parts.ts.)
import { defineSpec, U } from './field';
import { num, text } from './make';
import { ratesCodec } from './parts-text';

export const costingSpec = defineSpec({
  name: 'costing',
  label: 'Costing settings',
  fields: {
    attritionFraction: num('Attrition allowance', '%', U.pct, 0, 1, 0.05, {
      form: 'attrition',
      help: 'extra for losses and mistakes',
    }),
    sparesPerLine: num('Spares per line', '', U.none, 0, 1000, 0, {
      form: 'spares',
      integer: true,
      help: 'whole pieces added to each line',
      example: '1',
    }),
    exchangeRates: text('Exchange rates', 2000, false, '', {
      form: 'rates',
      multiline: true,
      codec: ratesCodec,
      help: 'one per line: an offer currency = the price of 1 unit of it in the project currency (the page gives an ' +
        'example in it)',
    }),
  },
});
