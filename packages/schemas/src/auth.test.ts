import { describe, expect, it } from "vitest";
import { signUpSchema } from "./auth.js";

describe("signUpSchema", () => {
  it("normalises the e-mail and refuses a short password with a message", () => {
    const ok = signUpSchema.parse({ firmName: "Quietline", displayName: "Ada", email: " Ada@Example.COM ", password: "a long enough pass" });
    expect(ok.email).toBe("ada@example.com");
    const bad = signUpSchema.safeParse({ firmName: "Quietline", displayName: "Ada", email: "ada@example.com", password: "short" });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(["password"]);
    expect(bad.error?.issues[0]?.message).toMatch(/at least 12/);
  });
});
