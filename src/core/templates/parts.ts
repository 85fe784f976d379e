// Starter parts for the station templates: invented scenario data. The suppliers, their SKUs and prices are made up
// for the example; parts are described by type and ratings only. The builder replaces them with real offers.
import type { Offer, Part, Supplier } from '../model';

export const SUPPLIER_A = 'Millbrook Radio Parts';
export const SUPPLIER_B = 'Eastgate Components';

/** Invented suppliers' shipping per order, in the project's currency (USD by the settings spec's default). */
export const STARTER_SUPPLIERS: Supplier[] = [
  { name: SUPPLIER_A, shippingCents: 750, currency: 'USD' },
  { name: SUPPLIER_B, shippingCents: 500, currency: 'USD' },
];

const offer = (supplier: string, sku: string, breaks: [number, number][], orderMultiple = 1): Offer => ({
  id: `of-${sku}`,
  supplier,
  sku,
  currency: 'USD',
  breaks: breaks.map(([minQty, unitPriceCents]) => ({ minQty, unitPriceCents })),
  minOrder: orderMultiple,
  orderMultiple,
  stockNote: '',
});

const part = (id: string, description: string, category: string, ratings: Part['ratings'], offers: Offer[]): Part => ({
  id,
  description,
  category,
  ratings,
  offers,
});

