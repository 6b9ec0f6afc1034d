// Auth.js settings apart from the credentials provider: JWT sessions that carry only the user id,
// the session's own id and when its holder signed in.
import type { NextAuthConfig } from "next-auth";
import { SESSION_MAX_AGE, SESSION_UPDATE_AGE } from "./lib/validation/limits";

export const authConfig = {
  pages: { signIn: "/login" },
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE, updateAge: SESSION_UPDATE_AGE },
  callbacks: {
    jwt({ token, user }) {
      if (user?.id) {
        token.sub = user.id;
        // Kept through every renewal (a renewed token gets a new "iat"): the session's id, which
        // signing out ends for good, and the sign-in time a password change is compared with.
        token.sid = crypto.randomUUID();
        token.signedInAt = Math.floor(Date.now() / 1000);
      }
      return token;
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      const signedInAt = typeof token.signedInAt === "number" ? token.signedInAt : token.iat;
      if (typeof signedInAt === "number") session.user.signedInAt = signedInAt;
      if (typeof token.sid === "string") session.user.sessionId = token.sid;
      return session;
    },
  },
  providers: [],
} satisfies NextAuthConfig;
