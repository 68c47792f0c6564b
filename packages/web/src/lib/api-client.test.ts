import { meSchema } from "@hushmark/schemas";
import { afterEach, describe, expect, it, vi } from "vitest";
import { queueFetch } from "../test/render";
import { api, ApiError, apiRequest } from "./api-client";

const me = {
  user: { id: "0b5f6f2e-4a1e-4c47-9d43-2f1f3c1a7a01", email: "wren@quietline.example", displayName: "Wren Adair" },
  membership: { organizationId: "6a1d2c3b-7e4f-4a5b-8c9d-0e1f2a3b4c5d", organizationName: "Quietline Acoustics", role: "owner" },
  memberships: [{ organizationId: "6a1d2c3b-7e4f-4a5b-8c9d-0e1f2a3b4c5d", organizationName: "Quietline Acoustics", role: "owner" }],
};

afterEach(() => {
  vi.unstubAllGlobals();
});

describe("apiRequest", () => {
  it("parses the error shape into an ApiError with field issues", async () => {
    const { fetchMock } = queueFetch({
      status: 400,
      body: { error: { code: "invalid_input", message: "Some fields need attention.", details: [{ path: "email", message: "Enter an e-mail address like name@example.com." }, { nonsense: true }] } },
    });
    vi.stubGlobal("fetch", fetchMock);
    const error = await apiRequest("/auth/sign-in", { method: "POST", body: {}, skipRefresh: true }).catch((caught: unknown) => caught);
    expect(error).toBeInstanceOf(ApiError);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(400);
    expect(apiError.code).toBe("invalid_input");
    expect(apiError.fieldIssues).toEqual([{ path: "email", message: "Enter an e-mail address like name@example.com." }]);
  });

  it("refreshes once on a 401 and retries the request", async () => {
    const { fetchMock, calls } = queueFetch(
      { status: 401, body: { error: { code: "not_signed_in", message: "Please sign in." } } },
      { status: 200, body: me },
      { status: 200, body: me },
    );
    vi.stubGlobal("fetch", fetchMock);
    const answer = await apiRequest("/auth/me", { schema: meSchema });
    expect(answer.user.displayName).toBe("Wren Adair");
    expect(calls.map((call) => `${call.init?.method ?? "GET"} ${call.url}`)).toEqual(["GET /api/v1/auth/me", "POST /api/v1/auth/refresh", "GET /api/v1/auth/me"]);
    expect(calls.every((call) => call.init?.credentials === "same-origin")).toBe(true);
  });

  it("gives up with the 401 when the refresh is refused, without looping", async () => {
    const refusal = { status: 401, body: { error: { code: "not_signed_in", message: "Please sign in." } } };
    const { fetchMock, calls } = queueFetch(refusal, refusal);
    vi.stubGlobal("fetch", fetchMock);
    const error = await apiRequest("/projects", {}).catch((caught: unknown) => caught);
    expect((error as ApiError).status).toBe(401);
    expect(calls).toHaveLength(2);
  });

  it("shares one refresh between requests that fail together", async () => {
    const refusal = { status: 401, body: { error: { code: "not_signed_in", message: "Please sign in." } } };
    const calls: string[] = [];
    let refreshes = 0;
    vi.stubGlobal("fetch", async (input: RequestInfo | URL) => {
      const url = String(input);
      calls.push(url);
      if (url.endsWith("/auth/refresh")) {
        refreshes += 1;
        return new Response(JSON.stringify(me), { status: 200 });
      }
      // First visit to each URL is refused, the retry succeeds.
      const seen = calls.filter((call) => call === url).length;
      return seen === 1 ? new Response(JSON.stringify(refusal.body), { status: 401 }) : new Response(JSON.stringify({ ok: true }), { status: 200 });
    });
    await Promise.all([apiRequest("/projects"), apiRequest("/people")]);
    expect(refreshes).toBe(1);
  });

  it("sends JSON on state-changing requests even without a body", async () => {
    const { fetchMock, calls } = queueFetch({ status: 204 });
    vi.stubGlobal("fetch", fetchMock);
    await apiRequest("/people/invitations/abc", { method: "DELETE" });
    const headers = calls[0]?.init?.headers as Record<string, string>;
    expect(headers["Content-Type"]).toBe("application/json");
  });

  it("turns a non-JSON server fault into a readable ApiError", async () => {
    vi.stubGlobal("fetch", async () => new Response("<html>Bad gateway</html>", { status: 502 }));
    const error = (await apiRequest("/projects").catch((caught: unknown) => caught)) as ApiError;
    expect(error.status).toBe(502);
    expect(error.code).toBe("server_error");
    expect(error.message).toMatch(/not answering/);
  });
});

describe("api.postForFile", () => {
  it("answers the file the server drew as a Blob, and a refusal as an ApiError", async () => {
    const answers = [
      new Response(new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d]), { status: 200, headers: { "content-type": "application/pdf" } }),
      new Response(JSON.stringify({ error: { code: "invalid_input", message: "Choose a receiving room." } }), { status: 400, headers: { "content-type": "application/json" } }),
    ];
    vi.stubGlobal("fetch", vi.fn(async () => answers.shift()!));
    const file = await api.postForFile("/projects/p/analyses/drawing", { planVersion: 1 });
    expect(file.type).toBe("application/pdf");
    expect(new TextDecoder().decode(await file.arrayBuffer())).toBe("%PDF-");
    const refused = await api.postForFile("/projects/p/analyses/drawing", {}).catch((e: unknown) => e);
    expect(refused).toBeInstanceOf(ApiError);
    expect((refused as ApiError).message).toBe("Choose a receiving room.");
  });
});
