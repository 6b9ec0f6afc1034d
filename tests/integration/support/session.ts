// Integration tests call route handlers and server actions in-process, as the person a test names.
// Only Auth.js's `auth()` is replaced (it would read the request cookie); everything behind it —
// the data-access layer, validation, queries — is the real code against the real MariaDB.
// Each test file registers the mocks with:
//   vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
//   vi.mock("next/cache", async () => (await import("./support/session")).mockCache);
const state = { userId: null as number | null, issuedAt: undefined as number | undefined };

/** Calls from now on come from this user; `issuedAt` is the session token's "iat" (seconds), default a minute ago. */
export function actAs(userId: number | null, issuedAt?: number) {
  state.userId = userId;
  state.issuedAt = issuedAt;
}

export const mockAuth = {
  auth: async () =>
    state.userId
      ? {
          user: { id: String(state.userId), issuedAt: state.issuedAt ?? Math.floor(Date.now() / 1000) - 60 },
          expires: "2999-01-01T00:00:00.000Z",
        }
      : null,
  signIn: async () => undefined,
  signOut: async () => undefined,
  handlers: {},
};

// revalidatePath needs Next's request store, which does not exist outside the server.
export const mockCache = { revalidatePath: () => undefined, revalidateTag: () => undefined };
