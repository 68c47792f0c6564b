/**
 * Local payments fake: the part of the hosted Checkout Sessions API the server uses
 * (create and retrieve), a page that plays the hosted payment step with test cards, and
 * signed webhook events (`checkout.session.completed`, `payment_intent.payment_failed`)
 * posted to the server, retried on failure. Driven by the real stripe SDK pointed here with
 * its `host`, `port` and `protocol` options.
 */
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { formString, formStringMap, parseStripeForm, type FormValue } from "./payments-form.js";
import { donePage, paymentPage } from "./payments-page.js";
import { createWebhookSender, newId, type Delivery, type PaymentEvent } from "./payments-webhooks.js";

export const SUCCEEDING_CARD = "4242424242424242";
export const DECLINED_CARD = "4000000000000002";

export interface CheckoutSession {
  id: string;
  object: "checkout.session";
  mode: "payment";
  status: "open" | "complete" | "expired";
  payment_status: "unpaid" | "paid";
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  success_url: string | null;
  cancel_url: string | null;
  url: string;
  created: number;
  expires_at: number;
  livemode: false;
  line_items_summary: { name: string; amount: number; quantity: number }[];
}

export interface PaymentsFakeOptions {
  host?: string;
  port?: number;
  /** Where events are posted; without it events are kept but not sent. */
  webhookUrl?: string;
  webhookSecret?: string;
  retryDelaysMs?: number[];
}

export interface PaymentsFake {
  port: number;
  url: string;
  sessions(): CheckoutSession[];
  events(): PaymentEvent[];
  deliveries(): Delivery[];
  /** Resolves once every webhook delivery in flight has finished (retries included). */
  idle(): Promise<void>;
  close(): Promise<void>;
}

class ApiError extends Error {
  constructor(readonly status: number, readonly type: string, message: string, readonly param?: string) {
    super(message);
  }
}

