// Bad input gets a clear message or status, and nothing is written.
import { count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import * as projectsRoute from "@/app/api/projects/route";
import * as projectRoute from "@/app/api/projects/[id]/route";
import * as membersRoute from "@/app/api/projects/[id]/members/route";
import * as memberRoute from "@/app/api/projects/[id]/members/[memberId]/route";
import { pool, db } from "@/db";
import { projects, users } from "@/db/schema";
import { addMemberAction } from "@/lib/actions/projects";
import { createUserAction } from "@/lib/actions/users";
import { addMembership, auditCount, makeProject, makeUser, membershipExists, runTag } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

let adminId = 0;
let fabricatorId = 0;
let projectId = 0;
let otherProjectId = 0;
let otherMemberId = 0;

beforeAll(async () => {
  adminId = (await makeUser("admin")).id;
  fabricatorId = (await makeUser("fabricator")).id;
  const client = await makeUser("client");
  projectId = await makeProject("Bad input project", [{ userId: fabricatorId, role: "fabricator" }]);
  otherProjectId = await makeProject("Other project", []);
  otherMemberId = await addMembership(otherProjectId, client.id, "client");
});

afterAll(async () => {
  await pool.end();
});

const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });
const form = (values: Record<string, string | number>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, String(v));
  return f;
};
const userCount = async () => (await db.select({ n: count() }).from(users))[0].n;

describe("server actions keep nothing from a bad form, and say why", () => {
  it("a malformed e-mail", async () => {
    actAs(adminId);
    const before = [await userCount(), await auditCount()];
    const state = await createUserAction(
      {},
      form({ email: "not-an-address", name: "Someone", role: "client", password: "long-enough-pw" }),
    );
    expect(state.ok).toBe(false);
    expect(state.status).toBe(400);
    expect(state.fields?.email).toEqual(["That is not an e-mail address."]);
    expect(state.values?.email, "what was typed comes back to the form").toBe("not-an-address");
    expect(state.values?.password, "passwords are never sent back").toBeUndefined();
    expect([await userCount(), await auditCount()]).toEqual(before);
  });

  it("an over-long name", async () => {
    actAs(adminId);
    const before = await userCount();
    const state = await createUserAction(
      {},
      form({ email: `long.${runTag}@example.test`, name: "x".repeat(121), role: "client", password: "long-enough-pw" }),
    );
    expect(state.status).toBe(400);
    expect(state.fields?.name).toEqual(["A name has at most 120 characters."]);
    expect(await userCount()).toBe(before);
  });

  it("an e-mail already in use", async () => {
    actAs(adminId);
    const state = await createUserAction(
      {},
      form({ email: "admin@example.test", name: "Copy", role: "client", password: "long-enough-pw" }),
    );
    expect(state.status).toBe(409);
    expect(state.fields?.email).toEqual(["Already in use."]);
  });

  it("a short password", async () => {
    actAs(adminId);
    const state = await createUserAction(
      {},
      form({ email: `short.${runTag}@example.test`, name: "Shorty", role: "client", password: "short" }),
    );
    expect(state.status).toBe(400);
    expect(state.fields?.password?.[0]).toMatch(/at least 10 characters/);
  });

  it("a member whose role does not match their account", async () => {
    actAs(fabricatorId);
    const installer = await makeUser("installer");
    const before = await auditCount();
    const state = await addMemberAction({}, form({ projectId, userId: installer.id, role: "client" }));
    expect(state.status).toBe(400);
    expect(state.fields?.role?.[0]).toMatch(/installer/);
    expect(await auditCount()).toBe(before);
  });
});

