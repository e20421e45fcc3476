import { randomUUID } from 'node:crypto';
import type Stripe from 'stripe';
import { depositMinor, formatMinor, toMinor } from '../../shared/payments/deposit-amount';
import type { DepositView, JobDepositView } from '../../shared/schemas/deposits';
import type { PublicUser } from '../../shared/schemas/auth';
import { AppError } from '../http/app-error';
import type { Mailer, OutgoingMail } from '../mail/mailer';
import type { Quote } from '../quotes/quote.entities';
import { hashToken } from '../quotes/customer-quotes';
import type { ShopSettingsService } from '../settings/shop-settings.service';
import type { UsersRepository } from '../users/users.repository';
import { Deposit } from './deposit.entities';
import { customerReceipt, shopReceipt, type ReceiptFacts } from './deposit-emails';
import type { DepositsStore } from './deposits.repository';

type Actor = Pick<PublicUser, 'id' | 'name' | 'role'>;
type QuoteFacts = Pick<Quote, 'id' | 'status' | 'acceptedOptionIndex' | 'snapshot'>;

export function depositView(d: Deposit): DepositView {
  const iso = (at: Date | null) => (at ? new Date(at).toISOString() : null);
  return {
    status: d.status,
    sharePct: d.sharePct,
    amountMinor: d.amountMinor,
    currency: d.currency,
    attempts: d.attempts,
    failureMessage: d.status === 'failed' ? d.failureMessage : null,
    paidAt: iso(d.paidAt),
    refundedAt: iso(d.refundedAt),
    refundReason: d.refundReason,
  };
}

/** The deposit an accepted quote asks for under today's share, before anyone has started paying. */
function dueOf(quote: QuoteFacts, sharePct: number): { amountMinor: number; currency: string } | null {
  const pricing = quote.snapshot;
  const option = quote.acceptedOptionIndex === null ? undefined : pricing?.options[quote.acceptedOptionIndex];
  if (quote.status !== 'accepted' || !pricing || !option || sharePct === 0) return null;
  const amountMinor = depositMinor(toMinor(option.total, pricing.currency), sharePct);
  return amountMinor > 0 ? { amountMinor, currency: pricing.currency } : null;
}

/**
 * Deposits on accepted quotes through the payment provider's SDK. The provider's answer about a
 * payment counts only when it arrives as a signed webhook (see DepositWebhooks); this class starts
 * payments, refunds them and shows where each stands.
 */
export class DepositsService {
  constructor(
    private readonly store: DepositsStore,
    private readonly settings: ShopSettingsService,
    private readonly provider: Stripe | undefined,
    private readonly mailer: Mailer,
    private readonly users: UsersRepository,
  ) {}

  /** What the quote's pages show: the stored deposit, else what is due now, else nothing. */
  async viewOf(quote: QuoteFacts, stored?: Deposit | null): Promise<DepositView | null> {
    const row = stored === undefined ? await this.store.read().ofQuote(quote.id) : stored;
    if (row) return depositView(row);
    const { depositSharePct } = await this.settings.get();
    const due = dueOf(quote, depositSharePct);
    if (!due) return null;
    return { status: 'due', sharePct: depositSharePct, ...due, attempts: 0, failureMessage: null, paidAt: null, refundedAt: null, refundReason: null };
  }

  async forJob(jobId: string): Promise<JobDepositView[]> {
    const repo = this.store.read();
    const quotes = await repo.quotesOfJob(jobId);
    const rows = new Map((await repo.ofQuotes(quotes.map((q) => q.id))).map((d) => [d.quoteId, d]));
    const items: JobDepositView[] = [];
    for (const q of quotes) {
      const view = await this.viewOf(q, rows.get(q.id) ?? null);
      if (view) items.push({ ...view, quoteId: q.id, quoteNumber: q.number });
    }
    return items;
  }

  /**
   * Opens (or reopens) the provider's payment page for the customer. The attempt is claimed in one
   * transaction, the SDK is called outside any transaction with an idempotency key per quote and
   * attempt (a double press gets the same page), and the page is stored in a second one.
   */
  async startPayment(token: string, origin: string): Promise<{ url: string }> {
    const provider = this.requireProvider();
    const claim = await this.store.write(async (repo) => {
      const quote = /^[A-Za-z0-9_-]{20,100}$/.test(token) ? await repo.quotes.findByTokenHash(hashToken(token)) : null;
      if (!quote) throw new AppError(404, 'quote_not_found', 'This quote link is not valid.');
      if (quote.status !== 'accepted') throw AppError.conflict('not_accepted', 'A deposit can be paid once the quote is accepted.');
      let row = await repo.ofQuote(quote.id);
      if (row?.status === 'paid') throw AppError.conflict('deposit_paid', 'The deposit is already paid.');
      if (row?.status === 'refunded') throw AppError.conflict('deposit_refunded', 'The deposit was refunded; ask the shop how to go on.');
      if (row?.status === 'pending' && row.checkoutUrl) return { quote, row, url: row.checkoutUrl };
      const now = new Date();
      if (!row) {
        const { depositSharePct } = await this.settings.get();
        const due = dueOf(quote, depositSharePct);
        if (!due) throw AppError.conflict('deposits_off', 'This quote asks for no deposit.');
        row = Object.assign(new Deposit(), { id: randomUUID(), quoteId: quote.id, status: 'pending', sharePct: depositSharePct, ...due, attempts: 0, createdAt: now });
      }
      if (row.status === 'failed' || row.attempts === 0) {
        Object.assign(row, { status: 'pending', attempts: row.attempts + 1, checkoutSessionId: null, checkoutUrl: null, failureMessage: null });
        await repo.quotes.addEvent({ id: randomUUID(), quoteId: quote.id, status: quote.status, note: `Deposit payment started (attempt ${row.attempts}, ${formatMinor(row.amountMinor, row.currency)})`, by: quote.decidedBy, at: now });
      }
      row.updatedAt = now;
      await repo.save(row);
      return { quote, row, url: null };
    });
    if (claim.url) return { url: claim.url };

    const { quote, row } = claim;
    const shopName = quote.snapshot?.settings.shopName ?? 'the shop';
    const metadata = { quoteId: quote.id, depositId: row.id, attempt: String(row.attempts), origin };
    let session: Stripe.Checkout.Session;
    try {
      session = await provider.checkout.sessions.create(
        {
          mode: 'payment',
          customer_email: quote.customerEmail,
          client_reference_id: quote.id,
          line_items: [{ quantity: 1, price_data: { currency: row.currency.toLowerCase(), unit_amount: row.amountMinor, product_data: { name: `Deposit (${row.sharePct} %) on quote ${quote.number}, ${shopName}` } } }],
          metadata,
          payment_intent_data: { metadata },
          success_url: `${origin}/q/${token}?deposit=done`,
          cancel_url: `${origin}/q/${token}?deposit=back`,
        },
        { idempotencyKey: `deposit-${quote.id}-${row.attempts}` },
      );
    } catch (err) {
      console.error(`[dilato] quote ${quote.id}: the payment page could not be opened:`, err);
      throw new AppError(502, 'payment_provider_failed', 'The payment page could not be opened just now. Try again in a moment.');
    }
    if (!session.url) throw new AppError(502, 'payment_provider_failed', 'The payment provider gave no payment page. Try again in a moment.');
    await this.store.write(async (repo) => {
      const current = await repo.find(row.id);
      if (current && current.status === 'pending' && current.attempts === row.attempts) {
        Object.assign(current, { checkoutSessionId: session.id, checkoutUrl: session.url, updatedAt: new Date() });
        await repo.save(current);
      }
    });
    return { url: session.url };
  }

