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
