#!/usr/bin/env node
// Starts every local fake on loopback for `npm start` and `npm test`; stops on SIGINT/SIGTERM.
import { startMailFake } from "./mail-fake.js";

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
console.log(`fakes ready: smtp 127.0.0.1:${mail.smtpPort}, mail api http://127.0.0.1:${mail.httpPort}`);

const stop = async () => {
  await mail.close();
  process.exit(0);
};
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
