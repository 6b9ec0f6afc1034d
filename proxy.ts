// Early redirect to the sign-in page for visitors without a session cookie. This is only the
// optimistic check Next's authentication guide describes: it reads no token and decides nothing
// else. Access is checked fully by lib/server/dal.ts in every page, action and route handler.
// (Running Auth.js itself here would re-issue the session cookie on every request, including the
// sign-out request, which would undo the sign-out.)
import { NextResponse, type NextRequest } from "next/server";

const PUBLIC_PATHS = new Set(["/login"]);
const SESSION_COOKIE_PREFIXES = ["authjs.session-token", "__Secure-authjs.session-token"];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (PUBLIC_PATHS.has(pathname)) return NextResponse.next();
  const hasSession = request.cookies.getAll().some((c) => SESSION_COOKIE_PREFIXES.some((p) => c.name.startsWith(p)));
  if (hasSession) return NextResponse.next();
  const signIn = new URL("/login", request.url);
  signIn.searchParams.set("callbackUrl", pathname + search);
  return NextResponse.redirect(signIn);
}

export const config = {
  matcher: ["/((?!api|_next/static|_next/image|favicon.ico|.*\\.(?:png|svg|woff2)$).*)"],
};
