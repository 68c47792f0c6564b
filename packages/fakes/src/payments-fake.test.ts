import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import Stripe from "stripe";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { parseStripeForm } from "./payments-form.js";
import { startPaymentsFake, type PaymentsFake } from "./payments-fake.js";

const SECRET = "whsec_test_payments_fake";

interface Received {
  body: string;
  signature: string;
}

describe("payments fake", () => {
  let fake: PaymentsFake;
  let receiver: Server;
  const received: Received[] = [];
  let failNext = 0;
  let stripe: Stripe;

  beforeAll(async () => {
    receiver = createServer((req, res) => {
      const chunks: Buffer[] = [];
      req.on("data", (c: Buffer) => chunks.push(c));
      req.on("end", () => {
        if (failNext > 0) {
          failNext--;
          res.writeHead(500).end();
          return;
        }
        received.push({ body: Buffer.concat(chunks).toString("utf8"), signature: String(req.headers["stripe-signature"]) });
        res.writeHead(200).end();
      });
    });
    await new Promise<void>((r) => receiver.listen(0, "127.0.0.1", () => r()));
    const hook = `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/hook`;
    fake = await startPaymentsFake({ webhookUrl: hook, webhookSecret: SECRET, retryDelaysMs: [20, 20, 20] });
    stripe = new Stripe("sk_test_fake", { host: "127.0.0.1", port: fake.port, protocol: "http", maxNetworkRetries: 0 });
  });
  afterAll(async () => {
    await fake.close();
    await new Promise<void>((r) => receiver.close(() => r()));
  });
  beforeEach(() => {
    received.length = 0;
  });

  const create = () =>
    stripe.checkout.sessions.create({
      mode: "payment",
      line_items: [{ quantity: 1, price_data: { currency: "usd", unit_amount: 123_45, product_data: { name: "Deposit for proposal P-7 v2" } } }],
      success_url: "http://127.0.0.1:9/portal/paid?session={CHECKOUT_SESSION_ID}",
      cancel_url: "http://127.0.0.1:9/portal",
      client_reference_id: "proposal-1",
      metadata: { proposalId: "proposal-1", version: "2" },
      payment_intent_data: { metadata: { proposalId: "proposal-1" } },
    });

  it("parses bracketed form keys into nested objects and arrays", () => {
    const form = parseStripeForm("line_items[0][price_data][unit_amount]=500&line_items[1][quantity]=2&metadata[a]=b&mode=payment");
    expect(form).toEqual({ line_items: [{ price_data: { unit_amount: "500" } }, { quantity: "2" }], metadata: { a: "b" }, mode: "payment" });
  });

  it("creates and retrieves a checkout session through the SDK", async () => {
    const session = await create();
    expect(session.id).toMatch(/^cs_test_/);
    expect(session.amount_total).toBe(12345);
    expect(session.metadata).toEqual({ proposalId: "proposal-1", version: "2" });
    expect(session.url).toBe(`${fake.url}/pay/${session.id}`);
    const again = await stripe.checkout.sessions.retrieve(session.id);
    expect(again.status).toBe("open");
    expect(again.payment_status).toBe("unpaid");
  });

  it("answers bad requests and unknown keys the way the SDK turns into errors", async () => {
    await expect(stripe.checkout.sessions.create({ mode: "payment", success_url: "http://x/" })).rejects.toMatchObject({ type: "StripeInvalidRequestError", statusCode: 400 });
    const noKey = new Stripe("pk_wrong", { host: "127.0.0.1", port: fake.port, protocol: "http", maxNetworkRetries: 0 });
    await expect(noKey.checkout.sessions.retrieve("cs_test_x")).rejects.toMatchObject({ statusCode: 401 });
    await expect(stripe.checkout.sessions.retrieve("cs_test_missing")).rejects.toMatchObject({ statusCode: 404 });
  });

  it("pays with the succeeding card, redirects, and posts a signed checkout.session.completed", async () => {
    const session = await create();
    const page = await fetch(session.url!);
    expect(await page.text()).toContain("$123.45");
    const res = await fetch(session.url!, { method: "POST", body: new URLSearchParams({ card: "4242 4242 4242 4242", expiry: "12/34", cvc: "123" }), redirect: "manual" });
    expect(res.status).toBe(303);
    expect(res.headers.get("location")).toBe(`http://127.0.0.1:9/portal/paid?session=${session.id}`);
    await fake.idle();
    expect(received).toHaveLength(1);
    const event = stripe.webhooks.constructEvent(received[0]!.body, received[0]!.signature, SECRET);
    expect(event.type).toBe("checkout.session.completed");
    const paid = event.data.object as Stripe.Checkout.Session;
    expect(paid.id).toBe(session.id);
    expect(paid.payment_status).toBe("paid");
    expect(paid.metadata?.proposalId).toBe("proposal-1");
    expect(() => stripe.webhooks.constructEvent(received[0]!.body, received[0]!.signature, "whsec_other")).toThrow();
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("complete");
  });

  it("declines 4000 0000 0000 0002, keeps the session open and posts payment_intent.payment_failed", async () => {
    const session = await create();
    const res = await fetch(session.url!, { method: "POST", body: new URLSearchParams({ card: "4000000000000002", expiry: "12/34", cvc: "123" }) });
    expect(res.status).toBe(402);
    expect(await res.text()).toContain("declined");
    await fake.idle();
    const event = stripe.webhooks.constructEvent(received[0]!.body, received[0]!.signature, SECRET);
    expect(event.type).toBe("payment_intent.payment_failed");
    const intent = event.data.object as Stripe.PaymentIntent;
    expect(intent.metadata.proposalId).toBe("proposal-1");
    expect(intent.last_payment_error?.code).toBe("card_declined");
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe("open");
  });

  it("retries a delivery the receiver failed, and can resend a kept event", async () => {
    failNext = 2;
    const session = await create();
    await fetch(session.url!, { method: "POST", body: new URLSearchParams({ card: "4242424242424242" }), redirect: "manual" });
    await fake.idle();
    expect(received).toHaveLength(1);
    const event = JSON.parse(received[0]!.body) as { id: string };
    const attempts = fake.deliveries().filter((d) => d.eventId === event.id);
    expect(attempts.map((d) => d.status)).toEqual([500, 500, 200]);
    const resend = await fetch(`${fake.url}/_fake/events/${event.id}/resend`, { method: "POST" });
    expect(await resend.json()).toEqual({ status: 200 });
    expect(received).toHaveLength(2);
    expect(JSON.parse(received[1]!.body).id).toBe(event.id);
  });
});
