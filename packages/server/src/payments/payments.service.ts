import Stripe from "stripe";
import type { Logger } from "pino";
import type { DataSource, EntityManager } from "typeorm";
import { proposalContentSchema } from "@hushmark/schemas";
import type { Actor } from "../auth/actor.js";
import { recordAudit } from "../audit/audit.js";
import { HttpError, conflict } from "../http/errors.js";
import { linkMail } from "../mail/mailer.js";
import type { Outbox } from "../outbox/outbox.js";
import type { ProposalsService } from "../proposals/proposals.service.js";
import { ProposalVersionRow } from "../proposals/proposal-version.entity.js";
import { ProposalRow } from "../proposals/proposal.entity.js";
import { formatMoney } from "../proposals/proposal-content.js";
import { PaymentEventRow, PaymentRow } from "./payment.entity.js";
import type { PaymentsConfig } from "./payments.config.js";

/** The SDK configured from the environment: the same code reaches the hosted service or the local fake. */
export function createStripe(config: PaymentsConfig): Stripe {
  return new Stripe(config.secretKey, {
    ...(config.host ? { host: config.host } : {}),
    ...(config.port ? { port: config.port } : {}),
    ...(config.protocol ? { protocol: config.protocol } : {}),
    maxNetworkRetries: 2,
    timeout: 15_000,
  });
}

