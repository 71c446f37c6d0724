// The payments fake's own hosted card page, served on the fake's port (not Dwell's): the only place in the demo
// where a card number is typed. Plain HTML forms, every value escaped.

const escape = (text: string) => text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c);

const TEST_CARDS =
  'Test cards: 4242 4242 4242 4242 is paid; 4000 0000 0000 0002 is declined; 4000 0025 0000 3155 asks for an extra confirmation first. ' +
  'Any future expiry date and any three digits.';

function page(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escape(title)} · Test payment service</title>
<style>
  body { font-family: system-ui, sans-serif; margin: 0; background: #eef1f4; color: #16202a; }
  h1 { font-size: 1.35rem; }
  main { max-width: 26rem; margin: 2rem auto; background: #fff; padding: 1.5rem; border-radius: 0.75rem; box-shadow: 0 1px 4px #0002; }
  .banner { font-size: 0.85rem; background: #fff7d6; border: 1px solid #d8c46a; padding: 0.5rem 0.75rem; border-radius: 0.5rem; }
  label { display: block; font-weight: 600; margin-top: 0.9rem; }
  input { display: block; width: 100%; box-sizing: border-box; font-size: 1.05rem; padding: 0.55rem; margin-top: 0.25rem; border: 1px solid #7a8794; border-radius: 0.4rem; }
  .row { display: flex; gap: 0.75rem; } .row > div { flex: 1; }
  button { margin-top: 1.25rem; width: 100%; font-size: 1.05rem; padding: 0.7rem; border: 0; border-radius: 0.5rem; background: #1f4e79; color: #fff; cursor: pointer; }
  button.plain { background: #fff; color: #1f4e79; border: 1px solid #1f4e79; }
  .error { background: #fde8e8; border: 1px solid #b42318; color: #7a1a12; padding: 0.6rem 0.75rem; border-radius: 0.5rem; margin-top: 1rem; }
  .amount { font-size: 1.6rem; font-weight: 700; margin: 0.25rem 0 0; }
  a { color: #1f4e79; }
</style>
</head>
<body><main>
<p class="banner">Test payment service running on this computer — not a real bank, and no money moves.</p>
${body}
</main></body>
</html>`;
}

export interface PageSession {
  id: string;
  description: string;
  amountText: string;
  cancelUrl: string;
}

/** The card form, with what was wrong with the last try (a declined card, a mistyped field). */
export function cardFormPage(s: PageSession, error?: string): string {
  return page(
    `Pay ${s.amountText}`,
    `<h1>${escape(s.description)}</h1>
<p class="amount">${escape(s.amountText)}</p>
${error ? `<p class="error" role="alert">${escape(error)}</p>` : ''}
<form method="post" action="/pay/${escape(s.id)}" aria-label="Card payment">
  <label for="number">Card number</label>
  <input id="number" name="number" inputmode="numeric" autocomplete="cc-number" required>
  <div class="row">
    <div><label for="expiry">Expiry (MM/YY)</label><input id="expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" placeholder="MM/YY" required></div>
    <div><label for="cvc">Security code</label><input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" maxlength="4" required></div>
  </div>
  <button type="submit">Pay ${escape(s.amountText)}</button>
</form>
<p><small>${escape(TEST_CARDS)}</small></p>
<p><a href="${escape(s.cancelUrl)}">Cancel and go back</a></p>`,
  );
}

/** The card issuer's extra step (as for a card that asks its holder to confirm a payment): confirm or refuse. */
export function extraStepPage(s: PageSession, attemptId: string): string {
  return page(
    'Confirm this payment',
    `<h1>Confirm this payment</h1>
<p>Your card issuer asks you to confirm this payment of <strong>${escape(s.amountText)}</strong>: ${escape(s.description)}.</p>
<form method="post" action="/pay/${escape(s.id)}/confirm">
  <input type="hidden" name="attempt" value="${escape(attemptId)}">
  <button type="submit" name="answer" value="confirm">Confirm the payment</button>
  <button type="submit" name="answer" value="refuse" class="plain">Do not confirm</button>
</form>`,
  );
}

/** A page with a message and one way on (an expired, already paid or unknown session). */
export function noticePage(title: string, text: string, link?: { href: string; label: string }): string {
  return page(title, `<h1>${escape(title)}</h1><p>${escape(text)}</p>${link ? `<p><a href="${escape(link.href)}">${escape(link.label)}</a></p>` : ''}`);
}
