import { depositMinor, formatMinor, minorDigits, toMinor } from '../../shared/payments/deposit-amount';

/*
 * The rule: the total is taken to whole minor units half up, then the share is taken of that and
 * rounded half up to the minor unit. Expected values are worked by hand below each case.
 * Minor-unit digits are ISO 4217's (EUR, GBP, USD 2; JPY 0; BHD, KWD 3).
 */
describe('deposit amounts in minor units', () => {
  it('when ISO 4217 gives a currency 0, 2 or 3 minor digits, then the amounts use them', () => {
    expect([minorDigits('EUR'), minorDigits('GBP'), minorDigits('JPY'), minorDigits('KWD')]).toEqual([2, 2, 0, 3]);
  });

  it('when a total has a half cent, then it goes up to the next cent, binary noise or not', () => {
    expect(toMinor(1.005, 'EUR')).toBe(101); // 1.005 € = 100.5 c → 101 c (1.005 × 100 is 100.49999… in binary)
    expect(toMinor(2.675, 'GBP')).toBe(268); // 267.5 p → 268 p
    expect(toMinor(1234.564, 'EUR')).toBe(123456); // 123456.4 c → 123456 c
    expect(toMinor(12345.5, 'JPY')).toBe(12346); // no minor unit: 12345.5 ¥ → 12346 ¥
  });

  it('when the share of an odd total falls on a half, then it rounds half up; otherwise to the nearest minor unit', () => {
    expect(depositMinor(5, 30)).toBe(2); // 5 × 0.30 = 1.5 → 2
    expect(depositMinor(3335, 50)).toBe(1668); // 1667.5 → 1668
    expect(depositMinor(10001, 30)).toBe(3000); // 3000.3 → 3000
    expect(depositMinor(10005, 30)).toBe(3002); // 3001.5 → 3002
    expect(depositMinor(12345, 30)).toBe(3704); // ¥12,345 × 0.30 = 3703.5 → 3704
    expect(depositMinor(99999, 33)).toBe(33000); // 32999.67 → 33000
    expect(depositMinor(1, 49)).toBe(0); // 0.49 → 0: no deposit is asked
  });

  it('when the share is 0 % or 100 %, then the deposit is nothing or the whole total', () => {
    expect(depositMinor(123457, 0)).toBe(0);
    expect(depositMinor(123457, 100)).toBe(123457);
  });

  it('when the total or share is not whole or out of range, then it is refused rather than guessed', () => {
    expect(() => depositMinor(100.5, 30)).toThrow(RangeError);
    expect(() => depositMinor(-1, 30)).toThrow(RangeError);
    expect(() => depositMinor(100, 12.5)).toThrow(RangeError);
    expect(() => depositMinor(100, 101)).toThrow(RangeError);
  });

  it('when minor units are shown, then they read as the currency’s money', () => {
    expect(formatMinor(12345, 'EUR')).toBe('€123.45');
    expect(formatMinor(3704, 'JPY')).toBe('JP¥3,704');
    expect(formatMinor(1500, 'KWD')).toMatch(/^KWD\s1\.500$/); // Intl puts a no-break space after the code
  });
});
