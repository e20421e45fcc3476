import { toShopCurrency, type Conversion } from '../../shared/currency/convert';
import type { CurrencyRatesView, CurrencyRateView } from '../../shared/schemas/currency-rate';
import { AppError } from '../http/app-error';
import type { ShopSettingsService } from '../settings/shop-settings.service';
import type { CurrencyRate } from './currency-rate.entity';
import type { CurrencyRatesRepository } from './currency-rates.repository';

const view = (r: CurrencyRate): CurrencyRateView => ({ from: r.from, to: r.to, rate: r.rate, setBy: r.setBy, setAt: new Date(r.setAt).toISOString() });

/** The rates an admin set into the shop's currency; prices in any other currency are converted with them or refused. */
export class CurrencyRatesService {
  constructor(
    private readonly repo: CurrencyRatesRepository,
    private readonly settings: ShopSettingsService,
  ) {}

  /** The rates' cache stamp: it moves on every set or removed rate, on any instance. */
  stamp(): Promise<number> {
    return this.repo.stamp();
  }

  async table(): Promise<CurrencyRatesView> {
    const [{ currency }, rows] = await Promise.all([this.settings.get(), this.repo.all()]);
    return { shopCurrency: currency, rates: rows.map(view) };
  }

  async set(from: string, rate: number, userName: string): Promise<CurrencyRatesView> {
    const { currency } = await this.settings.get();
    if (from === currency) {
      throw AppError.badRequest('same_currency', `${from} is the shop's own currency; it needs no rate.`, { from: 'This is the shop currency' });
    }
    await this.repo.save({ from, to: currency, rate, setBy: userName, setAt: new Date() });
    return this.table();
  }

  async remove(from: string): Promise<CurrencyRatesView> {
    const { currency } = await this.settings.get();
    if (!(await this.repo.remove(from, currency))) throw AppError.notFound(`No ${from} → ${currency} rate is set.`);
    return this.table();
  }

  /** One read of the table, then a converter over it (for a request that converts many amounts). */
  async converter(): Promise<{ shopCurrency: string; convert: (amount: number, currency: string) => Conversion }> {
    const table = await this.table();
    return { shopCurrency: table.shopCurrency, convert: (amount, currency) => toShopCurrency(amount, currency, table) };
  }
}
