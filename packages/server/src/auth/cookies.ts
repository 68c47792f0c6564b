import type { CookieOptions, Response } from "express";
import type { AppConfig } from "../config.js";

export const ACCESS_COOKIE = "hm_access";
export const REFRESH_COOKIE = "hm_refresh";
const REFRESH_PATH = "/api/v1/auth";

function base(config: AppConfig): CookieOptions {
  return { httpOnly: true, sameSite: "strict", secure: config.env === "production" };
}

/** Sets both session cookies. */
export function setSessionCookies(res: Response, config: AppConfig, access: string, refresh: string): void {
  res.cookie(ACCESS_COOKIE, access, { ...base(config), path: "/", maxAge: config.accessTtlSeconds * 1000 });
  res.cookie(REFRESH_COOKIE, refresh, { ...base(config), path: REFRESH_PATH, maxAge: config.refreshTtlSeconds * 1000 });
}

/** Clears both session cookies. */
export function clearSessionCookies(res: Response, config: AppConfig): void {
  res.clearCookie(ACCESS_COOKIE, { ...base(config), path: "/" });
  res.clearCookie(REFRESH_COOKIE, { ...base(config), path: REFRESH_PATH });
}
