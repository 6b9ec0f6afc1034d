import "server-only";
// Ticks on the assembly sheet: a part or a joint of the cut plan, installed (or not after all),
// each written to the build log with the part ids it concerns.
import { installState, insertTick } from "@/db/queries/build-log";
import { SERVER_SOLVE_DEADLINE_MS } from "@/lib/validation/limits";
import { jobContext } from "./cut-plans";
import type { requireSheetAccess } from "./assembly";
import { AppError } from "./errors";
import { runTask } from "./pool";

type SheetAccess = Awaited<ReturnType<typeof requireSheetAccess>>;

/** What can be ticked on the plan's sheet: every part id, then every joint ("T01/T02"). */
export async function tickItems(access: SheetAccess): Promise<string[]> {
  const ctx = await jobContext(access.plan, access.revision, access.designName);
  return runTask("tickItems", ctx, { deadlineMs: SERVER_SOLVE_DEADLINE_MS });
}

export async function ticksOf(access: SheetAccess) {
  const [items, state] = await Promise.all([tickItems(access), installState(access.projectId, access.plan.id)]);
  const done = new Set(state.filter((s) => s.done).map((s) => s.item));
  return {
    items: items.map((item) => ({ item, done: done.has(item), ...(state.find((s) => s.item === item) ?? {}) })),
    installed: items.filter((i) => done.has(i)).length,
    total: items.length,
  };
}

export async function tick(access: SheetAccess, input: { item: string; done: boolean }) {
  if (!(access.canManage || access.memberRole === "installer"))
    throw new AppError("forbidden", "Only the crew, the shop or an admin tick parts as installed.");
  const items = await tickItems(access);
  const item = input.item.toUpperCase();
  if (!items.includes(item))
    throw new AppError("bad_request", `${input.item} is not a part or a joint of this cut plan.`, {
      item: ["Not on this sheet."],
    });
  const id = await insertTick(access.user, access.projectId, access.plan.id, {
    item,
    done: input.done,
    what: item.includes("/") ? `the joint ${item}` : `part ${item}`,
  });
  return { id, ...(await ticksOf(access)) };
}
