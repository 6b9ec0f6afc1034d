// Sign-in with e-mail and password (Auth.js credentials, JWT sessions). The token carries only the
// user id: role and active flag are read from the database on every request (lib/server/dal.ts),
// so a role change or a deactivation takes effect at once.
import "next-auth/jwt";
import NextAuth, { CredentialsSignin, type DefaultSession } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { authConfig } from "./auth.config";
import { endSession, isSessionEnded } from "./db/queries/sessions";
import { clientAddress } from "./lib/server/request";
import { checkCredentials } from "./lib/server/sign-in";
import { signInSchema } from "./lib/validation/auth";

declare module "next-auth" {
  interface Session {
    /** signedInAt: seconds since the epoch; sessionId: the session's own id (auth.config.ts). */
    user: { id: string; signedInAt?: number; sessionId?: string } & DefaultSession["user"];
  }
}

declare module "next-auth/jwt" {
  interface JWT {
    sid?: string;
    signedInAt?: number;
  }
}

class TooManyAttempts extends CredentialsSignin {
  code = "too_many_attempts";
}

export const { handlers, auth, signIn, signOut } = NextAuth({
  ...authConfig,
  callbacks: {
    ...authConfig.callbacks,
    // A renewal (GET /api/auth/session) of a session that was signed out gives nothing back, and the
    // browser's cookie is cleared: signing out stays final even if a copy of the token was kept.
    async jwt(params) {
      const token = await authConfig.callbacks.jwt(params);
      if (!params.user && token.sid && (await isSessionEnded(token.sid))) return null;
      return token;
    },
  },
  events: {
    async signOut(message) {
      const token = "token" in message ? message.token : null;
      const userId = Number(token?.sub);
      if (token?.sid && Number.isInteger(userId) && userId > 0) await endSession(token.sid, userId);
    },
  },
  providers: [
    Credentials({
      credentials: { email: {}, password: {} },
      async authorize(raw, request) {
        const parsed = signInSchema.safeParse(raw);
        if (!parsed.success) return null;
        const address = clientAddress(request);
        const outcome = await checkCredentials(parsed.data.email, parsed.data.password, address);
        if (outcome === "rate_limited") throw new TooManyAttempts();
        if (!outcome) return null;
        return { id: String(outcome.id), email: outcome.email, name: outcome.name };
      },
    }),
  ],
});
