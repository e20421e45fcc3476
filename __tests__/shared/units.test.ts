import {
  BWG_WALL_IN,
  cToF,
  cteImperialToMetric,
  deltaCToF,
  deltaFToC,
  fToC,
  formatQuantity,
  fromDisplay,
  gaugeToWallMm,
  growthBasisWords,
  inputNumber,
  joinPhrases,
  phrase,
  phraseOfText,
  quantity,
  wordPhrase,
  inPer100FtToMmPerM,
  inToMm,
  kgToLb,
  ksiToMpa,
  lbToKg,
  mmPerMToInPer100Ft,
  mmToIn,
  mpaToKsi,
  toDisplay,
  unitLabel,
  wallMmToGauge,
} from '../../shared/units';

// An independent library as a second oracle beside the exact factors.
const Qty: (q: string) => { to(unit: string): { scalar: number } } = require('js-quantities');

/**
 * convert-units rounds some factors (e.g. 1 lb = 453.592 g, 1 ft = 1/3.28084 m), so it
 * agrees with the exact factors to about 1e-6 relative; that is the tolerance here.
 */
const TOL = 1e-6;
const close = (got: number, want: number, tol = TOL) => expect(Math.abs(got - want) / Math.abs(want)).toBeLessThan(tol);

describe('exact factors against convert-units', () => {
  it('when converting inches, then 1 in = 25.4 mm exactly (international inch, NIST SP 811 App. B)', () => {
    close(inToMm(1), 25.4);
    close(mmToIn(76.2), 3);
    close(inToMm(3), Qty('3 in').to('mm').scalar);
  });

  it('when converting pounds, then 1 lb = 0.45359237 kg exactly (NIST SP 811 App. B)', () => {
    close(lbToKg(1), 0.45359237);
    close(kgToLb(1), 1 / 0.45359237);
    close(lbToKg(10), Qty('10 lb').to('kg').scalar);
  });

  it('when converting stress, then 1 psi = 6894.757 Pa, so 1 ksi = 6.894757 MPa (NIST SP 811 App. B)', () => {
    close(ksiToMpa(1), 6.894757);
    close(mpaToKsi(240), 240 / 6.894757);
  });

  it('when converting temperatures, then t/°F = 1.8·t/°C + 32 (NIST SP 811 §4.2.1.1)', () => {
    close(cToF(100), 212);
    close(cToF(800), 1472);
    close(fToC(70), (70 - 32) / 1.8);
    expect(cToF(-40)).toBeCloseTo(-40, 9);
  });

  it('when converting a temperature difference, then it scales by 1.8 with no 32 °F offset', () => {
    expect(deltaCToF(100)).toBeCloseTo(180, 12);
    expect(deltaFToC(180)).toBeCloseTo(100, 12);
    expect(deltaCToF(100)).toBeCloseTo(Qty('100 degC').to('degF').scalar, 9);
    expect(deltaCToF(100)).not.toBeCloseTo(cToF(100), 0);
  });

  it('when converting a coefficient, then 1e-6/°F = 1.8e-6/K (reference-data conventions)', () => {
    expect(cteImperialToMetric(1)).toBeCloseTo(1.8, 12);
  });

  it('when converting growth per length, then 1 in/100 ft = 1/1.2 mm/m (reference-data conventions, exact)', () => {
    close(inPer100FtToMmPerM(1), 1 / 1.2);
    // ASME B31.3 App. C 18Cr-8Ni at 800 °F: 8.80 in/100 ft = 7.333 mm/m (reference-data §0 item 3)
    expect(inPer100FtToMmPerM(8.8)).toBeCloseTo(7.333, 3);
    close(mmPerMToInPer100Ft(inPer100FtToMmPerM(6.7)), 6.7);
  });
});

describe('tube wall gauges (BWG, reference-data §6)', () => {
  it.each([
    [20, 0.035],
    [18, 0.049],
    [16, 0.065],
    [14, 0.083],
    [13, 0.095],
    [12, 0.109],
    [11, 0.12],
    [10, 0.134],
  ])('when gauge %s is asked for, then the wall is %s in, and that wall reads back as the gauge', (ga, inch) => {
    close(gaugeToWallMm(ga) as number, inch * 25.4);
    expect(wallMmToGauge(inch * 25.4)).toBe(ga);
  });

  it('when the wall is 1.651 mm, then it is 16 ga (reference-data §6)', () => {
    expect(wallMmToGauge(1.651)).toBe(16);
  });

  it('when the wall matches no gauge or the gauge is unknown, then null', () => {
    expect(wallMmToGauge(1.4)).toBeNull();
    expect(gaugeToWallMm(17)).toBeNull();
    expect(Object.keys(BWG_WALL_IN)).toHaveLength(8);
  });
});

describe('display helpers', () => {
  it('when shown in imperial, then values convert and carry their labels', () => {
    expect(formatQuantity('temperature', 800, 'imperial').text).toBe('1472 °F');
    expect(formatQuantity('temperatureDelta', 100, 'imperial').text).toBe('180 °F');
    expect(formatQuantity('length', 76.2, 'imperial').text).toBe('3.00 in');
    expect(formatQuantity('growthPerLength', inPer100FtToMmPerM(8.8), 'imperial').text).toBe('8.80 in/100 ft');
    expect(formatQuantity('stress', ksiToMpa(36.8), 'imperial').text).toBe('36.8 ksi');
    expect(unitLabel('mass', 'imperial')).toBe('lb');
  });

  it('when shown in metric, then values keep SI with sensible decimals', () => {
    expect(formatQuantity('smallLength', 13.6115, 'metric').text).toBe('13.61 mm');
    expect(formatQuantity('stress', 254.25, 'metric').text).toBe('254 MPa');
    expect(formatQuantity('smallLength', -0.0001, 'metric').text).toBe('0.00 mm');
  });

  it('when a typed value goes in and back out, then it round-trips', () => {
    const si = fromDisplay('temperature', 1472, 'imperial');
    close(si, 800);
    close(toDisplay('temperature', si, 'imperial'), 1472);
  });
});

