import type { DepositView } from '../../shared/schemas/deposits';
import type { PublicQuoteView, QuoteView } from '../../shared/schemas/quotes';
import { TEST_CARDS } from '../../server/payments/fake-pay-pages';
import { draftQuote, mailTo, tokenIn } from './quote-helpers';
import { client, signedIn, type TestApp } from './test-app';

type Client = Awaited<ReturnType<typeof signedIn>>;

export { TEST_CARDS };

/** A quote sent by the demo salesperson and accepted (option 1) by the customer through the link. */
export async function acceptedQuote(t: TestApp, email = 'deposit@example.test') {
  const sales = await signedIn(t.app, 'sales');
  const draft = await draftQuote(t.app, sales, email);
  const sent = await sales.post(`/api/quotes/${draft.id}/send`);
  if (sent.status !== 200) throw new Error(`send: ${sent.status} ${JSON.stringify(sent.body)}`);
  const token = tokenIn((await mailTo(sales, email))[0].text);
  const customer = client(t.app);
  const accepted = await customer.post(`/api/public/quotes/${token}/accept`).send({ optionIndex: 0, name: 'Oda Kallstrom' });
  if (accepted.status !== 200) throw new Error(`accept: ${accepted.status} ${JSON.stringify(accepted.body)}`);
  return { sales, customer, token, quoteId: draft.id, quote: accepted.body.quote as PublicQuoteView };
}

export async function publicDeposit(customer: Client, token: string): Promise<DepositView | null | undefined> {
  return ((await customer.get(`/api/public/quotes/${token}`)).body.quote as PublicQuoteView).deposit;
}

export async function shopQuote(sales: Client, id: string): Promise<QuoteView> {
  return (await sales.get(`/api/quotes/${id}`)).body.quote as QuoteView;
}

/** Opens the payment page through the app, as the "Pay deposit" button does. */
export async function startPayment(customer: Client, token: string): Promise<string> {
  const res = await customer.post(`/api/public/quotes/${token}/deposit`).send({});
  if (res.status !== 200) throw new Error(`deposit: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.url as string;
}

/** Submits a card on the fake provider's own page, as a person would; answers where the page sends the browser. */
export async function payOnPage(url: string, card: string): Promise<{ status: number; location: string | null; html: string }> {
  const res = await fetch(url, { method: 'POST', body: new URLSearchParams({ card }), redirect: 'manual' });
  return { status: res.status, location: res.headers.get('location'), html: await res.text() };
}

export async function answerSecondStep(url: string, answer: 'confirm' | 'refuse') {
  const res = await fetch(`${url}/confirm`, { method: 'POST', body: new URLSearchParams({ answer }), redirect: 'manual' });
  return { status: res.status, location: res.headers.get('location') };
}

/** Waits until the fake has sent an event of the type (the refund's webhook follows the API answer). */
export async function untilSent(t: TestApp, type: string, count = 1): Promise<void> {
  for (let i = 0; i < 100; i++) {
    if (t.payments.sent.filter((e) => e.type === type).length >= count) {
      await new Promise((r) => setTimeout(r, 50));
      return;
    }
    await new Promise((r) => setTimeout(r, 20));
  }
  throw new Error(`no ${type} event was sent`);
}
