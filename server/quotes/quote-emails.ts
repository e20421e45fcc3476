import type { QuotePricing } from '../../shared/schemas/quotes';
import type { OutgoingMail } from '../mail/mailer';

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

export function money(amount: number, currency: string): string {
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).format(amount);
}

interface QuoteMailFacts {
  number: string;
  shopName: string;
  customerName: string;
  jobName: string;
  validUntil: string;
  message: string;
  link: string;
  pricing: QuotePricing;
}

const SIGN_OFF = 'These figures are guidance for fabrication; the alloy supplier’s certified data and your local codes govern the final design.';

/** The customer's e-mail: the options with their totals and the private link, in text and HTML. */
export function quoteMail(f: QuoteMailFacts, to: string): OutgoingMail {
  const lines = f.pricing.options.map((o, i) => {
    const diff = f.pricing.comparisons[i];
    const vs = i === 0 ? '' : ` (${diff.costDifference >= 0 ? '+' : '−'}${money(Math.abs(diff.costDifference), f.pricing.currency)} against option 1)`;
    return { text: `Option ${i + 1}, ${o.label}: ${money(o.total, f.pricing.currency)}${vs}`, label: o.label, total: money(o.total, f.pricing.currency), vs };
  });
  const subject = `Quote ${f.number} from ${f.shopName}: ${f.jobName}`;
  const text = [
    `Hello ${f.customerName},`,
    '',
    `here is your quote ${f.number} for ${f.jobName}, with ${f.pricing.options.length} material options.`,
    ...(f.message ? ['', f.message] : []),
    '',
    ...lines.map((l) => l.text),
    '',
    `Open your quote to compare the options and accept one: ${f.link}`,
    `The quote is valid until ${f.validUntil}.`,
    '',
    SIGN_OFF,
    '',
    f.shopName,
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(f.customerName)},</p>`,
    `<p>here is your quote <strong>${escapeHtml(f.number)}</strong> for ${escapeHtml(f.jobName)}, with ${f.pricing.options.length} material options.</p>`,
    ...(f.message ? [`<p>${escapeHtml(f.message)}</p>`] : []),
    '<ul>',
    ...lines.map((l, i) => `<li>Option ${i + 1}, ${escapeHtml(l.label)}: <strong>${escapeHtml(l.total)}</strong>${escapeHtml(l.vs)}</li>`),
    '</ul>',
    `<p><a href="${escapeHtml(f.link)}">Open your quote</a> to compare the options and accept one. It is valid until ${escapeHtml(f.validUntil)}.</p>`,
    `<p><small>${escapeHtml(SIGN_OFF)}</small></p>`,
    `<p>${escapeHtml(f.shopName)}</p>`,
  ].join('\n');
  return { to, subject, text, html };
}

interface DecisionFacts {
  number: string;
  jobName: string;
  customerName: string;
  customerCompany?: string;
  decidedBy: string;
  accepted: boolean;
  optionLabel?: string;
  total?: string;
  reason?: string;
  link: string;
}

/** Who answered, named once: "Oda Kallstrom for Kallstrom Track Days", "Oda Kallstrom", or "Per Lind (quote sent to Oda Kallstrom)". */
export function whoDecided(f: Pick<DecisionFacts, 'decidedBy' | 'customerName' | 'customerCompany'>): string {
  if (f.customerCompany) return `${f.decidedBy} for ${f.customerCompany}`;
  const same = f.decidedBy.trim().toLowerCase() === f.customerName.trim().toLowerCase();
  return same ? f.decidedBy : `${f.decidedBy} (quote sent to ${f.customerName})`;
}

/** The note to the salesperson when the customer decides. */
export function decisionMail(f: DecisionFacts, to: string): OutgoingMail {
  const who = whoDecided(f);
  const sentence = f.accepted
    ? `${who} accepted option “${f.optionLabel}” (${f.total}) on quote ${f.number} (${f.jobName}).`
    : `${who} declined quote ${f.number} (${f.jobName}).`;
  const subject = `Quote ${f.number} ${f.accepted ? 'accepted' : 'declined'} by ${f.customerName}${f.customerCompany ? ` (${f.customerCompany})` : ''}`;
  const text = [sentence, ...(f.reason ? ['', `Reason given: ${f.reason}`] : []), '', `Open the quote in Dilato: ${f.link}`].join('\n');
  const what = f.accepted ? ` accepted option “${escapeHtml(f.optionLabel ?? '')}” (${escapeHtml(f.total ?? '')}) on quote ` : ' declined quote ';
  const html = `<p>${escapeHtml(who)}${what}<strong>${escapeHtml(f.number)}</strong> (${escapeHtml(f.jobName)}).</p>${
    f.reason ? `<p>Reason given: ${escapeHtml(f.reason)}</p>` : ''
  }<p><a href="${escapeHtml(f.link)}">Open the quote in Dilato</a></p>`;
  return { to, subject, text, html };
}
