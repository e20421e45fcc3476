import { formatQuantity, type UnitSystem } from '../../shared/units';

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

/** Masses and temperature margins follow the reader's units (the customer's page: their switch on it). */
export function formatKg(kg: number, units: UnitSystem = 'metric'): string {
  return formatQuantity('mass', kg, units).text;
}

export function formatKgDifference(kg: number, units: UnitSystem = 'metric'): string {
  const f = formatQuantity('mass', Math.abs(kg), units);
  return `${sign(kg)}${f.text}`;
}

/** A margin or difference of temperature: scales by 9/5 with no 32 °F offset. */
export function formatDegrees(c: number, units: UnitSystem = 'metric'): string {
  return formatQuantity('temperatureDelta', c, units).text;
}

export function formatDegreesDifference(c: number, units: UnitSystem = 'metric'): string {
  const f = formatQuantity('temperatureDelta', c, units);
  return `${sign(f.value)}${formatQuantity('temperatureDelta', Math.abs(c), units).text}`;
}

export function formatDateTime(iso: string): string {
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso));
}

/** A date `days` from now as YYYY-MM-DD, for the default validity. */
export function isoDateInDays(days: number, from: Date = new Date()): string {
  return new Date(from.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}