function readBody(req: IncomingMessage, limit = 1_000_000): Promise<string> {
  return new Promise((resolve, reject) => {
    let size = 0;
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size > limit) reject(new ApiError(413, "invalid_request_error", "Request body too large."));
      else chunks.push(c);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function send(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json", "request-id": newId("req") });
  res.end(JSON.stringify(body));
}

function html(res: ServerResponse, status: number, body: string): void {
  res.writeHead(status, { "content-type": "text/html; charset=utf-8" });
  res.end(body);
}

function lineItems(value: FormValue | undefined): { name: string; amount: number; quantity: number; currency: string }[] {
  if (!Array.isArray(value) || value.length === 0) throw new ApiError(400, "invalid_request_error", "line_items is required in payment mode.", "line_items");
  return value.map((item, i) => {
    if (typeof item !== "object" || Array.isArray(item)) throw new ApiError(400, "invalid_request_error", `line_items[${i}] is not an object.`, `line_items[${i}]`);
    const priceData = item.price_data;
    if (typeof priceData !== "object" || Array.isArray(priceData)) throw new ApiError(400, "invalid_request_error", `line_items[${i}][price_data] is required (this fake has no saved prices).`, `line_items[${i}][price_data]`);
    const amount = Number(formString(priceData.unit_amount));
    if (!Number.isInteger(amount) || amount < 50) throw new ApiError(400, "invalid_request_error", `line_items[${i}][price_data][unit_amount] must be a whole number of minor units, at least 50.`, `line_items[${i}][price_data][unit_amount]`);
    const product = priceData.product_data;
    const name = typeof product === "object" && !Array.isArray(product) ? formString(product.name) : undefined;
    if (!name) throw new ApiError(400, "invalid_request_error", `line_items[${i}][price_data][product_data][name] is required.`, `line_items[${i}][price_data][product_data][name]`);
    const quantity = Number(formString(item.quantity) ?? "1");
    return { name, amount, quantity: Number.isInteger(quantity) && quantity > 0 ? quantity : 1, currency: formString(priceData.currency) ?? "usd" };
  });
}

/** Starts the fake on loopback (port 0 picks a free one). */
export async function startPaymentsFake(options: PaymentsFakeOptions = {}): Promise<PaymentsFake> {
  const host = options.host ?? "127.0.0.1";
  const sessions = new Map<string, CheckoutSession>();
  const intentMetadata = new Map<string, Record<string, string>>();
  const idempotent = new Map<string, { status: number; body: unknown }>();
  const webhooks = createWebhookSender({
    ...(options.webhookUrl ? { url: options.webhookUrl } : {}),
    secret: options.webhookSecret ?? "whsec_hushmark_local",
    ...(options.retryDelaysMs ? { retryDelaysMs: options.retryDelaysMs } : {}),
  });
  let baseUrl = "";

  function authorise(req: IncomingMessage): void {
    const auth = req.headers.authorization ?? "";
    if (!/^Bearer sk_(test|live)_\S+$/.test(auth)) throw new ApiError(401, "invalid_request_error", "Invalid API Key provided: give a secret key starting with sk_test_.");
  }

  function createSession(form: Record<string, FormValue>): CheckoutSession {
    const mode = formString(form.mode);
    if (mode !== "payment") throw new ApiError(400, "invalid_request_error", "This fake supports mode=payment only.", "mode");
    const items = lineItems(form.line_items);
    const currencies = new Set(items.map((i) => i.currency));
    if (currencies.size > 1) throw new ApiError(400, "invalid_request_error", "All line items must use one currency.", "line_items");
    const successUrl = formString(form.success_url) ?? null;
    if (!successUrl) throw new ApiError(400, "invalid_request_error", "success_url is required.", "success_url");
    const id = newId("cs_test");
    const created = Math.floor(Date.now() / 1000);
    const intentData = form.payment_intent_data;
    const session: CheckoutSession = {
      id,
      object: "checkout.session",
      mode: "payment",
      status: "open",
      payment_status: "unpaid",
      amount_total: items.reduce((s, i) => s + i.amount * i.quantity, 0),
      currency: [...currencies][0] ?? "usd",
      client_reference_id: formString(form.client_reference_id) ?? null,
      customer_email: formString(form.customer_email) ?? null,
      metadata: formStringMap(form.metadata),
      payment_intent: null,
      success_url: successUrl,
      cancel_url: formString(form.cancel_url) ?? null,
      url: `${baseUrl}/pay/${id}`,
      created,
      expires_at: created + 24 * 3600,
      livemode: false,
      line_items_summary: items.map(({ name, amount, quantity }) => ({ name, amount, quantity })),
    };
    sessions.set(id, session);
    intentMetadata.set(id, typeof intentData === "object" && !Array.isArray(intentData) ? formStringMap(intentData.metadata) : {});
    return session;
  }

  async function api(req: IncomingMessage, res: ServerResponse, path: string): Promise<void> {
    authorise(req);
    if (req.method === "POST" && path === "/v1/checkout/sessions") {
      const key = req.headers["idempotency-key"];
      const body = await readBody(req);
      if (typeof key === "string" && idempotent.has(key)) {
        const kept = idempotent.get(key)!;
        return send(res, kept.status, kept.body);
      }
      const session = createSession(parseStripeForm(body));
      if (typeof key === "string") idempotent.set(key, { status: 200, body: session });
      return send(res, 200, session);
    }
    const m = /^\/v1\/checkout\/sessions\/([^/]+)$/.exec(path);
    if (req.method === "GET" && m) {
      const session = sessions.get(decodeURIComponent(m[1]!));
      if (!session) throw new ApiError(404, "invalid_request_error", `No such checkout.session: '${m[1]}'`, "id");
      return send(res, 200, session);
    }
    throw new ApiError(404, "invalid_request_error", `Unrecognized request URL (${req.method}: ${path}). This fake implements Checkout Sessions create and retrieve only.`);
  }

  function pay(session: CheckoutSession, card: string): { ok: true; redirect: string } | { ok: false; message: string } {
    const digits = card.replace(/[\s-]/g, "");
    const intentId = session.payment_intent ?? newId("pi");
    session.payment_intent = intentId;
    const intentBase = { id: intentId, object: "payment_intent", amount: session.amount_total, currency: session.currency, metadata: intentMetadata.get(session.id) ?? {}, livemode: false };
    if (digits === SUCCEEDING_CARD) {
      session.status = "complete";
      session.payment_status = "paid";
      webhooks.emit("checkout.session.completed", { ...session });
      return { ok: true, redirect: (session.success_url ?? baseUrl).replace("{CHECKOUT_SESSION_ID}", session.id) };
    }
    if (digits === DECLINED_CARD) {
      webhooks.emit("payment_intent.payment_failed", {
        ...intentBase,
        status: "requires_payment_method",
        last_payment_error: { type: "card_error", code: "card_declined", decline_code: "generic_decline", message: "Your card was declined." },
      });
      return { ok: false, message: "Your card was declined. Try another card." };
    }
    return { ok: false, message: "Use a test card: 4242 4242 4242 4242 succeeds, 4000 0000 0000 0002 is declined." };
  }

  async function page(req: IncomingMessage, res: ServerResponse, id: string): Promise<void> {
    const session = sessions.get(id);
    if (!session) return html(res, 404, donePage("No such payment", "This payment link is not known to the payments fake."));
    const view = { id, description: session.line_items_summary.map((i) => i.name).join(", "), amountTotal: session.amount_total, currency: session.currency, cancelUrl: session.cancel_url };
    if (session.status === "complete") return html(res, 200, donePage("Already paid", "This payment has been made."));
    if (req.method === "GET") return html(res, 200, paymentPage(view));
    const form = new URLSearchParams(await readBody(req, 10_000));
    const outcome = pay(session, form.get("card") ?? "");
    if (!outcome.ok) return html(res, 402, paymentPage(view, outcome.message));
    res.writeHead(303, { location: outcome.redirect });
    res.end();
  }

  async function route(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://fake");
    const path = url.pathname;
    try {
      if (path.startsWith("/v1/")) return await api(req, res, path);
      const p = /^\/pay\/([^/]+)$/.exec(path);
      if (p && (req.method === "GET" || req.method === "POST")) return await page(req, res, decodeURIComponent(p[1]!));
      if (req.method === "GET" && path === "/_fake/events") return send(res, 200, { events: webhooks.events(), deliveries: webhooks.deliveries() });
      const r = /^\/_fake\/events\/([^/]+)\/resend$/.exec(path);
      if (req.method === "POST" && r) {
        const status = await webhooks.resend(decodeURIComponent(r[1]!));
        return send(res, status === null ? 404 : 200, { status });
      }
      if (req.method === "GET" && path === "/health") return send(res, 200, { ok: true });
      send(res, 404, { error: { type: "invalid_request_error", message: `Nothing at ${path}.` } });
    } catch (e) {
      if (e instanceof ApiError) return send(res, e.status, { error: { type: e.type, message: e.message, ...(e.param ? { param: e.param } : {}) } });
      send(res, 500, { error: { type: "api_error", message: (e as Error).message } });
    }
  }

  const server: Server = createServer((req, res) => void route(req, res));
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port ?? 0, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  baseUrl = `http://${host}:${port}`;
  return {
    port,
    url: baseUrl,
    sessions: () => [...sessions.values()],
    events: () => webhooks.events(),
    deliveries: () => webhooks.deliveries(),
    idle: () => webhooks.idle(),
    async close() {
      webhooks.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
