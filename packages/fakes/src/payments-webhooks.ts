import { randomBytes } from "node:crypto";
import Stripe from "stripe";

/** An event as the hosted service posts it to a webhook endpoint. */
export interface PaymentEvent {
  id: string;
  object: "event";
  api_version: string;
  created: number;
  livemode: false;
  pending_webhooks: number;
  type: string;
  data: { object: Record<string, unknown> };
}

export interface Delivery {
  eventId: string;
  attempt: number;
  status: number | null;
  error?: string;
  at: string;
}

export interface WebhookSender {
  /** Creates the event, keeps it, and delivers it in the background (with retries). */
  emit(type: string, object: Record<string, unknown>): PaymentEvent;
  /** Posts a kept event again (as the hosted service does on a retry), resolving to the HTTP status. */
  resend(eventId: string): Promise<number | null>;
  events(): PaymentEvent[];
  deliveries(): Delivery[];
  /** Resolves once no delivery is pending. */
  idle(): Promise<void>;
  close(): void;
}

export interface WebhookOptions {
  url?: string;
  secret: string;
  /** Delays before each retry, ms (default 200, 1000, 3000, 10000). */
  retryDelaysMs?: number[];
}

const signer = new Stripe("sk_test_fake_signer");

export const newId = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;

/** Signs and posts events exactly as the hosted service does (`Stripe-Signature: t=…,v1=…`). */
export function createWebhookSender(options: WebhookOptions): WebhookSender {
  const events: PaymentEvent[] = [];
  const deliveries: Delivery[] = [];
  const pending = new Set<Promise<void>>();
  const timers = new Set<NodeJS.Timeout>();
  const delays = options.retryDelaysMs ?? [200, 1000, 3000, 10_000];
  let closed = false;

  async function post(event: PaymentEvent, attempt: number): Promise<number | null> {
    if (!options.url) return null;
    const payload = JSON.stringify(event, null, 2);
    const header = signer.webhooks.generateTestHeaderString({ payload, secret: options.secret, timestamp: Math.floor(Date.now() / 1000) });
    try {
      const res = await fetch(options.url, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": header }, body: payload, signal: AbortSignal.timeout(10_000) });
      deliveries.push({ eventId: event.id, attempt, status: res.status, at: new Date().toISOString() });
      await res.arrayBuffer();
      return res.status;
    } catch (e) {
      deliveries.push({ eventId: event.id, attempt, status: null, error: (e as Error).message, at: new Date().toISOString() });
      return null;
    }
  }

  function deliver(event: PaymentEvent, attempt: number): void {
    const job = (async () => {
      const status = await post(event, attempt);
      const ok = status !== null && status >= 200 && status < 300;
      const delay = delays[attempt - 1];
      if (!ok && delay !== undefined && !closed && options.url) {
        await new Promise<void>((resolve) => {
          const t = setTimeout(() => {
            timers.delete(t);
            resolve();
          }, delay);
          timers.add(t);
        });
        if (!closed) deliver(event, attempt + 1);
      }
    })();
    pending.add(job);
    void job.finally(() => pending.delete(job));
  }

  return {
    emit(type, object) {
      const event: PaymentEvent = {
        id: newId("evt"),
        object: "event",
        api_version: "2025-01-01",
        created: Math.floor(Date.now() / 1000),
        livemode: false,
        pending_webhooks: 1,
        type,
        data: { object },
      };
      events.push(event);
      deliver(event, 1);
      return event;
    },
    async resend(eventId) {
      const event = events.find((e) => e.id === eventId);
      if (!event) return null;
      return post(event, deliveries.filter((d) => d.eventId === eventId).length + 1);
    },
    events: () => [...events],
    deliveries: () => [...deliveries],
    async idle() {
      while (pending.size > 0) await Promise.allSettled([...pending]);
    },
    close() {
      closed = true;
      for (const t of timers) clearTimeout(t);
      timers.clear();
    },
  };
}
