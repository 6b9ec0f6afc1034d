// A local stand-in for the card-payment service, for development and tests: it answers the few
// calls the app makes through the `stripe` SDK (create and read a Checkout Session), serves a page
// to pay or cancel, and on payment posts a signed `checkout.session.completed` event to the app's
// webhook, signed as the Stripe API reference describes webhook signatures: header
// `Stripe-Signature: t=<unix seconds>,v1=<hex HMAC-SHA256 of "<t>.<body>" under the endpoint secret>`.
// Object shapes follow the Stripe API reference for Checkout Sessions and Events (only the fields
// the app reads, plus a few for realism). In memory only; Node built-ins only.
import { createHmac, randomBytes } from "node:crypto";
import http from "node:http";

const port = Number(process.env.PAYMENT_SERVICE_PORT ?? 2527);
const secretKey = process.env.STRIPE_SECRET_KEY ?? "";
const webhookSecret = process.env.STRIPE_WEBHOOK_SECRET ?? "";
const webhookUrl = process.env.PAYMENT_WEBHOOK_URL ?? "";
const MAX_SESSIONS = 1000;
const MAX_BODY = 64 * 1024;
const sessions = new Map();

const id = (prefix) => `${prefix}_test_${randomBytes(12).toString("hex")}`;
const now = () => Math.floor(Date.now() / 1000);

function send(res, status, body, headers = {}) {
  res.writeHead(status, { "content-type": "application/json", ...headers });
  res.end(JSON.stringify(body));
}

function stripeError(res, status, message, type = "invalid_request_error") {
  send(res, status, { error: { type, message } });
}

