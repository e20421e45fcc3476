/** The fake provider's own payment pages: plain HTML, no script, test cards named on the page. */
import { escapeHtml } from '../mail/escape-html';

export const TEST_CARDS = {
  /** These are the payment provider's published test card numbers (docs.stripe.com/testing). */
  succeeds: '4242424242424242',
  declined: '4000000000000002',
  secondStep: '4000002500003155',
} as const;

const grouped = (card: string) => card.replace(/(\d{4})(?=\d)/g, '$1 ');

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<style>
body{font-family:system-ui,sans-serif;margin:0;background:#f3f4f1;color:#1d2521}
main{max-width:26rem;margin:0 auto;padding:1.5rem 1rem;display:flex;flex-direction:column;gap:1rem}
.box{background:#fff;border:1px solid #c9cec8;border-radius:.5rem;padding:1rem;display:flex;flex-direction:column;gap:.75rem}
label{font-weight:600}input{font-size:1.1rem;padding:.6rem;border:1px solid #7b857e;border-radius:.35rem}
button{font-size:1.05rem;padding:.7rem;border:0;border-radius:.35rem;background:#2d5a45;color:#fff;cursor:pointer}
button.plain{background:#e4e7e2;color:#1d2521}.error{color:#9b1c1c;font-weight:600}.muted{color:#5a645d;font-size:.9rem}
code{font-size:1rem}
</style></head><body><main>${body}</main></body></html>`;
}

export interface PayPageFacts {
  sessionId: string;
  description: string;
  amount: string;
  error?: string;
}

export function payPage(f: PayPageFacts): string {
  return page(
    `Pay ${f.amount}`,
    `<p class="muted">Test payment page: no real card is charged.</p>
<h1>Pay ${escapeHtml(f.amount)}</h1>
<p>${escapeHtml(f.description)}</p>
<form class="box" method="post" action="/pay/${escapeHtml(f.sessionId)}">
${f.error ? `<p class="error" role="alert">${escapeHtml(f.error)}</p>` : ''}
<label for="card">Card number</label>
<input id="card" name="card" inputmode="numeric" autocomplete="off" required>
<button type="submit">Pay ${escapeHtml(f.amount)}</button>
</form>
<section class="box" aria-label="Test cards">
<p><code>${grouped(TEST_CARDS.succeeds)}</code>: the payment succeeds</p>
<p><code>${grouped(TEST_CARDS.declined)}</code>: the card is declined</p>
<p><code>${grouped(TEST_CARDS.secondStep)}</code>: the bank asks for a second step</p>
</section>`,
  );
}

export function secondStepPage(sessionId: string, amount: string): string {
  return page(
    'Confirm with your bank',
    `<h1>Your bank asks you to confirm</h1>
<p>Confirm the payment of ${escapeHtml(amount)}.</p>
<form class="box" method="post" action="/pay/${escapeHtml(sessionId)}/confirm">
<button type="submit" name="answer" value="confirm">Confirm the payment</button>
<button type="submit" name="answer" value="refuse" class="plain">Refuse the payment</button>
</form>`,
  );
}

export function finishedPage(backUrl: string): string {
  return page('Payment finished', `<h1>This payment is finished</h1><p><a href="${escapeHtml(backUrl)}">Back to the shop</a></p>`);
}
