import { wordFieldMessage } from '../../shared/field-messages';
import { formatQuantity, fromDisplay, fToC, inputNumber, ksiToMpa, toDisplay } from '../../shared/units';

/*
 * Reference factors, NIST SP 811 (2008) Appendix B, all exact by definition:
 * 1 in = 25.4 mm, 1 lb = 0.45359237 kg, 1 lbf = 4.4482216152605 N; §4.2.1.1: t/°F = t/°C × 9/5 + 32.
 * Each expected value below is worked from these by hand, not from the product's code.
 */
const IN_M = 0.0254;
const LB_KG = 0.45359237;
const LBF_N = 4.4482216152605;
const rel = (got: number, want: number) => expect(Math.abs(got - want) / Math.abs(want)).toBeLessThan(1e-12);

describe('catalogue quantities in imperial units', () => {
  it('when a stress is in ksi, then 1 ksi = 1000 lbf / in² = 4448.2216152605 N / 645.16 mm² (NIST SP 811 App. B)', () => {
    rel(ksiToMpa(1), (1000 * LBF_N) / (25.4 * 25.4));
    rel(ksiToMpa(30), 206.84271879505); // 30 × 6.894757293168 MPa, worked by hand
  });

  it('when a modulus is in Msi, then 1 Msi = 10⁶ lbf/in² = 6.894757293 GPa (NIST SP 811 App. B)', () => {
    rel(fromDisplay('modulus', 28.3, 'imperial'), (28.3 * 1e6 * LBF_N) / (IN_M * IN_M) / 1e9);
    expect(formatQuantity('modulus', 195, 'imperial').text).toBe('28.3 Msi'); // 195 / 6.8948 = 28.28
  });

  it('when a density is in lb/in³, then 1 lb/in³ = 0.45359237 kg / (0.0254 m)³ = 27 679.9 kg/m³ (NIST SP 811 App. B)', () => {
    rel(fromDisplay('density', 1, 'imperial'), LB_KG / IN_M ** 3);
    // Type 321 at 8000 kg/m³: 8000 / 27 679.9 = 0.2890 lb/in³; supplier sheets print 0.289.
    expect(formatQuantity('density', 8000, 'imperial').text).toBe('0.289 lb/in³');
  });

  it('when a price is per lb, then it is the price per kg × 0.45359237 (NIST SP 811 App. B)', () => {
    rel(toDisplay('pricePerMass', 10, 'imperial'), 4.5359237);
    rel(fromDisplay('pricePerMass', 4.5359237, 'imperial'), 10);
    expect(formatQuantity('pricePerMass', 10, 'imperial').text).toBe('4.54 per lb');
  });

  it('when a mean coefficient is in µin/(in·°F), then it is the µm/(m·K) value × 5/9 (a kelvin is 9/5 °F, NIST SP 811 §4.2.1.1)', () => {
    rel(toDisplay('cte', 18, 'imperial'), 10);
    expect(formatQuantity('cte', 16.6, 'imperial').text).toBe('9.22 µin/in·°F'); // 16.6 × 5/9 = 9.222
  });

  it('when a temperature is typed in °F, then the stored °C is the exact equivalent (°C = (°F − 32) × 5/9, NIST SP 811 §4.2.1.1)', () => {
    expect(fToC(932)).toBe(500);
    expect(fToC(1562)).toBe(850);
    expect(fromDisplay('temperature', 1000, 'imperial')).toBe(4840 / 9);
    expect(fToC(-40)).toBe(-40);
  });

  it('when a datum is shown for editing, then metric keeps its figures and imperial rounds to the trade precision', () => {
    expect(inputNumber('cte', 16.667, 'metric', 6)).toBe(16.667);
    expect(inputNumber('temperature', 4840 / 9, 'imperial')).toBe(1000);
    expect(inputNumber('stress', 206.8, 'imperial')).toBe(30); // 206.8 / 6.894757 = 29.99
  });
});

describe('field messages in the reader units', () => {
  it('when a length bound is read in imperial, then it is worded in inches at the field precision (2000 mm / 25.4 = 78.74 in)', () => {
    expect(wordFieldMessage('Outside diameter must be at most 2000 mm', 'imperial', 'length')).toBe('Outside diameter must be at most 78.74 in');
    // 100 mm / 25.4 = 3.937 in, a wall at 0.001 in.
    expect(wordFieldMessage('Wall must be at most 100 mm', 'imperial', 'smallLength')).toBe('Wall must be at most 3.937 in');
  });

  it('when a temperature bound is read in imperial, then both levels are worded in °F (900 °C = 1652 °F, 870 °C = 1598 °F)', () => {
    expect(wordFieldMessage('900 °C is above the expansion data (max 870 °C)', 'imperial', 'temperature')).toBe(
      '1652 °F is above the expansion data (max 1598 °F)',
    );
    // 1300 °C × 9/5 + 32 = 2372 °F.
    expect(wordFieldMessage('Above 1300 °C: no alloy for pipework holds together there', 'imperial', 'temperature')).toBe(
      'Above 2372 °F: no alloy for pipework holds together there',
    );
  });

  it('when a bound below zero is written with the minus sign, then it keeps its sign in °F (−50 °C × 9/5 + 32 = −58 °F, NIST SP 811 §4.2.1.1)', () => {
    expect(wordFieldMessage('At least −50 °C, the lowest the calculator handles', 'imperial', 'temperature')).toBe('At least -58 °F, the lowest the calculator handles');
    expect(wordFieldMessage('Below -50 °C', 'imperial', 'temperature')).toBe('Below -58 °F');
  });

  it('when the reader is metric or the text names no SI figure, then the message is unchanged', () => {
    expect(wordFieldMessage('Outside diameter must be at most 2000 mm', 'metric', 'length')).toBe('Outside diameter must be at most 2000 mm');
    expect(wordFieldMessage('Enter a number', 'imperial', 'length')).toBe('Enter a number');
    expect(wordFieldMessage('Growth above 12 mm/m', 'imperial', 'length')).toBe('Growth above 12 mm/m');
  });
});
