#!/usr/bin/env node
// Starts every local fake on loopback for `npm start` and `npm test`; stops on SIGINT/SIGTERM.
import { startMailFake } from "./mail-fake.js";
import { startS3Fake } from "./s3-fake.js";
import { startPaymentsFake } from "./payments-fake.js";

const port = (name: string, fallback: number) => {
  const raw = process.env[name];
  const value = raw ? Number(raw) : fallback;
  if (!Number.isInteger(value) || value < 0 || value > 65535) {
    console.error(`${name} must be a port number, got "${raw}"`);
    process.exit(2);
  }
  return value;
};

const mail = await startMailFake({
  smtpPort: port("HUSHMARK_SMTP_PORT", 55025),
  httpPort: port("HUSHMARK_MAIL_API_PORT", 55026),
});
const s3 = await startS3Fake({
  port: port("HUSHMARK_S3_PORT", 55027),
  ...(process.env.HUSHMARK_S3_DIR ? { directory: process.env.HUSHMARK_S3_DIR } : {}),
  buckets: [process.env.HUSHMARK_S3_BUCKET ?? "hushmark"],
});
const payments = await startPaymentsFake({
  port: port("HUSHMARK_PAYMENTS_PORT", 55028),
  webhookUrl: process.env.HUSHMARK_PAYMENTS_WEBHOOK_URL ?? "http://127.0.0.1:8080/api/v1/payments/webhook",
  webhookSecret: process.env.HUSHMARK_STRIPE_WEBHOOK_SECRET ?? "whsec_hushmark_local",
});
console.log(`fakes ready: smtp 127.0.0.1:${mail.smtpPort}, mail api http://127.0.0.1:${mail.httpPort}, s3 ${s3.endpoint}, payments ${payments.url}`);

const stop = async () => {
  await mail.close();
  await s3.close();
  await payments.close();
  process.exit(0);
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
