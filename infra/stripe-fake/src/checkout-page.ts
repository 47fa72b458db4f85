import express, { Router } from 'express';
import { checkoutComplete } from './checkout-complete.js';
import type { FakeLineItem, FakeState, WireObject } from './fake-objects.js';
import type { WebhookSender } from './webhook-delivery.js';

/** Test card numbers the hosted page accepts (digits only). */
export const TEST_CARDS = { success: '4242424242424242', declined: '4000000000000002' } as const;

function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function money(minor: number, currency: string): string {
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(minor / 100);
}

function page(title: string, body: string): string {
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>${escapeHtml(title)}</title>
<meta name="viewport" content="width=device-width, initial-scale=1">
<style>
body{font-family:system-ui,sans-serif;background:#f4f3ef;color:#1d2327;margin:0;padding:3rem 1rem}
main{max-width:28rem;margin:0 auto;background:#fff;border:1px solid #d9d6cc;border-radius:10px;padding:1.75rem}
h1{font-size:1.15rem;margin:0 0 .25rem} .note{font-size:.85rem;color:#5b6266}
table{width:100%;border-collapse:collapse;margin:1rem 0;font-variant-numeric:tabular-nums}
td{padding:.3rem 0;border-bottom:1px solid #ece9e1} td.n{text-align:right}
label{display:block;font-weight:600;margin-top:1rem} input{width:100%;box-sizing:border-box;font:inherit;padding:.55rem;border:1px solid #b9b5a8;border-radius:6px}
button{margin-top:1rem;width:100%;padding:.65rem;border:0;border-radius:6px;background:#1f6f5c;color:#fff;font:inherit;font-weight:600;cursor:pointer}
.error{background:#fdecea;border:1px solid #e3a39c;color:#8a1c12;padding:.6rem;border-radius:6px;margin-top:1rem}
.banner{background:#fff6d6;border:1px solid #e6d48a;padding:.5rem;border-radius:6px;font-size:.8rem;margin-bottom:1rem}
</style></head><body><main>
<div class="banner">Local payment stand-in — no real money moves. Test cards: 4242 4242 4242 4242 is paid; 4000 0000 0000 0002 is declined.</div>
${body}</main></body></html>`;
}

function checkoutHtml(session: WireObject, lines: FakeLineItem[], error: string | null, cardValue: string): string {
  const currency = String(session.currency);
  const rows = lines
    .map((l) => `<tr><td>${escapeHtml(l.name)}${l.quantity > 1 ? ` × ${l.quantity}` : ''}${l.interval ? ` <span class="note">per ${escapeHtml(l.interval)}</span>` : ''}</td><td class="n">${money(l.unitAmount * l.quantity, currency)}</td></tr>`)
    .join('');
  const cancel = session.cancel_url ? `<p class="note"><a href="${escapeHtml(String(session.cancel_url))}">Cancel and go back</a></p>` : '';
  return page(
    'Pay — local stand-in',
    `<h1>${session.mode === 'subscription' ? 'Start subscription' : 'Pay once'}</h1>
<table>${rows}<tr><td><strong>Total due today</strong></td><td class="n"><strong id="amount">${money(Number(session.amount_total), currency)}</strong></td></tr></table>
<form method="post" action="/checkout/${escapeHtml(String(session.id))}">
<label for="card_number">Card number</label>
<input id="card_number" name="card_number" inputmode="numeric" autocomplete="off" value="${escapeHtml(cardValue)}" placeholder="4242 4242 4242 4242" required>
${error ? `<p class="error" role="alert">${escapeHtml(error)}</p>` : ''}
<button type="submit">Pay ${money(Number(session.amount_total), currency)}</button>
</form>${cancel}`,
  );
}

/**
 * The hosted test checkout page: `GET /checkout/:id` shows amount, lines and a card field;
 * `POST /checkout/:id` with the good test card completes the session, delivers the signed events
 * and redirects (303) to `success_url`; the declined card re-renders the page with the reason.
 * @param state - fake state
 * @param sender - webhook sender
 * @returns the router, mounted at `/checkout`
 * @example
 * app.use('/checkout', checkoutPageRoutes(state, sender));
 */
export function checkoutPageRoutes(state: FakeState, sender: WebhookSender): Router {
  const router = Router();
  router.use(express.urlencoded({ extended: false, limit: '16kb' }));

  router.get('/:id', (req, res) => {
    const session = state.sessions.get(req.params.id);
    if (!session) {
      res.status(404).type('html').send(page('Not found', '<h1>This checkout link is unknown</h1><p>Start the purchase again from Demandscape.</p>'));
      return;
    }
    if (session.status === 'complete') {
      res.type('html').send(page('Already paid', `<h1>Already paid</h1><p><a href="${escapeHtml(successUrl(session))}">Return to Demandscape</a></p>`));
      return;
    }
    res.type('html').send(checkoutHtml(session, state.sessionLines.get(req.params.id)!, null, ''));
  });

  router.post('/:id', async (req, res) => {
    const session = state.sessions.get(req.params.id);
    if (!session) {
      res.status(404).type('html').send(page('Not found', '<h1>This checkout link is unknown</h1>'));
      return;
    }
    if (session.status === 'complete') {
      res.redirect(303, successUrl(session));
      return;
    }
    const lines = state.sessionLines.get(req.params.id)!;
    const raw = String((req.body as Record<string, unknown>).card_number ?? '');
    const digits = raw.replace(/[\s-]/g, '');
    if (digits === TEST_CARDS.declined) {
      res.status(402).type('html').send(checkoutHtml(session, lines, 'Your card was declined. Nothing was charged — try another card.', raw));
      return;
    }
    if (digits !== TEST_CARDS.success) {
      res
        .status(400)
        .type('html')
        .send(checkoutHtml(session, lines, 'This stand-in only knows its test cards: 4242 4242 4242 4242 (paid) and 4000 0000 0000 0002 (declined).', raw));
      return;
    }
    await checkoutComplete(state, sender, session);
    res.redirect(303, successUrl(session));
  });
  return router;
}

function successUrl(session: WireObject): string {
  return String(session.success_url).replaceAll('{CHECKOUT_SESSION_ID}', String(session.id));
}
