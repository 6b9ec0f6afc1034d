import "server-only";
import { headers } from "next/headers";
// What the app records of where a request came from. Behind a proxy the first X-Forwarded-For
// address is the caller's (RFC 7239 §5.2 describes the same idea for the standard Forwarded header).

export function clientAddress(request: Request | undefined): string {
  const forwarded = request?.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return (forwarded || request?.headers.get("x-real-ip") || "unknown").slice(0, 64);
}

export function userAgent(request: Request | undefined): string {
  return (request?.headers.get("user-agent") ?? "unknown").slice(0, 500);
}

/** The caller's address inside a server action (no Request object there). */
export async function clientAddressFromHeaders(): Promise<string> {
  const h = await headers();
  return clientAddress(new Request("http://localhost/", { headers: h }));
}

/**
 * An absolute link for an e-mail sent while answering a request: APP_URL when it is set, else the
 * address the request came to (X-Forwarded-Proto / Host, as a proxy passes them).
 */
export async function linkFromRequest(path: string): Promise<string> {
  const configured = process.env.APP_URL ?? process.env.AUTH_URL;
  if (configured) return `${configured.replace(/\/+$/, "")}${path}`;
  const h = await headers();
  const host = h.get("x-forwarded-host") ?? h.get("host");
  if (!host) return appUrl(path);
  const proto = (h.get("x-forwarded-proto") ?? "http").split(",")[0].trim();
  return `${proto === "https" ? "https" : "http"}://${host}${path}`;
}

/** The app's own address for links in e-mails: APP_URL, set by npm start and npm test. */
export function appUrl(path: string): string {
  const base = (process.env.APP_URL ?? process.env.AUTH_URL ?? "http://127.0.0.1:3000").replace(/\/+$/, "");
  return `${base}${path}`;
}
