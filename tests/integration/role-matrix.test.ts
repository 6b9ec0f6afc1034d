// The role matrix: every route handler and server action of the foundation, called as each kind of
// caller, must answer exactly the status in the table — and write nothing when it refuses.
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import * as projectsRoute from "@/app/api/projects/route";
import * as projectRoute from "@/app/api/projects/[id]/route";
import * as membersRoute from "@/app/api/projects/[id]/members/route";
import * as memberRoute from "@/app/api/projects/[id]/members/[memberId]/route";
import * as solveRoute from "@/app/api/solve/route";
import {
  addMemberAction,
  createProjectAction,
  removeMemberAction,
  setProjectSiteAction,
  updateProjectAction,
} from "@/lib/actions/projects";
import { changeRoleAction, createUserAction, setActiveAction } from "@/lib/actions/users";
import {
  saveMachineAction,
  saveMaterialAction,
  saveStockSheetAction,
  setShopRowActiveAction,
} from "@/lib/actions/shop";
import type { ActionState } from "@/lib/server/action";
import { db, pool } from "@/db";
import { materials } from "@/db/schema";
import { actAs } from "./support/session";
import { CALLERS, projectManage, projectView as viewTable, type Caller } from "./support/callers";
import { addMembership, auditCount, makeProject, makeUser, runTag } from "./support/fixtures";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

const ids = {} as Record<Exclude<Caller, "anonymous">, number>;
let projectId = 0;

beforeAll(async () => {
  ids.admin = (await makeUser("admin")).id;
  for (const role of ["fabricator", "client", "installer"] as const) {
    ids[`${role} member`] = (await makeUser(role, `${role}-member`)).id;
    ids[`${role} non-member`] = (await makeUser(role, `${role}-outsider`)).id;
  }
  projectId = await makeProject("Matrix project", [
    { userId: ids["fabricator member"], role: "fabricator" },
    { userId: ids["client member"], role: "client" },
    { userId: ids["installer member"], role: "installer" },
  ]);
});

afterAll(async () => {
  await pool.end();
});

const json = (method: string, body?: unknown) =>
  new Request("http://test.local/api", {
    method,
    headers: { "content-type": "application/json" },
    body: body === undefined ? undefined : JSON.stringify(body),
  });

const ctx = <P>(params: P) => ({ params: Promise.resolve(params) });

const form = (values: Record<string, string | number>) => {
  const f = new FormData();
  for (const [k, v] of Object.entries(values)) f.set(k, String(v));
  return f;
};

/** The status an action's answer stands for: its error status, 200 for success or a redirect. */
async function actionStatus(run: () => Promise<ActionState>): Promise<number> {
  try {
    const state = await run();
    return state.ok ? 200 : (state.status ?? 500);
  } catch (error) {
    if (
      error instanceof Error &&
      "digest" in error &&
      String((error as { digest: unknown }).digest).startsWith("NEXT_REDIRECT")
    )
      return 200;
    throw error;
  }
}

interface Case {
  name: string;
  /** Runs the call once; `fresh` makes a new target so a successful call does not spoil the next. */
  call: () => Promise<number>;
  expect: Record<Caller, number>;
}

const everyoneSignedIn = (status: number): Record<Caller, number> => ({
  anonymous: 401,
  admin: status,
  "fabricator member": status,
  "fabricator non-member": status,
  "client member": status,
  "client non-member": status,
  "installer member": status,
  "installer non-member": status,
});
const shopOnly = (status: number): Record<Caller, number> => ({
  anonymous: 401,
  admin: status,
  "fabricator member": status,
  "fabricator non-member": status,
  "client member": 403,
  "client non-member": 403,
  "installer member": 403,
  "installer non-member": 403,
});
const adminOnly = (status: number): Record<Caller, number> => ({
  anonymous: 401,
  admin: status,
  "fabricator member": 403,
  "fabricator non-member": 403,
  "client member": 403,
  "client non-member": 403,
  "installer member": 403,
  "installer non-member": 403,
});
const projectView = viewTable(200);

