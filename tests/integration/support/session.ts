// Integration tests call route handlers and server actions in-process, as the person a test names.
// Only Auth.js's `auth()` is replaced (it would read the request cookie); everything behind it —
// the data-access layer, validation, queries — is the real code against the real MariaDB.
// Each test file registers the mocks with:
//   vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
//   vi.mock("next/cache", async () => (await import("./support/session")).mockCache);
const state = {
  userId: null as number | null,
  signedInAt: undefined as number | undefined,
  sessionId: undefined as string | undefined,
};

/**
 * Calls from now on come from this user; `signedInAt` is when the session signed in (seconds,
 * default a minute ago) and `sessionId` the session's own id (none by default).
 */
export function actAs(userId: number | null, signedInAt?: number, sessionId?: string) {
  state.userId = userId;
  state.signedInAt = signedInAt;
  state.sessionId = sessionId;
}

export const mockAuth = {
  auth: async () =>
    state.userId
      ? {
          user: {
            id: String(state.userId),
            signedInAt: state.signedInAt ?? Math.floor(Date.now() / 1000) - 60,
            sessionId: state.sessionId,
          },
          expires: "2999-01-01T00:00:00.000Z",
        }
      : null,
  signIn: async () => undefined,
  signOut: async () => undefined,
  handlers: {},
};

// revalidatePath needs Next's request store, which does not exist outside the server.
export const mockCache = { revalidatePath: () => undefined, revalidateTag: () => undefined };