function readBody(req) {
  return new Promise((resolve, reject) => {
    const chunks = [];
    let size = 0;
    req.on("data", (c) => {
      size += c.length;
      if (size > MAX_BODY) {
        reject(new Error("body too large"));
        req.destroy();
      } else chunks.push(c);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

/** Form fields with bracket keys (`a[b][0][c]=v`), as the SDK encodes them, into nested objects and arrays. */
export function parseForm(text) {
  const out = {};
  for (const [rawKey, value] of new URLSearchParams(text)) {
    const keys = rawKey.split(/\[|\]\[|\]/).filter((k) => k !== "");
    let node = out;
    keys.forEach((k, i) => {
      const last = i === keys.length - 1;
      const nextIsIndex = !last && /^\d+$/.test(keys[i + 1]);
      if (last) node[k] = value;
      else node = node[k] ??= nextIsIndex ? [] : {};
    });
  }
  return out;
}

function createSession(form) {
  const item = form.line_items?.[0];
  const price = item?.price_data;
  const amount = Number(price?.unit_amount) * Number(item?.quantity ?? 1);
  if (!price || !Number.isInteger(amount) || amount <= 0)
    return { error: "line_items[0][price_data][unit_amount] must be a positive whole number." };
  if (!form.success_url || !form.cancel_url) return { error: "success_url and cancel_url are required." };
  const sessionId = id("cs");
  const session = {
    id: sessionId,
    object: "checkout.session",
    mode: form.mode ?? "payment",
    amount_total: amount,
    currency: String(price.currency).toLowerCase(),
    client_reference_id: form.client_reference_id ?? null,
    customer_email: form.customer_email ?? null,
    metadata: form.metadata ?? {},
    description: price.product_data?.name ?? "",
    success_url: form.success_url,
    cancel_url: form.cancel_url,
    status: "open",
    payment_status: "unpaid",
    created: now(),
    expires_at: now() + 24 * 3600,
    livemode: false,
    url: `http://127.0.0.1:${port}/pay/${sessionId}`,
  };
  sessions.set(sessionId, session);
  if (sessions.size > MAX_SESSIONS) sessions.delete(sessions.keys().next().value);
  return { session };
}

export function signature(payload, secret, timestamp = now()) {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

async function deliver(event) {
  const payload = JSON.stringify(event);
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const res = await fetch(webhookUrl, {
        method: "POST",
        headers: { "content-type": "application/json", "stripe-signature": signature(payload, webhookSecret) },
        body: payload,
      });
      return res.status;
    } catch {
      await new Promise((r) => setTimeout(r, 300 * (attempt + 1)));
    }
  }
  return 0;
}

const escape = (s) =>
  String(s).replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]);

function payPage(s) {
  const amount = new Intl.NumberFormat("en-GB", { style: "currency", currency: s.currency.toUpperCase() }).format(
    s.amount_total / (s.currency === "jpy" ? 1 : 100),
  );
  const done = s.status !== "open";
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Local test payment</title>
<style>body{font-family:system-ui,sans-serif;background:#eef1f4;color:#222;margin:0;padding:24px}main{max-width:420px;margin:auto;background:#fff;border:1px solid #ccd;border-radius:6px;padding:20px}
.tag{display:inline-block;background:#fff3bf;border:1px solid #e0c060;padding:2px 6px;font-size:12px;border-radius:3px}button{font-size:16px;padding:8px 16px;margin-right:8px;border-radius:4px;border:1px solid #556;cursor:pointer}
.pay{background:#2b5f2b;color:#fff;border-color:#2b5f2b}</style></head><body><main>
<p class="tag">Local test payment service: no real money moves</p><h1>${escape(amount)}</h1><p>${escape(s.description)}</p>
${done ? `<p>This payment is ${escape(s.status)}.</p>` : `<form method="post" action="/pay/${s.id}/pay" style="display:inline"><button class="pay" type="submit">Pay ${escape(amount)}</button></form><form method="post" action="/pay/${s.id}/cancel" style="display:inline"><button type="submit">Cancel</button></form>`}
</main></body></html>`;
}

const server = http.createServer(async (req, res) => {
  const url = new URL(req.url ?? "/", `http://127.0.0.1:${port}`);
  try {
    if (url.pathname.startsWith("/v1/")) {
      if (!secretKey || req.headers.authorization !== `Bearer ${secretKey}`)
        return stripeError(res, 401, "Invalid API Key provided.", "authentication_error");
      if (req.method === "POST" && url.pathname === "/v1/checkout/sessions") {
        const made = createSession(parseForm(await readBody(req)));
        return made.error ? stripeError(res, 400, made.error) : send(res, 200, made.session);
      }
      const m = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(url.pathname);
      if (req.method === "GET" && m) {
        const s = sessions.get(m[1]);
        return s ? send(res, 200, s) : stripeError(res, 404, `No such checkout.session: '${m[1]}'`);
      }
      return stripeError(res, 404, `Unrecognized request URL (${req.method}: ${url.pathname}).`);
    }
    const pay = /^\/pay\/([\w-]+)(?:\/(pay|cancel))?$/.exec(url.pathname);
    if (pay) {
      const s = sessions.get(pay[1]);
      if (!s) {
        res.writeHead(404, { "content-type": "text/plain; charset=utf-8" });
        return res.end("No such payment.");
      }
      if (req.method === "GET" && !pay[2]) {
        res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
        return res.end(payPage(s));
      }
      if (req.method === "POST" && pay[2] === "cancel") {
        res.writeHead(303, { location: s.cancel_url });
        return res.end();
      }
      if (req.method === "POST" && pay[2] === "pay") {
        if (s.status === "open") {
          s.status = "complete";
          s.payment_status = "paid";
          await deliver({
            id: id("evt"),
            object: "event",
            type: "checkout.session.completed",
            api_version: "2025-01-27",
            created: now(),
            livemode: false,
            data: { object: s },
          });
        }
        res.writeHead(303, { location: s.success_url.replace("{CHECKOUT_SESSION_ID}", s.id) });
        return res.end();
      }
    }
    if (url.pathname === "/sessions" && req.method === "GET") return send(res, 200, [...sessions.values()]);
    if (url.pathname === "/sessions" && req.method === "DELETE") {
      sessions.clear();
      res.writeHead(204);
      return res.end();
    }
    res.writeHead(404);
    res.end();
  } catch (error) {
    send(res, 400, {
      error: { type: "invalid_request_error", message: error instanceof Error ? error.message : "bad request" },
    });
  }
});

// Run as a program (npm start / npm test); imported by a test only for parseForm and signature.
if (import.meta.url === `file://${process.argv[1]}`) {
  server.listen(port, "127.0.0.1");
  const stop = () => server.close(() => process.exit(0));
  process.on("SIGTERM", stop);
  process.on("SIGINT", stop);
}
