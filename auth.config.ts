// Auth.js settings apart from the credentials provider: JWT sessions that carry only the user id.
import type { NextAuthConfig } from "next-auth";

export const authConfig = {
  pages: { signIn: "/login" },
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  callbacks: {
    jwt({ token, user }) {
      if (user?.id) token.sub = user.id;
      return token;
    },
    session({ session, token }) {
      if (token.sub) session.user.id = token.sub;
      // When the token was issued, so a password change can end the sessions that came before it.
      if (typeof token.iat === "number") (session.user as { issuedAt?: number }).issuedAt = token.iat;
      return session;
    },
  },
  providers: [],
} satisfies NextAuthConfig;
