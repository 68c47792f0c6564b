import { apiErrorSchema, fieldIssueSchema, type FieldIssue } from "@hushmark/schemas";
import type { z } from "zod";

export const API_BASE = "/api/v1";

/** A refusal from the API (or the network), with what a screen needs to explain it. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown;
  /** Field problems of a 400, by dotted path ("email", "clients.0.membershipId"). */
  readonly fieldIssues: FieldIssue[];
  readonly retryAfterSeconds: number | null;

  constructor(options: { status: number; code: string; message: string; details?: unknown; retryAfterSeconds?: number | null }) {
    super(options.message);
    this.name = "ApiError";
    this.status = options.status;
    this.code = options.code;
    this.details = options.details;
    this.fieldIssues = parseFieldIssues(options.details);
    this.retryAfterSeconds = options.retryAfterSeconds ?? null;
  }

  get isUnauthorized(): boolean {
    return this.status === 401;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

function parseFieldIssues(details: unknown): FieldIssue[] {
  if (!Array.isArray(details)) return [];
  const issues: FieldIssue[] = [];
  for (const entry of details) {
    const parsed = fieldIssueSchema.safeParse(entry);
    if (parsed.success) issues.push(parsed.data);
  }
  return issues;
}

const fallbackMessages: Record<number, string> = {
  400: "Some fields need attention.",
  401: "Please sign in.",
  403: "Your role may not do this.",
  404: "We could not find that.",
  409: "Someone else changed this in the meantime.",
  413: "That is too large to send.",
  429: "Too many attempts. Wait a little and try again.",
  502: "Hushmark's server is not answering right now. Try again in a moment.",
  503: "Hushmark's server is not answering right now. Try again in a moment.",
  504: "Hushmark's server is not answering right now. Try again in a moment.",
};

async function errorFromResponse(response: Response): Promise<ApiError> {
  const retryAfter = Number(response.headers.get("Retry-After"));
  const retryAfterSeconds = Number.isFinite(retryAfter) && retryAfter > 0 ? retryAfter : null;
  let body: unknown = null;
  try {
    body = await response.json();
  } catch {
    // Not JSON (a proxy page, an empty body): fall back to a message by status.
  }
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) {
    return new ApiError({ status: response.status, ...parsed.data.error, retryAfterSeconds });
  }
  return new ApiError({
    status: response.status,
    code: response.status >= 500 ? "server_error" : "unexpected_answer",
    message: fallbackMessages[response.status] ?? "Something went wrong on our side. Try again in a moment.",
    retryAfterSeconds,
  });
}

export interface RequestOptions<T> {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  body?: unknown;
  /** Validates the answer; without it the answer is not read (204 routes). */
  schema?: z.ZodType<T>;
  signal?: AbortSignal;
  /** Sign-in, sign-up and refresh must not trigger a refresh of their own. */
  skipRefresh?: boolean;
  /** Answer the body as a Blob (a file the server renders) instead of parsing JSON. */
  blob?: boolean;
}

// One refresh at a time: several queries failing together must not rotate the refresh token
// several times, since presenting a used refresh token revokes the whole session family.
let refreshInFlight: Promise<boolean> | null = null;

function refreshSession(): Promise<boolean> {
  refreshInFlight ??= fetch(`${API_BASE}/auth/refresh`, {
    method: "POST",
    credentials: "same-origin",
    headers: { "Content-Type": "application/json", Accept: "application/json" },
    body: "{}",
  })
    .then((response) => response.ok)
    .catch(() => false)
    .finally(() => {
      refreshInFlight = null;
    });
  return refreshInFlight;
}

async function send(path: string, options: RequestOptions<unknown>): Promise<Response> {
  const method = options.method ?? "GET";
  const headers: Record<string, string> = { Accept: "application/json" };
  let body: string | undefined;
  if (method !== "GET") {
    // The server refuses state-changing requests that are not JSON, even without a body.
    headers["Content-Type"] = "application/json";
    body = JSON.stringify(options.body ?? {});
  }
  try {
    return await fetch(`${API_BASE}${path}`, {
      method,
      headers,
      body,
      credentials: "same-origin",
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === "AbortError") throw error;
    throw new ApiError({ status: 0, code: "network_error", message: "We could not reach Hushmark. Check the connection and try again." });
  }
}

/**
 * Calls the API under /api/v1 and answers the parsed body. On a 401 it refreshes the session
 * once and retries; it never shows messages or navigates — the calling screen decides.
 */
export async function apiRequest<T>(path: string, options: RequestOptions<T> = {}): Promise<T> {
  let response = await send(path, options);
  if (response.status === 401 && !options.skipRefresh) {
    const refreshed = await refreshSession();
    if (refreshed) response = await send(path, options);
  }
  if (!response.ok) throw await errorFromResponse(response);
  if (options.blob) return (await response.blob()) as T;
  if (!options.schema) return undefined as T;
  const json: unknown = await response.json();
  const parsed = options.schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError({ status: response.status, code: "unexpected_answer", message: "The server answered in a shape this page does not understand. Reload the page." });
  }
  return parsed.data;
}

export const api = {
  get: <T>(path: string, schema: z.ZodType<T>, signal?: AbortSignal) => apiRequest(path, { schema, signal }),
  post: <T>(path: string, body: unknown, schema?: z.ZodType<T>, extra?: Pick<RequestOptions<T>, "skipRefresh">) =>
    apiRequest<T>(path, { method: "POST", body, schema, ...extra }),
  patch: <T>(path: string, body: unknown, schema?: z.ZodType<T>) => apiRequest<T>(path, { method: "PATCH", body, schema }),
  put: <T>(path: string, body: unknown, schema?: z.ZodType<T>) => apiRequest<T>(path, { method: "PUT", body, schema }),
  delete: (path: string) => apiRequest<void>(path, { method: "DELETE" }),
  /** A POST whose answer is a file (a PDF the server draws). */
  postForFile: (path: string, body: unknown) => apiRequest<Blob>(path, { method: "POST", body, blob: true }),
};
