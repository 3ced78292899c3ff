// The hosted payment page: plain server-rendered HTML of our own design, no scripts and no
// outside assets, readable at 390 px wide. Every control has a visible label; messages that
// appear after a submit are in a role="alert" region so screen readers announce them.

export const testCards = {
  succeeds: '4242 4242 4242 4242',
  declined: '4000 0000 0000 0002',
  secondStep: '4000 0025 0000 3155',
} as const;

const escapes: Record<string, string> = {
  '&': '&amp;',
  '<': '&lt;',
  '>': '&gt;',
  '"': '&quot;',
  "'": '&#39;',
};

export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => escapes[c] ?? c);
}

/** Integer cents in the session's currency, as a reader expects it ("$123.45"). */
export function formatAmount(cents: number, currency: string): string {
  const code = currency.toUpperCase();
  const digits =
    new Intl.NumberFormat('en-US', { style: 'currency', currency: code }).resolvedOptions()
      .maximumFractionDigits ?? 2;
  const whole = BigInt(cents);
  const text =
    digits === 0 ? whole.toString() : `${whole / 100n}.${String(whole % 100n).padStart(2, '0')}`;
  // The decimal string goes to Intl as a string, so no float rounding is involved.
  return new Intl.NumberFormat('en-US', { style: 'currency', currency: code }).format(
    text as unknown as number, // Intl accepts numeric strings exactly (ES2023); the type says number.
  );
}

const styles = `
*{box-sizing:border-box}
body{margin:0;font:16px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;color:#1b2421;background:#eef2ef}
main{max-width:28rem;margin:0 auto;padding:1.25rem 1rem 3rem}
.card{background:#fff;border:1px solid #cdd6d1;border-radius:10px;padding:1.25rem}
.tag{display:inline-block;font-size:.8rem;font-weight:600;letter-spacing:.04em;text-transform:uppercase;color:#5b3b00;background:#ffe9b8;border-radius:4px;padding:.1rem .5rem}
h1{font-size:1.35rem;margin:.6rem 0 .25rem}
.amount{font-size:2rem;font-weight:700;margin:.25rem 0 1rem}
.muted{color:#4a5a53;font-size:.95rem}
label{display:block;font-weight:600;margin:.9rem 0 .3rem}
input{width:100%;font:inherit;padding:.65rem .7rem;border:1px solid #7d8c85;border-radius:6px;background:#fff;color:inherit}
input:focus-visible,button:focus-visible,a:focus-visible{outline:3px solid #1d5fd0;outline-offset:2px}
.row{display:flex;gap:.75rem}.row>div{flex:1}
button{display:block;width:100%;font:inherit;font-weight:700;margin-top:1.25rem;padding:.8rem;border-radius:6px;border:0;background:#1e6b45;color:#fff;cursor:pointer}
button.secondary{background:#fff;color:#1b2421;border:1px solid #7d8c85}
button.danger{background:#9b1c1c}
.alert{border-radius:6px;padding:.75rem;margin:1rem 0;border:1px solid #b42318;background:#fdecea;color:#7a1010}
.ok{border-color:#1e6b45;background:#e6f4ec;color:#14472e}
.cards{margin:1.5rem 0 0;padding:0;list-style:none;font-size:.9rem}
.cards li{padding:.35rem 0;border-top:1px solid #e1e7e3}
code{font-family:ui-monospace,Menlo,Consolas,monospace;white-space:nowrap}
a{color:#175cbf}
`;

export interface PageParts {
  title: string;
  body: string;
}

export function layout({ title, body }: PageParts): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)} · Local test payments</title>
<style>${styles}</style>
</head>
<body>
<main>
<div class="card">
<span class="tag">Test mode · no real money</span>
${body}
</div>
</main>
</body>
</html>`;
}

export interface PayFormView {
  sessionId: string;
  description: string;
  amountText: string;
  customerEmail: string | null;
  message: { kind: 'error' | 'ok'; text: string } | null;
  cardNumber: string;
  hasCancel: boolean;
}

export function payFormPage(view: PayFormView): string {
  const alert = view.message
    ? `<div class="alert${view.message.kind === 'ok' ? ' ok' : ''}" role="alert">${escapeHtml(view.message.text)}</div>`
    : '<div role="alert"></div>';
  const email = view.customerEmail
    ? `<p class="muted">Receipt to ${escapeHtml(view.customerEmail)}</p>`
    : '';
  const back = view.hasCancel
    ? `<form method="get" action="/pay/${view.sessionId}/cancel"><button type="submit" class="secondary">Go back without paying</button></form>`
    : '';
  return layout({
    title: `Pay ${view.amountText}`,
    body: `<h1>${escapeHtml(view.description)}</h1>
<p class="amount">${escapeHtml(view.amountText)}</p>
${email}
${alert}
<form method="post" action="/pay/${view.sessionId}" novalidate>
<label for="card-number">Card number</label>
<input id="card-number" name="cardNumber" inputmode="numeric" autocomplete="cc-number" value="${escapeHtml(view.cardNumber)}" aria-describedby="card-hint" required>
<p id="card-hint" class="muted">Use one of the test cards listed below.</p>
<div class="row">
<div><label for="card-expiry">Expiry (MM/YY)</label>
<input id="card-expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" placeholder="12/30"></div>
<div><label for="card-cvc">Security code</label>
<input id="card-cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="123"></div>
</div>
<label for="card-name">Name on card</label>
<input id="card-name" name="name" autocomplete="cc-name">
<button type="submit">Pay ${escapeHtml(view.amountText)}</button>
</form>
${back}
<h2 class="muted" style="font-size:1rem;margin-top:1.5rem">Test cards</h2>
<ul class="cards">
<li><code>${testCards.succeeds}</code> — payment goes through</li>
<li><code>${testCards.declined}</code> — the card is declined</li>
<li><code>${testCards.secondStep}</code> — asks you to approve the payment first</li>
</ul>
<p class="muted">Any expiry and security code are accepted.</p>`,
  });
}

export function approvePage(sessionId: string, description: string, amountText: string): string {
  return layout({
    title: 'Approve this test payment',
    body: `<h1>Approve this test payment</h1>
<p>Your card asks for one more step before paying <strong>${escapeHtml(amountText)}</strong> for ${escapeHtml(description)}.</p>
<p class="muted">A real bank would show its own check here. Choose what the bank should answer.</p>
<form method="post" action="/pay/${sessionId}/confirm">
<button type="submit" name="decision" value="approve">Approve</button>
<button type="submit" name="decision" value="fail" class="danger">Fail</button>
</form>`,
  });
}

export function messagePage(
  title: string,
  text: string,
  link?: { href: string; label: string },
): string {
  const action = link
    ? `<p><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></p>`
    : '';
  return layout({
    title,
    body: `<h1>${escapeHtml(title)}</h1><p>${escapeHtml(text)}</p>${action}`,
  });
}
