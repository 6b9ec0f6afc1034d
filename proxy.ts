// Early redirect to the sign-in page for visitors without a session. It decides nothing else:
// access is checked again, fully, by lib/server/dal.ts in every page, action and route handler.
import NextAuth from "next-auth";
import { authConfig } from "./auth.config";

const { auth } = NextAuth(authConfig);
export const proxy = auth;

export const config = {
  matcher: ["/((?!api|_next/static|_next/image|fonts|favicon.ico|.*\\.(?:png|svg|woff2)$).*)"],
};
