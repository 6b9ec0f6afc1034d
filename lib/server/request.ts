import "server-only";
// What the app records of where a request came from. Behind a proxy the first X-Forwarded-For
// address is the caller's (RFC 7239 §5.2 describes the same idea for the standard Forwarded header).

export function clientAddress(request: Request | undefined): string {
  const forwarded = request?.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return (forwarded || request?.headers.get("x-real-ip") || "unknown").slice(0, 64);
}

export function userAgent(request: Request | undefined): string {
  return (request?.headers.get("user-agent") ?? "unknown").slice(0, 500);
}

/** The app's own address for links in e-mails: APP_URL, set by npm start and npm test. */
export function appUrl(path: string): string {
  const base = (process.env.APP_URL ?? process.env.AUTH_URL ?? "http://127.0.0.1:3000").replace(/\/+$/, "");
  return `${base}${path}`;
}
