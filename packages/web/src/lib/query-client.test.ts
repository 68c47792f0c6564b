import { describe, expect, it } from "vitest";
import { ApiError } from "./api-client";
import { createQueryClient, shouldRetry } from "./query-client";

describe("shouldRetry", () => {
  it("does not repeat a refusal but retries network trouble and server faults twice", () => {
    expect(shouldRetry(0, new ApiError({ status: 404, code: "not_found", message: "" }))).toBe(false);
    expect(shouldRetry(0, new ApiError({ status: 401, code: "not_signed_in", message: "" }))).toBe(false);
    expect(shouldRetry(0, new ApiError({ status: 0, code: "network_error", message: "" }))).toBe(true);
    expect(shouldRetry(1, new ApiError({ status: 503, code: "server_error", message: "" }))).toBe(true);
    expect(shouldRetry(2, new ApiError({ status: 503, code: "server_error", message: "" }))).toBe(false);
  });
});

describe("createQueryClient", () => {
  it("keeps the other defaults when one is overridden", () => {
    const defaults = createQueryClient({ defaultOptions: { queries: { retry: false } } }).getDefaultOptions();
    expect(defaults.queries?.retry).toBe(false);
    expect(defaults.queries?.staleTime).toBe(30_000);
    expect(defaults.mutations?.retry).toBe(false);
  });
});
