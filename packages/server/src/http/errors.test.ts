import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable } from "./errors.js";

describe("telling a database outage from a bug", () => {
  it("counts the ways a restart or a cut connection shows itself as unavailable", () => {
    expect(isDatabaseUnavailable({ code: "57P01" })).toBe(true); // terminating connection due to administrator command
    expect(isDatabaseUnavailable({ driverError: { code: "57P03" } })).toBe(true); // the database system is starting up
    expect(isDatabaseUnavailable({ code: "EPIPE", message: "write EPIPE" })).toBe(true);
    expect(isDatabaseUnavailable({ message: "Connection terminated unexpectedly" })).toBe(true);
    expect(isDatabaseUnavailable(new Error("timeout exceeded when trying to connect"))).toBe(true);
    expect(isDatabaseUnavailable(new Error("Client was closed and is not queryable"))).toBe(true);
  });

  it("leaves other errors as bugs (a 500)", () => {
    expect(isDatabaseUnavailable({ code: "23505", message: "duplicate key value violates unique constraint" })).toBe(false);
    expect(isDatabaseUnavailable(new TypeError("Cannot read properties of undefined"))).toBe(false);
  });
});
