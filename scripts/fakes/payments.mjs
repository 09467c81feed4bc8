// A local fake card-payment server for development and tests, on loopback only. It speaks the part
// of Stripe's API that Keybed's SDK calls make (create and read a Checkout Session), shows a plain
// pay page, and sends back a signed `checkout.session.completed` event the way the real service
// does (Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "t.body" with the webhook secret>).
// Plain Node with no dependencies, so scripts can start it before `npm ci`:
//   node scripts/fakes/payments.mjs --port 12111 --webhook-url http://127.0.0.1:3000/api/webhooks/payments --webhook-secret whsec_local
import crypto from 'node:crypto';
import http from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/** `a[b][0][c]=1` form fields (as the SDK sends them) into nested objects and arrays. */
function parseForm(text) {
  const root = {};
  for (const [key, value] of new URLSearchParams(text)) {
    const parts = key.replace(/\]/g, '').split('[');
    let node = root;
    parts.forEach((part, i) => {
      const isLast = i === parts.length - 1;
      const nextIsIndex = /^\d+$/.test(parts[i + 1] ?? '');
      if (isLast) node[part] = value;
      else node = node[part] ??= nextIsIndex ? [] : {};
    });
  }
  return root;
}

const id = (prefix) => `${prefix}_${crypto.randomBytes(12).toString('hex')}`;
const escape = (s) => String(s).replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

export function signature(payload, secret, timestamp = Math.floor(Date.now() / 1000)) {
  const v1 = crypto.createHmac('sha256', secret).update(`${timestamp}.${payload}`).digest('hex');
  return `t=${timestamp},v1=${v1}`;
}

/**
 * Starts the fake on 127.0.0.1. `apiKey`, when given, must be the Bearer key of every API call.
 * Answers { url, host, port, sessions, events, stop }.
 */
