import type { CurrencyRatesView } from '../schemas/currency-rate';

export type Conversion = { ok: true; amount: number; rate: number } | { ok: false; message: string };

/**
 * An amount in `currency` expressed in the shop's currency, at the rate an admin set into that
 * currency; refused with a message a person can act on when no such rate exists. Never a silent 1:1.
 */
export function toShopCurrency(amount: number, currency: string, table: CurrencyRatesView): Conversion {
  if (currency === table.shopCurrency) return { ok: true, amount, rate: 1 };
  const found = table.rates.find((r) => r.from === currency && r.to === table.shopCurrency);
  if (!found) {
    return {
      ok: false,
      message: `Priced in ${currency}, but the shop works in ${table.shopCurrency} and no ${currency} → ${table.shopCurrency} rate is set. An admin can set one under Currency rates, or the alloy's price can be entered in ${table.shopCurrency}.`,
    };
  }
  return { ok: true, amount: amount * found.rate, rate: found.rate };
}
