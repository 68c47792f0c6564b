export { startMailFake } from "./mail-fake.js";
export type { MailFake, MailFakeOptions, ReceivedMail } from "./mail-fake.js";
