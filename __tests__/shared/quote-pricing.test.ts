import { compareWithFirst, priceOption, PricingError, type PricedAlloy, type PricedRunInput } from '../../shared/quotes/pricing';
import type { ShopSettings } from '../../shared/schemas/shop-settings';

/*
 * Hand-worked cases. Tube masses are m = ρ·π·(OD − t)·t·L (exact for a round tube); the kg/m
 * figures agree with reference-data §6 (304, 8000 kg/m³: 3.0 in × 0.065 in → 3.0933 kg/m;
 * 2.5 in × 0.065 in → 2.5664 kg/m). Prices, rates and factors below are test fixtures, not data.
 */
const runs: PricedRunInput[] = [
  // 76.2 × 1.651 mm, 1000 mm, peak 800 °C: 8000·π·0.074549·0.001651·1.0 = 3.09335 kg in 304.
  { runId: 'a', name: 'Downpipe', lengthMm: 1000, tube: { odMm: 76.2, wallMm: 1.651 }, peakTempC: 800 },
  // 63.5 × 1.651 mm, 500 mm, peak 600 °C: 8000·π·0.061849·0.001651·0.5 = 1.28319 kg in 304.
  { runId: 'b', name: 'Mid-pipe', lengthMm: 500, tube: { odMm: 63.5, wallMm: 1.651 }, peakTempC: 600 },
];

const alloys = new Map<string, PricedAlloy>([
  ['p', { alloyId: 'p', designation: 'Type 304', uns: 'S30400', family: 'austenitic_stainless', version: 1, densityKgM3: 8000, pricePerKg: 5, maxContinuousC: 925, maxIntermittentC: 870 }],
  ['q', { alloyId: 'q', designation: 'Alloy 625', uns: 'N06625', family: 'nickel_chromium', version: 1, densityKgM3: 8440, pricePerKg: 40, maxContinuousC: 1093, maxIntermittentC: 1093 }],
]);

const settings: ShopSettings = {
  shopName: 'Test shop',
  currency: 'EUR',
  labourRatePerHour: 60,
  hoursPerRun: 2,
  weldTimeFactors: { austenitic_stainless: 1, ferritic_stainless: 1, nickel_chromium: 1.5, nickel_iron_chromium: 1.4, titanium: 2, carbon_steel: 0.7 },
  scrapAllowancePct: 10,
  marginPct: 20,
  depositSharePct: 0,
  travelSharePct: 70,
  coldestStartC: -20,
  supportNearJointMm: 150,
  engineSupportMm: 300,
  nearbyMinimumsMm: { fuel_line: 150, brake_line: 150, wiring: 150, rubber: 100, panel: 25, other: 50 },
  isDemo: false,
};

describe('pricing a quote option', () => {
  it('when every run is in 304, then the total is worked out line by line', () => {
    const o = priceOption(runs, { label: '304', alloyId: 'p' }, alloys, settings);
    // mass = 3.09335 + 1.28319 = 4.37653 kg
    expect(o.massKg).toBeCloseTo(4.37653, 4);
    // material = 4.37653 kg × 5 €/kg × 1.10 scrap = 24.0709
    expect(o.materialCost).toBeCloseTo(24.0709, 3);
    // labour = 2 runs × 2 h × factor 1 × 60 €/h = 240
    expect(o.labourHours).toBeCloseTo(4, 10);
    expect(o.labourCost).toBeCloseTo(240, 10);
    // subtotal 264.0709; margin 20 % = 52.8142; total 316.8851
    expect(o.subtotal).toBeCloseTo(264.0709, 3);
    expect(o.margin).toBeCloseTo(52.8142, 3);
    expect(o.total).toBeCloseTo(316.8851, 3);
    // limit: 304's lower (intermittent) limit 870 °C − hottest run 800 °C = 70 °C
    expect(o.tempMarginC).toBe(70);
  });

  it('when every run is in Alloy 625, then mass scales with density and labour with the weld factor', () => {
    const o = priceOption(runs, { label: '625', alloyId: 'q' }, alloys, settings);
    // mass = 4.37653 × 8440/8000 = 4.61724 kg
    expect(o.massKg).toBeCloseTo(4.61724, 4);
    // material = 4.61724 × 40 × 1.10 = 203.1587
    expect(o.materialCost).toBeCloseTo(203.1587, 3);
    // labour = 2 × 2 h × 1.5 × 60 = 360; subtotal 563.1587; margin 112.6317; total 675.7905
    expect(o.labourCost).toBeCloseTo(360, 10);
    expect(o.total).toBeCloseTo(675.7905, 3);
    // 1093 − 800 = 293 °C
    expect(o.tempMarginC).toBe(293);
  });

  it('when the customer mixes alloys per run, then each run is priced in its own alloy', () => {
    const o = priceOption(runs, { label: 'Mix', alloyId: 'p', runAlloys: { a: 'q' } }, alloys, settings);
    // mass = 3.09335 × 1.055 + 1.28319 = 3.26348 + 1.28319 = 4.54667 kg
    expect(o.massKg).toBeCloseTo(4.54667, 4);
    // material = 3.26348 × 40 × 1.1 + 1.28319 × 5 × 1.1 = 143.5933 + 7.0575 = 150.6508
    expect(o.materialCost).toBeCloseTo(150.6508, 3);
    // labour = 2 × 1.5 × 60 + 2 × 1 × 60 = 300; total = (150.6508 + 300) × 1.2 = 540.7809
    expect(o.total).toBeCloseTo(540.7809, 3);
    // margins: run a in 625: 293; run b in 304: 870 − 600 = 270 → the option is limited by 270
    expect(o.tempMarginC).toBe(270);
    expect(o.runs.map((r) => r.designation)).toEqual(['Alloy 625', 'Type 304']);
  });

  it('when options are compared with the first, then the differences are against option 1', () => {
    const options = [
      priceOption(runs, { label: '304', alloyId: 'p' }, alloys, settings),
      priceOption(runs, { label: '625', alloyId: 'q' }, alloys, settings),
      priceOption(runs, { label: 'Mix', alloyId: 'p', runAlloys: { a: 'q' } }, alloys, settings),
    ];
    const [first, second, third] = compareWithFirst(options);
    expect(first).toEqual({ costDifference: 0, costDifferencePct: 0, massDifferenceKg: 0, tempMarginGainedC: 0 });
    // 675.7905 − 316.8851 = 358.9054, i.e. 113.26 % more; 4.61724 − 4.37653 = 0.24071 kg; 293 − 70 = 223 °C
    expect(second.costDifference).toBeCloseTo(358.9054, 3);
    expect(second.costDifferencePct!).toBeCloseTo(113.26, 2);
    expect(second.massDifferenceKg).toBeCloseTo(0.24071, 4);
    expect(second.tempMarginGainedC).toBe(223);
    // 540.7809 − 316.8851 = 223.8958; 270 − 70 = 200 °C
    expect(third.costDifference).toBeCloseTo(223.8958, 3);
    expect(third.tempMarginGainedC).toBe(200);
  });

  it('when an option names an alloy with no data, then pricing refuses rather than guessing', () => {
    expect(() => priceOption(runs, { label: '?', alloyId: 'missing' }, alloys, settings)).toThrow(PricingError);
  });
});
