import { randomUUID } from 'node:crypto';
import Stripe from 'stripe';
import { formatMinor } from '../../shared/payments/deposit-amount';
import { AppError } from '../http/app-error';
import type { Quote } from '../quotes/quote.entities';
import type { Deposit } from './deposit.entities';
import type { DepositsRepository, DepositsStore } from './deposits.repository';
import type { DepositsService } from './deposits.service';

type Receipt = { quote: Quote; deposit: Deposit; kind: 'paid' | 'refunded'; origin?: string };

/**
 * The provider's signed events, the only way Dilato learns how a payment went. Each event id is
 * handled once (a replay is answered 200 and changes nothing), and a deposit only moves forward —
 * pending or failed → paid → refunded — so events arriving out of order cannot undo a payment.
 */
export class DepositWebhooks {
  private readonly verifier = new Stripe('sk_signature_check_only');

  constructor(
    private readonly store: DepositsStore,
    private readonly deposits: DepositsService,
    private readonly webhookSecret: string | undefined,
  ) {}

  async receive(rawBody: Buffer | undefined, signature: string | undefined): Promise<{ handled: boolean }> {
    let event: Stripe.Event;
    try {
      if (!rawBody || !signature || !this.webhookSecret) throw new Error('unsigned');
      event = this.verifier.webhooks.constructEvent(rawBody, signature, this.webhookSecret);
    } catch {
      throw AppError.badRequest('bad_signature', 'The webhook signature does not match.');
    }
    const receipt = await this.store.write(async (repo) => {
      if (!(await repo.firstSight(event.id, event.type))) return { handled: false, receipt: null };
      return { handled: true, receipt: await this.apply(repo, event) };
    });
    const r = receipt.receipt;
    if (r) await this.deposits.sendReceipts(r.quote, r.deposit, r.kind, r.origin);
    return { handled: receipt.handled };
  }

  private async apply(repo: DepositsRepository, event: Stripe.Event): Promise<Receipt | null> {
    switch (event.type) {
      case 'checkout.session.completed': {
        const session = event.data.object;
        const deposit = session.metadata?.depositId ? await repo.find(session.metadata.depositId) : null;
        if (!deposit || session.payment_status !== 'paid' || (deposit.status !== 'pending' && deposit.status !== 'failed')) return null;
        if (session.amount_total !== deposit.amountMinor) {
          console.error(`[dilato] deposit ${deposit.id}: paid ${session.amount_total} but ${deposit.amountMinor} was asked; left for the shop to check`);
          return null;
        }
        const paymentIntent = typeof session.payment_intent === 'string' ? session.payment_intent : (session.payment_intent?.id ?? null);
        const paid = { status: 'paid' as const, paymentIntentId: paymentIntent, checkoutSessionId: session.id, failureMessage: null, paidAt: new Date(), updatedAt: new Date() };
        if (!(await repo.moveOn(deposit.id, ['pending', 'failed'], paid))) return null;
        Object.assign(deposit, paid);
        const quote = (await repo.quotes.find(deposit.quoteId))!;
        await this.note(repo, quote, `Deposit paid (${formatMinor(deposit.amountMinor, deposit.currency)})`);
        return { quote, deposit, kind: 'paid', origin: session.metadata?.origin };
      }
      case 'payment_intent.payment_failed': {
        const intent = event.data.object;
        const deposit = intent.metadata?.depositId ? await repo.find(intent.metadata.depositId) : null;
        // A failure counts only for the attempt still open: an old attempt's news cannot undo a newer one.
        if (!deposit || deposit.status !== 'pending' || intent.metadata.attempt !== String(deposit.attempts)) return null;
        const message = intent.last_payment_error?.message ?? 'The payment did not go through.';
        const failed = { status: 'failed' as const, failureMessage: message, checkoutUrl: null, updatedAt: new Date() };
        if (!(await repo.moveOn(deposit.id, ['pending'], failed))) return null;
        Object.assign(deposit, failed);
        await this.note(repo, (await repo.quotes.find(deposit.quoteId))!, `Deposit payment failed (attempt ${deposit.attempts}): ${message}`);
        return null;
      }
      case 'charge.refunded': {
        const charge = event.data.object;
        const intent = typeof charge.payment_intent === 'string' ? charge.payment_intent : charge.payment_intent?.id;
        const deposit = intent ? await repo.byPaymentIntent(intent) : null;
        // Still 'paid' here means the refund was made at the provider, not through Dilato's refund
        // (which marks the deposit refunded and mails the receipts itself): this event is the only news of it.
        if (!deposit || deposit.status !== 'paid') return null;
        const refunded = { status: 'refunded' as const, refundedAt: new Date(), updatedAt: new Date() };
        if (!(await repo.moveOn(deposit.id, ['paid'], refunded))) return null;
        Object.assign(deposit, refunded);
        const quote = (await repo.quotes.find(deposit.quoteId))!;
        await this.note(repo, quote, `Deposit refunded at the payment provider (${formatMinor(deposit.amountMinor, deposit.currency)})`);
        return { quote, deposit, kind: 'refunded', origin: typeof charge.metadata?.origin === 'string' ? charge.metadata.origin : undefined };
      }
      default:
        return null;
    }
  }

  private note(repo: DepositsRepository, quote: Quote, note: string) {
    return repo.quotes.addEvent({ id: randomUUID(), quoteId: quote.id, status: quote.status, note, by: null, at: new Date() });
  }
}