  /** An admin gives the deposit back through the provider, with the reason kept in the quote's history. */
  async refund(quoteId: string, reason: string, actor: Actor, origin: string): Promise<DepositView> {
    const provider = this.requireProvider();
    const row = await this.store.read().ofQuote(quoteId);
    if (!(await this.store.read().quotes.find(quoteId))) throw AppError.notFound('There is no such quote.');
    if (!row || (row.status !== 'paid' && row.status !== 'refunded') || !row.paymentIntentId) throw AppError.conflict('deposit_not_paid', 'There is no paid deposit to refund.');
    if (row.status === 'refunded' && row.refundReason) throw AppError.conflict('deposit_refunded', 'The deposit has already been refunded.');
    let refund: Stripe.Refund;
    try {
      refund = await provider.refunds.create(
        { payment_intent: row.paymentIntentId, reason: 'requested_by_customer', metadata: { quoteId, reason: reason.slice(0, 500) } },
        { idempotencyKey: `refund-${row.id}` },
      );
    } catch (err) {
      console.error(`[dilato] quote ${quoteId}: the refund failed:`, err);
      const message = err instanceof Error && 'type' in err ? err.message : 'The payment provider could not be reached.';
      throw new AppError(502, 'refund_failed', `The refund did not go through: ${message}`);
    }
    const done = await this.store.write(async (repo) => {
      const current = (await repo.find(row.id))!;
      const quote = (await repo.quotes.find(quoteId))!;
      if (current.refundReason) return null;
      const before = current.status;
      const refunded = { status: 'refunded' as const, refundId: refund.id, refundReason: reason, refundedAt: current.refundedAt ?? new Date(), updatedAt: new Date() };
      if (!(await repo.moveOn(current.id, 'not_refunded_here', refunded))) return null;
      Object.assign(current, refunded);
      await repo.quotes.addEvent({ id: randomUUID(), quoteId, status: quote.status, note: `Deposit refunded (${formatMinor(current.amountMinor, current.currency)}): ${reason}`, by: actor.name, at: new Date() });
      await repo.quotes.activity.add(
        { subject: 'quote', subjectId: quoteId, subjectName: quote.number, jobId: null, action: 'refunded', changes: [{ path: 'deposit', before, after: 'refunded' }, { path: 'refundReason', before: null, after: reason }] },
        actor,
      );
      return { quote, deposit: current };
    });
    if (done) await this.sendReceipts(done.quote, done.deposit, 'refunded', origin);
    return depositView((await this.store.read().find(row.id))!);
  }

  private requireProvider(): Stripe {
    if (!this.provider) throw new AppError(503, 'payments_unavailable', 'Online payments are not set up on this server.');
    return this.provider;
  }

  /** Receipts go out after the commit; a mail failure is logged and changes nothing that was paid or refunded. */
  async sendReceipts(quote: Quote, deposit: Deposit, kind: ReceiptFacts['kind'], origin: string | undefined): Promise<void> {
    const facts: ReceiptFacts = {
      kind,
      number: quote.number,
      shopName: quote.snapshot?.settings.shopName ?? 'The shop',
      customerName: quote.customerName,
      amountMinor: deposit.amountMinor,
      currency: deposit.currency,
      at: kind === 'paid' ? deposit.paidAt! : deposit.refundedAt!,
      reason: deposit.refundReason ?? undefined,
      shopLink: origin ? `${origin}/quotes/${quote.id}` : undefined,
    };
    const seller = quote.createdBy ? await this.users.findById(quote.createdBy) : null;
    const mails: OutgoingMail[] = [customerReceipt(facts, quote.customerEmail), ...(seller ? [shopReceipt(facts, seller.email)] : [])];
    for (const mail of mails) {
      await this.mailer.send(mail).catch((err) => console.error(`[dilato] quote ${quote.id}: a deposit receipt could not be sent:`, err));
    }
  }
}
