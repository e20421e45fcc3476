import { formatQuantity, inputNumber, type QuantityKind, unitLabel, type UnitSystem } from '../../shared/units';

/** "12.34 mm" / "0.486 in" for an SI value. */
export const show = (kind: QuantityKind, si: number, units: UnitSystem, decimals?: number) =>
  formatQuantity(kind, si, units, decimals).text;

/** A difference with its sign: "+1.20 mm", "−15 °F". Temperature differences scale without the offset. */
export function showSigned(kind: QuantityKind, si: number, units: UnitSystem): string {
  const f = formatQuantity(kind, si, units);
  const sign = f.value > 0 ? '+' : f.value < 0 ? '−' : '±';
  return `${sign}${f.text.replace(/^-/, '')}`;
}

/** A field's label with its unit: "Length (mm)". */
export const withUnit = (label: string, kind: QuantityKind, units: UnitSystem) => `${label} (${unitLabel(kind, units)})`;

/** A number for an input box in the chosen system at the trade's precision (466.111 °C typed as 871 °F shows "871"). */
export function inputText(kind: QuantityKind, si: number, units: UnitSystem, decimals?: number): string {
  return String(inputNumber(kind, si, units, decimals));
}

export function showMoney(amount: number | null, currency: string | null): string {
  if (amount === null || currency === null) return '—';
  return `${amount.toFixed(2)} ${currency}`;
}

export function showSignedMoney(amount: number | null, currency: string | null): string {
  if (amount === null || currency === null) return '—';
  const sign = amount > 0 ? '+' : amount < 0 ? '−' : '±';
  return `${sign}${Math.abs(amount).toFixed(2)} ${currency}`;
}