/** The starter catalog; `crystalHz` is the project's frequency (the VXO's crystal is cut for it). */
export function starterParts(crystalHz: number): Record<string, Part> {
  const A = SUPPLIER_A;
  const B = SUPPLIER_B;
  const list = [
    part('tp-inlet', 'IEC mains inlet with switch and fuse drawer', 'mains', { ratedA: 10 }, [
      offer(A, 'MR-INL-10', [[1, 480], [10, 410]]),
    ]),
    part('tp-fuse', 'Fuse 5 × 20 mm, time-lag (T), 250 V, rating per supply page', 'fuse', { type: 'T' }, [
      offer(A, 'MR-F520T', [[10, 38], [100, 24]], 10),
    ]),
    part(
      'tp-trafo-2',
      'Mains transformer, two secondaries (16 V 1 A + 22 V 3.5 A), laminated, 100 VA',
      'transformer',
      { va: 100, sec1V: 16, sec1A: 1, sec2V: 22, sec2A: 3.5 },
      [offer(A, 'MR-TR2-100', [[1, 4490], [10, 3850]]), offer(B, 'EG-4510', [[1, 4690]])],
    ),
    part(
      'tp-trafo-1',
      'Mains transformer, one secondary 17 V 2 A, laminated, 35 VA',
      'transformer',
      { va: 35, sec1V: 17, sec1A: 2 },
      [offer(A, 'MR-TR1-30', [[1, 1990], [10, 1690]])],
    ),
    part(
      'tp-trafo-pa',
      'Mains transformer, one secondary 22 V 3.5 A, laminated, 80 VA',
      'transformer',
      { va: 80, sec1V: 22, sec1A: 3.5 },
      [offer(B, 'EG-4480', [[1, 3590], [10, 3150]])],
    ),
    part('tp-bridge', 'Bridge rectifier 4 A 200 V, surge 150 A', 'rectifier', { ratedA: 4, vrrmV: 200, ifsmA: 150 }, [
      offer(A, 'MR-BR4', [[1, 85], [10, 69]]),
      offer(B, 'EG-1204', [[1, 79]]),
    ]),
    part('tp-c4700', 'Electrolytic capacitor 4700 µF 35 V, 105 °C, ripple 2.4 A', 'capacitor-reservoir',
      { capacitanceF: 0.0047, voltageV: 35, rippleA: 2.4 }, [offer(A, 'MR-E4735', [[1, 210], [10, 178]])]),
    part('tp-c6800', 'Electrolytic capacitor 6800 µF 50 V, 105 °C, ripple 3.6 A', 'capacitor-reservoir',
      { capacitanceF: 0.0068, voltageV: 50, rippleA: 3.6 }, [offer(A, 'MR-E6850', [[1, 375], [10, 325]])]),
    part('tp-bleed', 'Resistor 2.2 kΩ 2 W metal film (bleeder)', 'resistor', { resistanceOhm: 2200, powerW: 2 }, [
      offer(A, 'MR-R2W-2K2', [[1, 24], [100, 12]]),
    ]),
    part(
      'tp-reg',
      'Adjustable positive linear regulator 1.5 A, TO-220',
      'regulator',
      { dropoutV: 2.5, maxCurrentA: 1.5, thetaJcKPerW: 5 },
      [offer(A, 'MR-VR15', [[1, 65], [10, 50]]), offer(B, 'EG-3115', [[1, 58]])],
    ),
    part(
      'tp-ldo',
      'Low-dropout regulator 9 V 500 mA, TO-220',
      'regulator',
      { dropoutV: 0.5, maxCurrentA: 0.5, thetaJcKPerW: 5 },
      [offer(B, 'EG-LDO9', [[1, 72]])],
    ),
    part('tp-hs-reg', 'Heatsink for TO-220, 4.5 °C/W, with mounting kit', 'heatsink', { thetaSaKPerW: 4.5 }, [
      offer(B, 'EG-HS45', [[1, 135], [10, 105]]),
    ]),
    part('tp-mosfet-200', 'N-channel MOSFET 200 V 9 A, TO-220', 'transistor', { vdsMaxV: 200, idMaxA: 9 }, [
      offer(A, 'MR-NM200', [[1, 108], [10, 90]]),
      offer(B, 'EG-5209', [[1, 99]]),
    ]),
    part('tp-mosfet-100', 'N-channel MOSFET 100 V 10 A, TO-220', 'transistor', { vdsMaxV: 100, idMaxA: 10 }, [
      offer(A, 'MR-NM100', [[1, 86], [10, 70]]),
    ]),
    part('tp-hs-pa', 'Finned heatsink 100 mm, 2.5 °C/W', 'heatsink', { thetaSaKPerW: 2.5 }, [
      offer(B, 'EG-HS25', [[1, 480], [10, 415]]),
    ]),
    part('tp-mica', 'Mica insulating washer kit, TO-220', 'hardware', {}, [offer(A, 'MR-MICA', [[1, 24], [100, 13]])]),
    part('tp-bino', 'Binocular ferrite core, HF power (output transformer)', 'core', {}, [
      offer(A, 'MR-BINO', [[1, 230], [10, 195]]),
    ]),
    part('tp-toroid', 'Iron-powder toroid 12.7 mm, 1–30 MHz mix, AL 4.9 nH/t²', 'core', { alHPerTurn2: 4.9e-9 }, [
      offer(A, 'MR-IP127', [[1, 82], [10, 64]]),
      offer(B, 'EG-7127', [[1, 75]]),
    ]),
    part(
      'tp-cmica',
      'Capacitor C0G/silver-mica 500 V, low-pass filter values per RF page',
      'capacitor',
      { voltageV: 500 },
      [offer(A, 'MR-CM500', [[1, 52], [25, 36]])],
    ),
    part('tp-relay', 'DPDT signal relay, 12 V coil 36 mA, contacts 2 A', 'relay', { contactCarryA: 2, coilA: 0.036 }, [
      offer(A, 'MR-RLY12', [[1, 200], [10, 168]]),
      offer(B, 'EG-2212', [[1, 155]]),
    ]),
    part(
      'tp-xtal',
      'Quartz crystal for the operating frequency, HC-49, series',
      'crystal',
      { frequencyHz: crystalHz },
      [offer(B, 'EG-XTAL', [[1, 90], [20, 68]])],
    ),
    part('tp-mixer', 'Double-balanced mixer IC, 8-pin DIP', 'ic', {}, [offer(A, 'MR-DBM8', [[1, 240], [10, 210]])]),
    part('tp-audio', 'Audio power amplifier IC 1 W, 8-pin DIP', 'ic', {}, [offer(A, 'MR-AA1W', [[1, 92], [10, 76]])]),
    part('tp-battery', 'LiFePO4 battery 12.8 V 6 Ah with protection board', 'battery', { capacityAh: 6 }, [
      offer(B, 'EG-LFP6', [[1, 4190]]),
    ]),
    part('tp-bladefuse', 'Blade fuse 3 A with in-line holder (battery lead)', 'fuse', { ratedA: 3 }, [
      offer(A, 'MR-BLF3', [[1, 140]]),
    ]),
    part('tp-case', 'Aluminium enclosure 200 × 150 × 75 mm', 'enclosure', {}, [
      offer(B, 'EG-ENC2015', [[1, 1850], [5, 1650]]),
    ]),
    part('tp-bnc', 'BNC chassis socket, 50 Ω', 'connector', {}, [offer(A, 'MR-BNC', [[1, 130], [10, 105]])]),
    part('tp-jack', 'Jack socket 3.5 mm stereo, panel mount', 'connector', {}, [
      offer(A, 'MR-J35', [[1, 46], [25, 33]]),
    ]),
  ];
  return Object.fromEntries(list.map((p) => [p.id, p]));
}
