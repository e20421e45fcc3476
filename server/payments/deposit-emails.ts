import { escapeHtml } from '../mail/escape-html';
import { formatMinor } from '../../shared/payments/deposit-amount';
import type { OutgoingMail } from '../mail/mailer';

export interface ReceiptFacts {
  kind: 'paid' | 'refunded';
  number: string;
  shopName: string;
  customerName: string;
  amountMinor: number;
  currency: string;
  at: Date;
  reason?: string;
  /** The customer's own quote link is never stored, so the shop's copy links to the quote in Dilato. */
  shopLink?: string;
}

function lines(f: ReceiptFacts): string[] {
  const amount = formatMinor(f.amountMinor, f.currency);
  const when = f.at.toISOString().slice(0, 16).replace('T', ' ') + ' UTC';
  return f.kind === 'paid'
    ? [`Deposit received on quote ${f.number}: ${amount}, paid ${when}.`]
    : [`Deposit refunded on quote ${f.number}: ${amount}, refunded ${when}.`, ...(f.reason ? [`Reason: ${f.reason}`] : [])];
}

/** The receipt to the customer, paid or refunded. */
export function customerReceipt(f: ReceiptFacts, to: string): OutgoingMail {
  const body = lines(f);
  const subject = f.kind === 'paid' ? `Receipt: deposit for quote ${f.number} from ${f.shopName}` : `Refund: deposit for quote ${f.number} from ${f.shopName}`;
  const closing = f.kind === 'paid' ? 'Thank you. We will be in touch about the work.' : 'The refund goes back to the card you paid with; banks take a few days to show it.';
  const text = [`Hello ${f.customerName},`, '', ...body, '', closing, '', f.shopName].join('\n');
  const html = [`<p>Hello ${escapeHtml(f.customerName)},</p>`, ...body.map((l) => `<p>${escapeHtml(l)}</p>`), `<p>${escapeHtml(closing)}</p>`, `<p>${escapeHtml(f.shopName)}</p>`].join('\n');
  return { to, subject, text, html };
}

/** The same facts for the salesperson who sent the quote. */
export function shopReceipt(f: ReceiptFacts, to: string): OutgoingMail {
  const body = lines(f);
  const subject = f.kind === 'paid' ? `Deposit paid on quote ${f.number} by ${f.customerName}` : `Deposit refunded on quote ${f.number} (${f.customerName})`;
  const text = [...body, ...(f.shopLink ? ['', `Open the quote in Dilato: ${f.shopLink}`] : [])].join('\n');
  const html = [...body.map((l) => `<p>${escapeHtml(l)}</p>`), ...(f.shopLink ? [`<p><a href="${escapeHtml(f.shopLink)}">Open the quote in Dilato</a></p>`] : [])].join('\n');
  return { to, subject, text, html };
}