/** A throw-away installer and their membership of the matrix project, for calls that change or remove one. */
async function throwawayMember(): Promise<number> {
  const user = await makeUser("installer", "throwaway");
  return addMembership(projectId, user.id, "installer");
}

let seq = 0;
const CASES: Case[] = [
  {
    name: "GET /api/projects",
    expect: everyoneSignedIn(200),
    call: async () => (await projectsRoute.GET(json("GET"), ctx({}))).status,
  },
  {
    name: "POST /api/projects",
    expect: shopOnly(201),
    call: async () =>
      (await projectsRoute.POST(json("POST", { name: `Made ${runTag} ${++seq}`, site: "Bench" }), ctx({}))).status,
  },
  {
    name: "GET /api/projects/[id]",
    expect: projectView,
    call: async () => (await projectRoute.GET(json("GET"), ctx({ id: String(projectId) }))).status,
  },
  {
    name: "PATCH /api/projects/[id]",
    expect: projectManage(200),
    call: async () =>
      (await projectRoute.PATCH(json("PATCH", { site: `Bench ${++seq}` }), ctx({ id: String(projectId) }))).status,
  },
  {
    name: "GET /api/projects/[id]/members",
    expect: projectView,
    call: async () => (await membersRoute.GET(json("GET"), ctx({ id: String(projectId) }))).status,
  },
  {
    name: "POST /api/projects/[id]/members",
    expect: projectManage(201),
    call: async () => {
      const newcomer = await makeUser("installer", "newcomer");
      return (
        await membersRoute.POST(
          json("POST", { userId: newcomer.id, role: "installer" }),
          ctx({ id: String(projectId) }),
        )
      ).status;
    },
  },
  {
    name: "PATCH /api/projects/[id]/members/[memberId]",
    expect: projectManage(200),
    call: async () => {
      const memberId = await throwawayMember();
      return (
        await memberRoute.PATCH(
          json("PATCH", { role: "installer" }),
          ctx({ id: String(projectId), memberId: String(memberId) }),
        )
      ).status;
    },
  },
  {
    name: "DELETE /api/projects/[id]/members/[memberId]",
    expect: projectManage(200),
    call: async () => {
      const memberId = await throwawayMember();
      return (await memberRoute.DELETE(json("DELETE"), ctx({ id: String(projectId), memberId: String(memberId) })))
        .status;
    },
  },
  {
    name: "POST /api/solve",
    expect: everyoneSignedIn(200),
    call: async () =>
      (
        await solveRoute.POST(
          json("POST", { mode: "track-for-wheel", units: "mm", wheel: { kind: "polygon", sides: 4, side: 400 } }),
          ctx({}),
        )
      ).status,
  },
  {
    name: "action createProject",
    expect: shopOnly(200),
    call: () =>
      actionStatus(() =>
        createProjectAction(
          {},
          form({ name: `Action-made ${runTag} ${++seq}`, site: "Bench", clientOrganisation: "" }),
        ),
      ),
  },
  {
    name: "action updateProject",
    expect: projectManage(200),
    call: () => actionStatus(() => updateProjectAction({}, form({ projectId, site: `Bench ${++seq}` }))),
  },
  {
    name: "action setProjectSite",
    expect: projectManage(200),
    call: () =>
      actionStatus(() =>
        setProjectSiteAction(
          {},
          form({ projectId, siteRunLengthMm: 1000 + ++seq, trackLines: 2, stockSheetId: "", machineId: "" }),
        ),
      ),
  },
  {
    name: "action addMember",
    expect: projectManage(200),
    call: async () => {
      const newcomer = await makeUser("client", "newcomer");
      return actionStatus(() => addMemberAction({}, form({ projectId, userId: newcomer.id, role: "client" })));
    },
  },
  {
    name: "action removeMember",
    expect: projectManage(200),
    call: async () => {
      const memberId = await throwawayMember();
      return actionStatus(() => removeMemberAction({}, form({ projectId, memberId })));
    },
  },
  {
    name: "action createUser",
    expect: adminOnly(200),
    call: () =>
      actionStatus(() =>
        createUserAction(
          {},
          form({
            email: `new.${runTag}.${++seq}@example.test`,
            name: "New person",
            role: "client",
            password: "a-long-first-password",
          }),
        ),
      ),
  },
  {
    name: "action changeRole",
    expect: adminOnly(200),
    call: async () => {
      const target = await makeUser("client", "role-target");
      return actionStatus(() => changeRoleAction({}, form({ userId: target.id, role: "installer" })));
    },
  },
  {
    name: "action setActive (deactivate)",
    expect: adminOnly(200),
    call: async () => {
      const target = await makeUser("installer", "deactivate-target");
      return actionStatus(() => setActiveAction({}, form({ userId: target.id, active: "false" })));
    },
  },
  // The shop library: admins and fabricators (members of a project or not); nobody else.
  {
    name: "action saveMaterial",
    expect: shopOnly(200),
    call: () => actionStatus(() => saveMaterialAction({}, form(materialForm(`Matrix ply ${runTag} ${++seq}`)))),
  },
  {
    name: "action saveStockSheet",
    expect: shopOnly(200),
    call: async () =>
      actionStatus(async () =>
        saveStockSheetAction(
          {},
          form({
            name: `Matrix sheet ${runTag} ${++seq}`,
            materialId: await libraryMaterialId(),
            lengthMm: 2440,
            widthMm: 1220,
            grain: "length",
            source: "common practice",
            sourceKind: "common-practice",
          }),
        ),
      ),
  },
  {
    name: "action saveMachine",
    expect: shopOnly(200),
    call: () =>
      actionStatus(() =>
        saveMachineAction(
          {},
          form({
            name: `Matrix router ${runTag} ${++seq}`,
            kind: "router",
            kerfMm: 6,
            bedLengthMm: 2500,
            bedWidthMm: 1250,
            minInsideRadiusMm: 3,
            source: "common practice",
            sourceKind: "common-practice",
          }),
        ),
      ),
  },
  {
    name: "action setShopRowActive (retire)",
    expect: shopOnly(200),
    call: async () => {
      const id = await libraryMaterialId();
      return actionStatus(() => setShopRowActiveAction({}, form({ table: "materials", id, active: "false" })));
    },
  },
];

