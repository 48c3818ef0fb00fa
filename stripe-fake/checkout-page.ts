import Handlebars from 'handlebars';

// The hosted checkout page: phone first, plain, and clearly a local stand-in for the real provider.
export const checkoutPage = Handlebars.compile(`<!doctype html><html lang="en"><head><meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1"><title>Pay a deposit</title><style>
*{box-sizing:border-box}body{margin:0;font-family:system-ui,-apple-system,sans-serif;background:#eef1f4;color:#14181f}
main{max-width:440px;margin:0 auto;padding:20px 16px 40px}.card{background:#fff;border-radius:14px;padding:18px;box-shadow:0 1px 3px rgba(0,0,0,.12)}
.fake{font-size:.85rem;background:#fff4d6;border:1px solid #e2c46a;border-radius:8px;padding:8px 10px;margin-bottom:14px}
h1{font-size:1.25rem;margin:0 0 4px}.amount{font-size:2rem;font-weight:700;margin:6px 0 16px}label{display:block;font-weight:600;margin:12px 0 6px}
input{width:100%;font-size:1.1rem;padding:12px;border:1px solid #9aa3ad;border-radius:10px}input:focus{outline:3px solid #2d5bd3;outline-offset:1px}
.row{display:flex;gap:10px}.row>div{flex:1}button{width:100%;margin-top:18px;font-size:1.1rem;font-weight:700;padding:14px;border:0;border-radius:10px;background:#1f4fc0;color:#fff}
.error{background:#fde8e8;border:1px solid #d46a6a;border-radius:8px;padding:10px;margin:12px 0}.cancel{display:block;text-align:center;margin-top:16px;color:#1f4fc0}
.done{text-align:center}</style></head><body><main>
<p class="fake">Local payment stand-in for development and tests. No real card is charged. Test cards: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined.</p>
<div class="card">
{{#if closed}}<div class="done"><h1>This checkout is {{status}}</h1><p>Nothing more to pay here.</p></div>{{else}}
<h1>{{description}}</h1><div class="amount" data-testid="checkout-amount">{{amount}}</div>
{{#if error}}<div class="error" role="alert" data-testid="checkout-error">{{error}}</div>{{/if}}
<form method="post" action="/checkout/{{id}}/pay">
<label for="card">Card number</label><input id="card" name="card" inputmode="numeric" autocomplete="cc-number" required data-testid="checkout-card" value="{{card}}">
<div class="row"><div><label for="exp">Expiry (MM/YY)</label><input id="exp" name="exp" inputmode="numeric" autocomplete="cc-exp" required placeholder="12/30" data-testid="checkout-exp"></div>
<div><label for="cvc">CVC</label><input id="cvc" name="cvc" inputmode="numeric" autocomplete="cc-csc" required data-testid="checkout-cvc"></div></div>
<label for="name">Name on card</label><input id="name" name="name" autocomplete="cc-name" data-testid="checkout-name">
<button type="submit" data-testid="checkout-pay">Pay {{amount}}</button></form>
<a class="cancel" href="/checkout/{{id}}/cancel" data-testid="checkout-cancel">Cancel and go back</a>{{/if}}
</div></main></body></html>`);

export const paymentsPage = Handlebars.compile(`<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Payment stand-in: payments</title><style>body{font-family:system-ui,sans-serif;margin:0;background:#eef1f4}main{max-width:960px;margin:0 auto;padding:16px}
table{width:100%;border-collapse:collapse;background:#fff}th,td{text-align:left;padding:8px;border-bottom:1px solid #dde2e8;font-size:.92rem}</style></head>
<body><main><h1>Payments (local stand-in)</h1><table><thead><tr><th>Checkout</th><th>Status</th><th>Amount</th><th>Payment</th><th>Refunded</th><th>Created</th></tr></thead><tbody>
{{#each sessions}}<tr><td>{{id}}</td><td>{{status}} / {{payment_status}}</td><td>{{amount}}</td><td>{{payment_intent}}</td><td>{{refunded}}</td><td>{{created}}</td></tr>{{/each}}
</tbody></table><h2>Webhook deliveries</h2><table><thead><tr><th>Event</th><th>Type</th><th>Attempts</th><th>Last answer</th></tr></thead><tbody>
{{#each deliveries}}<tr><td>{{eventId}}</td><td>{{type}}</td><td>{{attempts}}</td><td>{{lastStatus}}</td></tr>{{/each}}</tbody></table></main></body></html>`);
