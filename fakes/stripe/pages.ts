import { getPrice } from './catalogue';
import { getSession } from './checkout';
import { day, esc, money, page } from './html';
import type { Obj, Store } from './store';

/** The hosted checkout page: what is bought, then a test card form. */
export function checkoutPage(
  store: Store,
  id: string,
  error?: string,
  values: Record<string, string> = {},
): string {
  const session = getSession(store, id);
  if (session.status !== 'open') {
    return page(
      'Checkout',
      `<h1>This checkout is closed</h1><section>It was already completed or has expired.</section>`,
    );
  }
  const price = getPrice(store, session._line.price);
  const product = store.state.products[price.product];
  const qty = session._line.quantity;
  const trial = session._subscription_data.trial_days;
  const email =
    values.email ?? session.customer_email ?? store.state.customers[session.customer]?.email ?? '';
  const v = (k: string): string => esc(values[k] ?? '');
  return page(
    'Checkout',
    `<h1>${esc(product?.name)}</h1>
<section><table>
<tr><td>Seats</td><td data-testid="seats">${qty}</td></tr>
<tr><td>Per seat</td><td>${money(price.unit_amount, price.currency)} / ${esc(price.recurring.interval)}</td></tr>
<tr><td>Total per ${esc(price.recurring.interval)}</td><td>${money(price.unit_amount * qty, price.currency)}</td></tr>
${trial > 0 ? `<tr><td>Due today</td><td>${money(0, price.currency)} (${trial}-day trial)</td></tr>` : ''}
</table></section>
<form method="post" action="/pay/${esc(id)}"><section>
${error ? `<p class="error" role="alert">${esc(error)}</p>` : ''}
<label for="email">E-mail</label><input id="email" name="email" type="email" autocomplete="email" value="${esc(email)}" required>
<label for="number">Card number</label><input id="number" name="number" inputmode="numeric" autocomplete="cc-number" placeholder="4242 4242 4242 4242" value="${v('number')}" required>
<div class="row"><div><label for="expiry">Expiry</label><input id="expiry" name="expiry" inputmode="numeric" autocomplete="cc-exp" placeholder="MM / YY" value="${v('expiry')}" required></div>
<div><label for="cvc">CVC</label><input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" placeholder="123" value="${v('cvc')}" required></div></div>
<label for="name">Name on card</label><input id="name" name="name" autocomplete="cc-name" value="${v('name')}">
<button type="submit">${trial > 0 ? 'Start trial' : 'Pay and subscribe'}</button>
</section></form>
${session.cancel_url ? `<p><a href="${esc(session.cancel_url)}">Back without subscribing</a></p>` : ''}`,
  );
}

function subscriptionPanel(store: Store, portalId: string, sub: Obj): string {
  const item = sub.items.data[0];
  const product = store.state.products[item.price.product];
  const live = sub.status !== 'canceled';
  const action = (what: string): string => `/portal/${esc(portalId)}/${what}`;
  const hidden = `<input type="hidden" name="subscription" value="${esc(sub.id)}">`;
  return `<section data-subscription="${esc(sub.id)}"><h2>${esc(product?.name)}</h2><table>
<tr><td>Status</td><td data-testid="status">${esc(sub.status)}${sub.cancel_at_period_end ? ' (ends ' + day(sub.cancel_at) + ')' : ''}</td></tr>
<tr><td>Seats</td><td data-testid="quantity">${item.quantity}</td></tr>
<tr><td>Current period ends</td><td>${day(item.current_period_end)}</td></tr></table>
${
  live
    ? `<form method="post" action="${action('seats')}">${hidden}<label for="quantity">Seats</label>
<input id="quantity" name="quantity" type="number" min="1" inputmode="numeric" value="${item.quantity}"><button type="submit">Update seats</button></form>`
    : ''
}
${
  live && !sub.cancel_at_period_end
    ? `<form method="post" action="${action('cancel')}">${hidden}<label for="when">Cancel</label>
<select id="when" name="when"><option value="period_end">At the end of the period</option><option value="now">Now</option></select>
<button type="submit" class="quiet">Cancel subscription</button></form>`
    : ''
}
${live && sub.cancel_at_period_end ? `<form method="post" action="${action('resume')}">${hidden}<button type="submit">Keep subscription</button></form>` : ''}
${
  ['past_due', 'unpaid'].includes(sub.status)
    ? `<form method="post" action="${action('card')}">${hidden}<h3>Pay with another card</h3>
<label for="number">Card number</label><input id="number" name="number" inputmode="numeric" autocomplete="cc-number" required>
<div class="row"><div><label for="expiry">Expiry</label><input id="expiry" name="expiry" placeholder="MM / YY" inputmode="numeric" required></div>
<div><label for="cvc">CVC</label><input id="cvc" name="cvc" inputmode="numeric" required></div></div><button type="submit">Pay now</button></form>`
    : ''
}
</section>`;
}

/** The hosted portal: the customer's subscriptions with seats, cancel and resume, then invoices. */
export function portalPage(store: Store, id: string, error?: string): string {
  const session = store.state.portalSessions[id];
  if (!session) return page('Portal', '<h1>This portal link is not valid</h1>');
  const subs = Object.values(store.state.subscriptions)
    .filter((s) => s.customer === session.customer)
    .sort(
      (a, b) =>
        Number(a.status === 'canceled') - Number(b.status === 'canceled') || b.created - a.created,
    );
  const invoices = Object.values(store.state.invoices)
    .filter((i) => i.customer === session.customer)
    .reverse();
  const rows = invoices
    .map(
      (i) =>
        `<tr><td>${esc(i.number)}</td><td>${day(i.created)}</td><td>${money(i.amount_due, i.currency)}</td><td>${esc(i.status)}</td></tr>`,
    )
    .join('');
  return page(
    'Billing portal',
    `<h1>Your subscription</h1>${error ? `<p class="error" role="alert">${esc(error)}</p>` : ''}
${subs.map((s) => subscriptionPanel(store, id, s)).join('') || '<section>No subscriptions.</section>'}
<section><h2>Invoices</h2><table>${rows || '<tr><td>None yet</td></tr>'}</table></section>
${session.return_url ? `<p><a href="${esc(session.return_url)}">Return to the app</a></p>` : ''}`,
  );
}

export function invoicePage(store: Store, id: string): string {
  const i = store.state.invoices[id];
  if (!i) return page('Invoice', '<h1>No such invoice</h1>');
  return page(
    'Invoice',
    `<h1>Invoice ${esc(i.number)}</h1><section><table>
<tr><td>Date</td><td>${day(i.created)}</td></tr><tr><td>Period</td><td>${day(i.period_start)} – ${day(i.period_end)}</td></tr>
<tr><td>Amount</td><td>${money(i.amount_due, i.currency)}</td></tr><tr><td>Status</td><td>${esc(i.status)}</td></tr></table></section>`,
  );
}