function materialForm(name: string) {
  return {
    name,
    thicknessMm: 18,
    densityKgM3: 680,
    modulusGpa: 7,
    strengthMpa: 40,
    frictionStatic: 0.6,
    frictionKinetic: "",
    frictionPair: "rubber on ply",
    source: "common practice",
    sourceKind: "common-practice",
  };
}

/** A material row of this run's own (made directly, so it costs no audit entry inside a case). */
async function libraryMaterialId(): Promise<number> {
  const [res] = await db.insert(materials).values({
    ...materialForm(`Matrix base ${runTag} ${++seq}`),
    frictionKinetic: null,
    sourceKind: "common-practice",
  });
  return res.insertId;
}

describe.each(CASES)("$name", (c) => {
  it.each(CALLERS)("as %s", async (caller) => {
    actAs(caller === "anonymous" ? null : ids[caller]);
    const before = await auditCount();
    const status = await c.call();
    const after = await auditCount();
    expect(status).toBe(c.expect[caller]);
    const isRead = c.name.startsWith("GET") || c.name === "POST /api/solve";
    if (status >= 400 || isRead) expect(after - before, "a refused call or a read writes nothing").toBe(0);
    else expect(after - before, "a change leaves one audit entry").toBe(1);
  });
});

describe("what each caller sees", () => {
  it("lists only the projects a person belongs to; an admin sees all", async () => {
    const namesFor = async (caller: Exclude<Caller, "anonymous">) => {
      actAs(ids[caller]);
      const body = await (await projectsRoute.GET(json("GET"), ctx({}))).json();
      return (body.projects as { id: number }[]).map((p) => p.id);
    };
    expect(await namesFor("admin")).toContain(projectId);
    expect(await namesFor("client member")).toEqual([projectId]);
    expect(await namesFor("client non-member")).toEqual([]);
    expect(await namesFor("installer non-member")).toEqual([]);
  });
});