export async function startFakePayments({ port = 0, webhookUrl, webhookSecret, apiKey } = {}) {
  const sessions = new Map();
  const byIdempotencyKey = new Map();
  const events = [];
  let base = '';

  async function deliver(event) {
    const payload = JSON.stringify(event.body);
    const header = signature(payload, webhookSecret);
    event.deliveries.push(header);
    if (!webhookUrl) return { status: 0 };
    try {
      const res = await fetch(webhookUrl, { method: 'POST', headers: { 'content-type': 'application/json', 'stripe-signature': header }, body: payload });
      event.lastStatus = res.status;
      return { status: res.status };
    } catch {
      event.lastStatus = 0;
      return { status: 0 };
    }
  }

  function createSession(form) {
    const item = form.line_items?.[0];
    const unitAmount = Number(item?.price_data?.unit_amount);
    const quantity = Number(item?.quantity ?? 1);
    if (form.mode !== 'payment' || !Number.isInteger(unitAmount) || unitAmount <= 0 || !item?.price_data?.currency || !form.success_url) {
      return { status: 400, body: { error: { type: 'invalid_request_error', message: 'mode=payment, one line item with price_data and a success_url are required' } } };
    }
    const sessionId = id('cs_test');
    const session = {
      id: sessionId,
      object: 'checkout.session',
      mode: 'payment',
      status: 'open',
      payment_status: 'unpaid',
      amount_total: unitAmount * quantity,
      amount_subtotal: unitAmount * quantity,
      currency: item.price_data.currency.toLowerCase(),
      client_reference_id: form.client_reference_id ?? null,
      customer_email: form.customer_email ?? null,
      metadata: form.metadata ?? {},
      success_url: form.success_url,
      cancel_url: form.cancel_url ?? null,
      payment_intent: null,
      description: item.price_data.product_data?.name ?? '',
      url: `${base}/pay/${sessionId}`,
      created: Math.floor(Date.now() / 1000),
      livemode: false,
    };
    sessions.set(sessionId, session);
    return { status: 200, body: session };
  }

  async function pay(session) {
    if (session.status !== 'open') return;
    session.status = 'complete';
    session.payment_status = 'paid';
    session.payment_intent = id('pi_test');
    const event = {
      id: id('evt_test'),
      deliveries: [],
      lastStatus: null,
      body: { id: '', object: 'event', type: 'checkout.session.completed', created: Math.floor(Date.now() / 1000), livemode: false, pending_webhooks: 1, data: { object: { ...session } } },
    };
    event.body.id = event.id;
    events.push(event);
    await deliver(event);
  }

  function payPage(session) {
    const amount = new Intl.NumberFormat('en-GB', { style: 'currency', currency: session.currency.toUpperCase() }).format(session.amount_total / 100);
    const done = session.status !== 'open';
    return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width"><title>Test card payment</title>
<style>body{font:16px/1.5 system-ui,sans-serif;max-width:28rem;margin:3rem auto;padding:0 1rem;color:#1f2328}label{display:block;margin-top:1rem}input{font:inherit;padding:.4rem;width:100%}button{font:inherit;margin-top:1.5rem;padding:.6rem 1.2rem}</style></head>
<body><main><h1>Test card payment</h1><p>This is the local payment test page; no real money moves.</p>
<p><strong>${escape(session.description)}</strong><br>Amount: <strong>${escape(amount)}</strong></p>
${done ? '<p role="status">Paid.</p>' : `<form method="post" action="/pay/${escape(session.id)}"><label for="card">Card number</label><input id="card" name="card" value="4242 4242 4242 4242" autocomplete="off"><button type="submit">Pay ${escape(amount)}</button></form>`}
${session.cancel_url && !done ? `<p><a href="${escape(session.cancel_url)}">Cancel and go back</a></p>` : ''}</main></body></html>`;
  }

  const readBody = (req) =>
    new Promise((resolve, reject) => {
      let text = '';
      req.setEncoding('utf8');
      req.on('data', (c) => (text += c));
      req.on('end', () => resolve(text));
      req.on('error', reject);
    });

  const json = (res, status, body) => {
    res.writeHead(status, { 'content-type': 'application/json' });
    res.end(JSON.stringify(body));
  };

  const server = http.createServer(async (req, res) => {
    try {
      const url = new URL(req.url ?? '/', base);
      const parts = url.pathname.split('/').filter(Boolean);
      if (parts[0] === 'v1') {
        if (apiKey && req.headers.authorization !== `Bearer ${apiKey}`) return json(res, 401, { error: { type: 'invalid_request_error', message: 'Invalid API key' } });
        if (req.method === 'POST' && url.pathname === '/v1/checkout/sessions') {
          const key = req.headers['idempotency-key'];
          const form = parseForm(await readBody(req));
          if (key && byIdempotencyKey.has(key)) return json(res, 200, sessions.get(byIdempotencyKey.get(key)));
          const result = createSession(form);
          if (key && result.status === 200) byIdempotencyKey.set(key, result.body.id);
          return json(res, result.status, result.body);
        }
        if (req.method === 'GET' && parts[1] === 'checkout' && parts[2] === 'sessions' && parts[3]) {
          const session = sessions.get(parts[3]);
          return session ? json(res, 200, session) : json(res, 404, { error: { type: 'invalid_request_error', message: 'No such checkout session' } });
        }
        return json(res, 404, { error: { type: 'invalid_request_error', message: 'Unrecognised request URL' } });
      }
      if (parts[0] === 'pay' && parts[1]) {
        const session = sessions.get(parts[1]);
        if (!session) return json(res, 404, { error: 'No such checkout session' });
        if (req.method === 'POST') {
          await readBody(req);
          await pay(session);
          res.writeHead(303, { location: session.success_url.replace('{CHECKOUT_SESSION_ID}', session.id) });
          return res.end();
        }
        res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
        return res.end(payPage(session));
      }
      // Test controls: the events sent, and sending one again (same id, fresh signature) as a replay.
      if (parts[0] === '__events' && req.method === 'GET') return json(res, 200, events.map((e) => ({ id: e.id, type: e.body.type, lastStatus: e.lastStatus, deliveries: e.deliveries.length })));
      if (parts[0] === '__events' && parts[2] === 'resend' && req.method === 'POST') {
        const event = events.find((e) => e.id === parts[1]);
        if (!event) return json(res, 404, { error: 'No such event' });
        return json(res, 200, await deliver(event));
      }
      if (parts[0] === '__health') return json(res, 200, { ok: true });
      json(res, 404, { error: 'Not found' });
    } catch (err) {
      json(res, 500, { error: { type: 'api_error', message: err instanceof Error ? err.message : 'error' } });
    }
  });

  await new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', resolve);
  });
  const actual = server.address().port;
  base = `http://127.0.0.1:${actual}`;
  return {
    url: base,
    host: '127.0.0.1',
    port: actual,
    sessions,
    events,
    /** Where events go; tests point it at the app once they know its address. */
    setWebhookUrl: (url) => (webhookUrl = url),
    stop: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

if (process.argv[1] && fileURLToPath(import.meta.url) === path.resolve(process.argv[1])) {
  const arg = (name, fallback) => {
    const i = process.argv.indexOf(`--${name}`);
    return i > 0 ? process.argv[i + 1] : fallback;
  };
  const fake = await startFakePayments({
    port: Number(arg('port', '12111')),
    webhookUrl: arg('webhook-url', 'http://127.0.0.1:3000/api/webhooks/payments'),
    webhookSecret: arg('webhook-secret', 'whsec_keybed_local'),
    apiKey: arg('api-key', undefined),
  });
  console.log(`[keybed] fake payments on ${fake.url}`);
  const stop = () => fake.stop().then(() => process.exit(0));
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}
