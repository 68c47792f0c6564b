/** The hosted payment step the fake plays: a card form for one checkout session. */

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export interface PageSession {
  id: string;
  description: string;
  amountTotal: number;
  currency: string;
  cancelUrl: string | null;
}

function money(amountMinor: number, currency: string): string {
  try {
    return new Intl.NumberFormat("en", { style: "currency", currency: currency.toUpperCase() }).format(amountMinor / 100);
  } catch {
    return `${(amountMinor / 100).toFixed(2)} ${currency.toUpperCase()}`;
  }
}

/** The card form; `message` shows a decline or a typing mistake above it. */
export function paymentPage(session: PageSession, message?: string): string {
  const cancel = session.cancelUrl ? `<p><a href="${escape(session.cancelUrl)}">Go back without paying</a></p>` : "";
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><link rel="icon" href="data:,"><title>Test payment</title>
<meta name="viewport" content="width=device-width, initial-scale=1">
<style>
body{font-family:system-ui,sans-serif;background:#f4f4f6;color:#222;margin:0;display:flex;justify-content:center}
main{background:#fff;margin:48px 16px;padding:24px 28px;border-radius:8px;max-width:420px;width:100%;box-shadow:0 1px 3px #0002}
label{display:block;margin:14px 0 4px;font-size:14px}input{width:100%;box-sizing:border-box;padding:10px;font-size:16px;border:1px solid #bbb;border-radius:4px}
button{margin-top:18px;width:100%;padding:12px;font-size:16px;background:#333;color:#fff;border:0;border-radius:4px;cursor:pointer}
.note{font-size:13px;color:#555}.error{background:#fde8e6;color:#8a1c0c;padding:10px;border-radius:4px}
</style></head><body><main>
<p class="note">Local payments fake — no real money moves.</p>
<h1 style="font-size:20px">${escape(session.description)}</h1>
<p style="font-size:24px;margin:4px 0 12px" data-testid="amount">${escape(money(session.amountTotal, session.currency))}</p>
${message ? `<p class="error" role="alert">${escape(message)}</p>` : ""}
<form method="post" action="/pay/${escape(session.id)}">
<label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="off" placeholder="4242 4242 4242 4242" required>
<label for="expiry">Expiry (MM / YY)</label><input id="expiry" name="expiry" placeholder="12 / 34" required>
<label for="cvc">CVC</label><input id="cvc" name="cvc" inputmode="numeric" placeholder="123" required>
<button type="submit">Pay ${escape(money(session.amountTotal, session.currency))}</button>
</form>
<p class="note">Test cards: 4242 4242 4242 4242 succeeds; 4000 0000 0000 0002 is declined.</p>
${cancel}
</main></body></html>`;
}

export function donePage(title: string, text: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><link rel="icon" href="data:,"><title>${escape(title)}</title></head>
<body style="font-family:system-ui,sans-serif"><main style="max-width:420px;margin:48px auto"><h1>${escape(title)}</h1><p>${escape(text)}</p></main></body></html>`;
}
