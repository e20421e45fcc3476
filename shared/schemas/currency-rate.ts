import { z } from 'zod';

export const currencyCodeSchema = z
  .string({ error: 'Use a three-letter currency code' })
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{3}$/, { error: 'Use a three-letter currency code' });

/** An admin's rate: how much of the shop's currency one unit of `currency` buys. */
export const currencyRateInputSchema = z.object({
  rate: z
    .number({ error: 'Enter the rate as a number' })
    .refine(Number.isFinite, { error: 'Enter the rate as a number' })
    .gt(0, { error: 'The rate must be above zero' })
    .max(1e6, { error: 'The rate is implausibly large' }),
});
export type CurrencyRateInput = z.infer<typeof currencyRateInputSchema>;

export interface CurrencyRateView {
  /** The currency an alloy price may be in. */
  from: string;
  /** The shop's currency when the rate was set; a rate into any other currency is not used. */
  to: string;
  rate: number;
  setBy: string | null;
  setAt: string;
}

export interface CurrencyRatesView {
  shopCurrency: string;
  rates: CurrencyRateView[];
}

export const currencyRateParamsSchema = z.object({ from: currencyCodeSchema });
