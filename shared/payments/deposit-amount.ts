/**
 * Money for deposits is held in integer minor units (cents, pence; yen have none) from the moment
 * it leaves the quote's pricing to the payment provider and back.
 */

/** Digits after the decimal point in the currency's minor unit, as ISO 4217 (through Intl) gives them. */
export function minorDigits(currency: string): number {
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/**
 * A price in major units (as the quote's pricing keeps it) to whole minor units, half up.
 * toFixed first takes off binary noise such as 1.005 × 100 = 100.49999…, so the half is seen as a half.
 */
export function toMinor(amount: number, currency: string): number {
  const scaled = Number((amount * 10 ** minorDigits(currency)).toFixed(6));
  return Math.floor(scaled + 0.5);
}

/**
 * The deposit: `sharePct` (a whole percent, 0–100) of a total in minor units, rounded half up to
 * the minor unit, worked in integers so no float ever decides a cent.
 */
export function depositMinor(totalMinor: number, sharePct: number): number {
  if (!Number.isInteger(totalMinor) || totalMinor < 0) throw new RangeError('totalMinor must be a whole number of minor units, not negative');
  if (!Number.isInteger(sharePct) || sharePct < 0 || sharePct > 100) throw new RangeError('sharePct must be a whole percent from 0 to 100');
  return Math.floor((totalMinor * sharePct + 50) / 100);
}

/** Minor units shown as money in the currency, e.g. 3704 JPY → ¥3,704 and 12345 EUR → €123.45. */
export function formatMinor(amountMinor: number, currency: string): string {
  const digits = minorDigits(currency);
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency, minimumFractionDigits: digits, maximumFractionDigits: digits }).format(
    amountMinor / 10 ** digits,
  );
}
