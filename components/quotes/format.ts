/** Money in the quote's currency; an unknown code falls back to the plain number with the code. */
export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(amount);
  } catch {
    return `${amount.toFixed(2)} ${currency}`.trim();
  }
}

const MINUS = '−';
const sign = (value: number) => (value > 0 ? '+' : value < 0 ? MINUS : '±');

export function formatMoneyDifference(amount: number, currency: string): string {
  return `${sign(amount)}${formatMoney(Math.abs(amount), currency)}`;
}

export function formatPercentDifference(pct: number | null): string {
  if (pct === null) return '–';
  return `${sign(pct)}${Math.abs(pct).toFixed(1)} %`;
}

export function formatKg(kg: number): string {
  return `${kg.toFixed(2)} kg`;
}

export function formatKgDifference(kg: number): string {
  return `${sign(kg)}${Math.abs(kg).toFixed(2)} kg`;
}

export function formatDegrees(c: number): string {
  return `${Math.round(c)} °C`;
}

export function formatDegreesDifference(c: number): string {
  const rounded = Math.round(c);
  return `${sign(rounded)}${Math.abs(rounded)} °C`;
}

export function formatDateTime(iso: string): string {
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso));
}

/** A date `days` from now as YYYY-MM-DD, for the default validity. */
export function isoDateInDays(days: number, from: Date = new Date()): string {
  return new Date(from.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}