describe('exact factors, with nothing lost to rounding (NIST SP 811 Appendix B)', () => {
  // Exact by definition: 1 in = 25.4 mm, 1 lb = 0.45359237 kg; °F = °C × 9/5 + 32 (SP 811 §4.2.1.1).
  it('when inches convert, then the factor is 25.4 exactly, both ways', () => {
    expect(inToMm(2)).toBe(50.8); // convert-units alone gives 50.79999837
    expect(inToMm(1)).toBe(25.4);
    expect(mmToIn(50.8)).toBe(2);
    expect(mmToIn(76.2)).toBeCloseTo(3, 14);
  });

  it('when pounds convert, then 1 lb = 0.45359237 kg exactly, both ways', () => {
    expect(lbToKg(1)).toBe(0.45359237);
    expect(lbToKg(100)).toBeCloseTo(45.359237, 12);
    expect(kgToLb(0.45359237)).toBe(1);
  });

  it('when temperatures convert, then °F = °C × 9/5 + 32 to the last figure', () => {
    expect(cToF(0)).toBe(32);
    expect(cToF(100)).toBe(212);
    expect(cToF(466.1111111111111)).toBeCloseTo(871, 12);
    expect(fToC(871)).toBeCloseTo((871 - 32) * (5 / 9), 12);
    expect(fToC(70)).toBeCloseTo(21.111111111111, 11);
  });
});

describe('input boxes at trade precision, with the stored value exact', () => {
  it('when 871 °F and 70 °F were typed, then the boxes show 871 and 70 while the SI values stay exact', () => {
    const peak = fromDisplay('temperature', 871, 'imperial');
    const install = fromDisplay('temperature', 70, 'imperial');
    expect(peak).toBeCloseTo(466.1111111111, 9);
    expect(inputNumber('temperature', peak, 'imperial')).toBe(871);
    expect(inputNumber('temperature', install, 'imperial')).toBe(70);
    // The same values read in metric at 1 °C, not "466.111" and "21.111".
    expect(inputNumber('temperature', peak, 'metric')).toBe(466);
    expect(inputNumber('temperature', install, 'metric')).toBe(21);
  });

  it('when lengths show, then to 0.1 mm and 0.01 in', () => {
    expect(inputNumber('length', 1234.5678, 'metric')).toBe(1234.6);
    expect(inputNumber('length', inToMm(23.456), 'imperial')).toBe(23.46);
  });
});

describe('phrases: quantities worded in the reader’s units', () => {
  const peak = quantity('temperature', 850);
  const band = quantity('temperatureDelta', 50);
  const limit = quantity('temperature', 870);
  const p = phrase`Peak ${peak} is within ${band} of the limit of ${limit}`;

  it('when worded in metric, then °C throughout', () => {
    expect(wordPhrase(p, 'metric')).toBe('Peak 850 °C is within 50 °C of the limit of 870 °C');
  });

  it('when worded in imperial, then levels take the 32 °F offset and the band only the 9/5 scale', () => {
    // 850 °C = 1562 °F, 870 °C = 1598 °F, a 50 °C band = 90 °F (SP 811 §4.2.1.1)
    expect(wordPhrase(p, 'imperial')).toBe('Peak 1562 °F is within 90 °F of the limit of 1598 °F');
  });

  it('when a length and a mass are in one phrase, then each takes its own unit and precision', () => {
    const q = phrase`its ${quantity('mass', 4.53592, 1)} hangs ${quantity('length', 304.8)} from the flange`;
    expect(wordPhrase(q, 'metric')).toBe('its 4.5 kg hangs 304.8 mm from the flange');
    expect(wordPhrase(q, 'imperial')).toBe('its 10.0 lb hangs 12.00 in from the flange');
  });

  it('when phrases are joined or nested, then the quantities survive', () => {
    const joined = joinPhrases([phrase`a ${quantity('length', 25.4)}`, ['b']], '; ');
    expect(wordPhrase(phrase`(${joined})`, 'imperial')).toBe('(a 1.00 in; b)');
  });

  it('when growth per length is named, then the basis matches the axis unit', () => {
    expect(growthBasisWords('metric')).toBe('per metre');
    expect(growthBasisWords('imperial')).toBe('per 100 ft');
    expect(unitLabel('growthPerLength', 'imperial')).toBe('in/100 ft');
  });
});

describe('catalogue texts written in °C', () => {
  it('when a caution names a range, then both ends become temperatures and a hand-written °F aside goes', () => {
    const p = phraseOfText('475 °C embrittlement: held between about 371 and 510 °C (700–950 °F) it loses toughness.');
    // 475 °C = 887 °F, 371 °C = 699.8 °F, 510 °C = 950 °F (NIST SP 811 §4.2.1.1)
    expect(wordPhrase(p, 'imperial')).toBe('887 °F embrittlement: held between about 700 and 950 °F it loses toughness.');
    expect(wordPhrase(p, 'metric')).toBe('475 °C embrittlement: held between about 371 and 510 °C it loses toughness.');
  });

  it('when a text has a dash range or no temperature, then it reads as written', () => {
    expect(wordPhrase(phraseOfText('sigma phase at 593–816 °C'), 'imperial')).toBe('sigma phase at 1099–1501 °F');
    expect(wordPhrase(phraseOfText('No temperature here.'), 'imperial')).toBe('No temperature here.');
  });
});
