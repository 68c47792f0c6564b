export { startMailFake } from "./mail-fake.js";
export type { MailFake, MailFakeOptions, ReceivedMail } from "./mail-fake.js";
export { startS3Fake } from "./s3-fake.js";
export type { S3Fake, S3FakeOptions } from "./s3-fake.js";
export { startPaymentsFake, SUCCEEDING_CARD, DECLINED_CARD } from "./payments-fake.js";
export type { PaymentsFake, PaymentsFakeOptions, CheckoutSession } from "./payments-fake.js";
