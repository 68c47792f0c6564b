import { describe, expect, it } from "vitest";
import { passwordSchema } from "./auth.js";
import { isWeakPassword } from "./weak-passwords.js";

describe("weak passwords", () => {
  it.each(["password1234", "Password1234", "123456789012", "aaaaaaaaaaaa", "abcabcabcabc", "qwertyuiopas", "9876543210987", "P@ssword!!2024", "hushmark2026"])(
    "refuses %s",
    (p) => expect(isWeakPassword(p)).toBe(true),
  );
  it.each(["a perfectly fine passphrase", "quiet-demo-2026", "grinder under the stair", "tram squeal at dawn"])("accepts %s", (p) =>
    expect(isWeakPassword(p)).toBe(false),
  );
  it("explains the refusal without composition rules", () => {
    const r = passwordSchema.safeParse("password1234");
    expect(r.success).toBe(false);
    expect(r.error?.issues[0]?.message).toMatch(/too common/);
  });
});