/** Deposits through Checkout Sessions and the webhook that records them (idempotent by event id). */
export function createPaymentsService(dataSource: DataSource, deps: { config: PaymentsConfig; stripe: Stripe; proposals: ProposalsService; outbox: Outbox; logger: Logger }) {
  const { stripe, proposals, outbox, logger } = deps;
  const payments = dataSource.getRepository(PaymentRow);

  async function startDeposit(actor: Actor, proposalId: string, approvedVersion: number): Promise<{ url: string; paymentId: string }> {
    if (deps.config.enabled === false) throw new HttpError(503, "payments_not_set_up", "Online deposits are not set up on this server yet; the firm will send payment details. (The owner sets HUSHMARK_STRIPE_SECRET_KEY and HUSHMARK_STRIPE_WEBHOOK_SECRET.)");
    const { row, version } = await proposals.visible(actor, proposalId);
    if (approvedVersion !== version) throw conflict("stale_version", `You approved version ${approvedVersion}; the current version is ${version}. Reload the proposal.`);
    if (row.status === "deposit_paid" || row.status === "in_progress" || row.status === "verified") throw conflict("already_paid", "The deposit for this proposal is paid already.");
    if (row.status !== "approved") throw conflict("not_approved", "Approve the proposal before paying the deposit.");
    const v = await dataSource.getRepository(ProposalVersionRow).findOneByOrFail({ proposalId, version });
    const content = proposalContentSchema.parse(v.content);
    const amountMinor = Math.round(content.deposit * 100);
    if (amountMinor < 50) throw new HttpError(409, "no_deposit", "This proposal asks for no deposit; the firm will be in touch to start the work.");
    // A second click (or a second tab) gets the payment page already open, so one deposit cannot be paid twice.
    const open = await payments.findOne({ where: { proposalId, version, status: "pending" }, order: { createdAt: "DESC" } });
    if (open) {
      const existing = await stripe.checkout.sessions.retrieve(open.checkoutSessionId).catch(() => null);
      if (existing?.status === "open" && existing.url) return { url: existing.url, paymentId: open.id };
    }
    const paymentId = crypto.randomUUID();
    const portal = proposals.portalUrl(proposalId);
    // The idempotency key makes a retried create (network hiccup, double click) answer the same session.
    const session = await stripe.checkout.sessions.create({
      mode: "payment",
      line_items: [{ quantity: 1, price_data: { currency: content.currency.toLowerCase(), unit_amount: amountMinor, product_data: { name: `Deposit (${content.depositPercent}%) — ${content.title}, version ${version}` } } }],
      success_url: `${portal}?payment=done`,
      cancel_url: `${portal}?payment=cancelled`,
      client_reference_id: paymentId,
      customer_email: actor.email,
      metadata: { paymentId, proposalId, version: String(version) },
      payment_intent_data: { metadata: { paymentId, proposalId, version: String(version) } },
    }, { idempotencyKey: `deposit-${paymentId}` }).catch((e: unknown) => {
      logger.error({ err: e }, "payment service refused a checkout session");
      throw new HttpError(502, "payments_unavailable", "The payment service did not answer; nothing was charged. Try again in a minute.");
    });
    await payments.insert({ id: paymentId, organizationId: actor.organizationId, proposalId, version, checkoutSessionId: session.id, amountMinor, currency: content.currency, status: "pending", requestedById: actor.userId });
    if (!session.url) throw new HttpError(502, "payments_unavailable", "The payment service gave no payment page; try again.");
    return { url: session.url, paymentId };
  }

  /** Verifies the signature over the raw body; a bad or missing signature answers 400 and changes nothing. */
  function verify(raw: Buffer, signature: string | undefined): Stripe.Event {
    if (deps.config.enabled === false) throw new HttpError(503, "payments_not_set_up", "Payments are not set up on this server.");
    if (!signature) throw new HttpError(400, "bad_signature", "Missing Stripe-Signature header.");
    try {
      return stripe.webhooks.constructEvent(raw, signature, deps.config.webhookSecret);
    } catch (e) {
      throw new HttpError(400, "bad_signature", `The webhook signature did not verify: ${(e as Error).message}`);
    }
  }

  /** Queues the receipt in the payment's own transaction, keyed by the payment: one receipt however often the event arrives. */
  async function queueReceipt(m: EntityManager, payment: PaymentRow): Promise<void> {
    const rows: { email: string; display_name: string }[] = await m.query("SELECT u.email, u.display_name FROM users u WHERE u.id = $1", [payment.requestedById]);
    const to = rows[0];
    if (!to) return;
    const v = await m.getRepository(ProposalVersionRow).findOneByOrFail({ proposalId: payment.proposalId, version: payment.version });
    const content = proposalContentSchema.parse(v.content);
    await outbox.queue(m, {
      organizationId: payment.organizationId,
      kind: "receipt",
      key: `receipt:${payment.id}`,
      ...linkMail(to.email, `Receipt: deposit for ${content.projectTitle}`, [
        `Hello ${to.display_name},`,
        `We received your deposit of ${formatMoney(payment.amountMinor / 100, payment.currency)} for “${content.title}” (version ${payment.version}).`,
        `Total of the work ${formatMoney(content.total, content.currency)}; the balance of ${formatMoney(content.total - payment.amountMinor / 100, content.currency)} is due as the terms say.`,
        `Payment reference: ${payment.id}.`,
      ], { label: "Open the proposal", url: proposals.portalUrl(payment.proposalId) }, `${content.firmName} — thank you.`),
    });
  }

  /** Handles one verified event once: the event id is stored in the same transaction as its effect. */
  async function handle(event: Stripe.Event): Promise<{ duplicate: boolean }> {
    let paidNow = false;
    const duplicate = await dataSource.transaction(async (m) => {
      const inserted = await m.createQueryBuilder().insert().into(PaymentEventRow).values({ eventId: event.id, type: event.type, paymentId: null }).orIgnore().execute();
      if ((inserted.raw as unknown[]).length === 0) return true;
      let payment: PaymentRow | null = null;
      if (event.type === "checkout.session.completed") {
        const session = event.data.object as Stripe.Checkout.Session;
        payment = await m.getRepository(PaymentRow).createQueryBuilder("p").setLock("pessimistic_write").where("p.checkout_session_id = :id", { id: session.id }).getOne();
        if (payment && payment.status !== "paid" && session.payment_status === "paid") {
          await m.getRepository(PaymentRow).update({ id: payment.id }, { status: "paid", paidAt: new Date(), failureMessage: null });
          const moved = await m.getRepository(ProposalRow).createQueryBuilder().update().set({ status: "deposit_paid" }).where("id = :id AND status = 'approved'", { id: payment.proposalId }).execute();
          // Money arrived for a proposal already paid (two payment pages paid): recorded for the firm to refund.
          const action = moved.affected ? "payment.deposit_paid" : "payment.paid_again";
          if (!moved.affected) logger.warn({ paymentId: payment.id, proposalId: payment.proposalId }, "a deposit was paid for a proposal that was already paid");
          await recordAudit(m, { organizationId: payment.organizationId, actorUserId: null, action, entityType: "proposal", entityId: payment.proposalId, data: { paymentId: payment.id, amountMinor: payment.amountMinor, eventId: event.id } });
          await queueReceipt(m, payment);
          paidNow = true;
        }
      } else if (event.type === "payment_intent.payment_failed") {
        const intent = event.data.object as Stripe.PaymentIntent;
        const id = intent.metadata?.paymentId;
        payment = id ? await m.getRepository(PaymentRow).findOne({ where: { id }, lock: { mode: "pessimistic_write" } }) : null;
        if (payment && payment.status === "pending") {
          await m.getRepository(PaymentRow).update({ id: payment.id }, { status: "failed", failureMessage: intent.last_payment_error?.message ?? "The payment was declined." });
        }
      }
      if (payment) await m.getRepository(PaymentEventRow).update({ eventId: event.id }, { paymentId: payment.id });
      return false;
    });
    if (paidNow) outbox.kick();
    return { duplicate };
  }

  return { startDeposit, verify, handle };
}

export type PaymentsService = ReturnType<typeof createPaymentsService>;
