// Integration tests call route handlers and server actions in-process, as the person a test names.
// Only Auth.js's `auth()` is replaced (it would read the request cookie); everything behind it —
// the data-access layer, validation, queries — is the real code against the real MariaDB.
// Each test file registers the mocks with:
//   vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
//   vi.mock("next/cache", async () => (await import("./support/session")).mockCache);
const state = { userId: null as number | null };

export function actAs(userId: number | null) {
  state.userId = userId;
}

export const mockAuth = {
  auth: async () => (state.userId ? { user: { id: String(state.userId) }, expires: "2999-01-01T00:00:00.000Z" } : null),
  signIn: async () => undefined,
  signOut: async () => undefined,
  handlers: {},
};

// revalidatePath needs Next's request store, which does not exist outside the server.
export const mockCache = { revalidatePath: () => undefined, revalidateTag: () => undefined };
