// Sign-in with e-mail and password (Auth.js credentials, JWT sessions). The token carries only the
// user id: role and active flag are read from the database on every request (lib/server/dal.ts),
// so a role change or a deactivation takes effect at once.
import "next-auth/jwt";
import NextAuth, { CredentialsSignin, type DefaultSession } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { authConfig } from "./auth.config";
import { clientAddress } from "./lib/server/request";
import { checkCredentials } from "./lib/server/sign-in";
import { signInSchema } from "./lib/validation/auth";

declare module "next-auth" {
  interface Session {
    /** issuedAt: the token's "iat", seconds since the epoch. */
    user: { id: string; issuedAt?: number } & DefaultSession["user"];
  }
}

class TooManyAttempts extends CredentialsSignin {
  code = "too_many_attempts";
}

export const { handlers, auth, signIn, signOut } = NextAuth({
  ...authConfig,
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
