// The part of the Auth.js set-up that needs no database, so proxy.ts can use it. It only redirects
// early; every page, action and route handler still asks lib/server/dal.ts who is asking.
import type { NextAuthConfig } from "next-auth";

const PUBLIC_PATHS = ["/login"];

export const authConfig = {
  pages: { signIn: "/login" },
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  callbacks: {
    authorized({ auth, request: { nextUrl } }) {
      if (PUBLIC_PATHS.includes(nextUrl.pathname)) return true;
      return !!auth?.user;
    },
    jwt({ token, user }) {
      if (user?.id) token.sub = user.id;
      return token;
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      return session;
    },
  },
  providers: [],
} satisfies NextAuthConfig;