describe("route handlers answer bad requests with one error shape", () => {
  it("a member id from another project is not found here, and stays where it is", async () => {
    actAs(adminId);
    const before = await auditCount();
    const res = await memberRoute.DELETE(
      new Request("http://t/x", { method: "DELETE" }),
      ctx({ id: String(projectId), memberId: String(otherMemberId) }),
    );
    expect(res.status).toBe(404);
    expect(await res.json()).toEqual({ status: 404, message: "That person is not a member of this project." });
    expect(await membershipExists(otherMemberId)).toBe(true);
    expect(await auditCount()).toBe(before);
  });

  it("the same for a role change", async () => {
    actAs(fabricatorId);
    const res = await memberRoute.PATCH(
      new Request("http://t/x", { method: "PATCH", body: JSON.stringify({ role: "client" }) }),
      ctx({ id: String(projectId), memberId: String(otherMemberId) }),
    );
    expect(res.status).toBe(404);
  });

  it("a body that is not JSON", async () => {
    actAs(adminId);
    const res = await projectsRoute.POST(new Request("http://t/x", { method: "POST", body: "{name:" }), ctx({}));
    expect(res.status).toBe(400);
    expect((await res.json()).message).toBe("The request body is not valid JSON.");
  });

  it("a body over the size limit", async () => {
    actAs(adminId);
    const before = (await db.select({ n: count() }).from(projects))[0].n;
    const res = await projectsRoute.POST(
      new Request("http://t/x", { method: "POST", body: JSON.stringify({ name: "x".repeat(70_000) }) }),
      ctx({}),
    );
    expect(res.status).toBe(413);
    expect((await db.select({ n: count() }).from(projects))[0].n).toBe(before);
  });

  it("a streamed body with no content-length stops at the limit, without reading the rest", async () => {
    actAs(adminId);
    const before = (await db.select({ n: count() }).from(projects))[0].n;
    // An endless body, 16 KiB a chunk: the handler must stop reading soon after the 64 KiB limit.
    let pulled = 0;
    let cancelled = false;
    const chunk = new TextEncoder().encode("x".repeat(16 * 1024));
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled += chunk.byteLength;
        controller.enqueue(chunk);
      },
      cancel() {
        cancelled = true;
      },
    });
    const request = new Request("http://t/x", { method: "POST", body, duplex: "half" } as RequestInit);
    expect(request.headers.get("content-length")).toBeNull();
    const res = await projectsRoute.POST(request, ctx({}));
    expect(res.status).toBe(413);
    expect(cancelled).toBe(true);
    expect(pulled).toBeLessThan(1024 * 1024);
    expect((await db.select({ n: count() }).from(projects))[0].n).toBe(before);
  });

  it("an over-long project name names the field", async () => {
    actAs(adminId);
    const res = await projectsRoute.POST(
      new Request("http://t/x", { method: "POST", body: JSON.stringify({ name: "x".repeat(161) }) }),
      ctx({}),
    );
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.status).toBe(400);
    expect(body.fields.name).toEqual(["A project name has at most 160 characters."]);
  });

  it("a status that does not exist", async () => {
    actAs(adminId);
    const res = await projectRoute.PATCH(
      new Request("http://t/x", { method: "PATCH", body: JSON.stringify({ status: "finished" }) }),
      ctx({ id: String(projectId) }),
    );
    expect(res.status).toBe(400);
    expect((await res.json()).fields.status).toEqual(["Choose one of the statuses."]);
  });

  it("ids that are not ids are not found", async () => {
    actAs(adminId);
    for (const id of ["abc", "0", "-1", "1.5", "99999999999", String(otherProjectId + 100000)]) {
      const res = await projectRoute.GET(new Request("http://t/x"), ctx({ id }));
      expect(res.status, `id ${id}`).toBe(404);
    }
  });

  it("adding the same person twice is a conflict", async () => {
    actAs(adminId);
    const res = await membersRoute.POST(
      new Request("http://t/x", { method: "POST", body: JSON.stringify({ userId: fabricatorId, role: "fabricator" }) }),
      ctx({ id: String(projectId) }),
    );
    expect(res.status).toBe(409);
  });

  it("a deactivated account counts as signed out", async () => {
    const gone = await makeUser("fabricator", "gone");
    await db.update(users).set({ active: false }).where(eq(users.id, gone.id));
    actAs(gone.id);
    const res = await projectsRoute.GET(new Request("http://t/x"), ctx({}));
    expect(res.status).toBe(401);
  });
});
