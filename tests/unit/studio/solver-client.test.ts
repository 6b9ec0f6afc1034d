// The studio's side of the solve worker: every change is posted at once, only the newest request's
// replies get through, a worker stuck on a stale solve is replaced, and a request is over after the
// loads stage or a failure (components/studio/solver-client.ts, on components/worker/worker-client.ts).
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { createSolverClient, STALE_WORKER_MS, type SolverClient } from "@/components/studio/solver-client";
import type { SolveReply, SolveRequest } from "@/components/studio/solve-worker";
import type { WorkerEvent } from "@/components/worker/worker-client";
import { fakeWorkers } from "../../support/fake-worker";

const geometryReply = (id: number) =>
  ({ id, stage: "geometry", ok: true, geometry: { specHash: `h${id}` }, ms: 1 }) as unknown as SolveReply;
const checkReply = (id: number) =>
  ({ id, stage: "check", ok: true, check: { check: {}, warnings: [] }, ms: 1 }) as unknown as SolveReply;
const loadsReply = (id: number) => ({ id, stage: "loads", ok: true, loads: null, ms: 1 }) as SolveReply;
const replies = (events: WorkerEvent<SolveReply>[]) => events.flatMap((e) => (e.type === "reply" ? [e.reply] : []));

let workers: ReturnType<typeof fakeWorkers<SolveRequest, SolveReply>>;
let client: SolverClient;
beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "performance"] });
  workers = fakeWorkers<SolveRequest, SolveReply>();
  client = createSolverClient(workers.create);
});
afterEach(() => {
  client.dispose();
  vi.useRealTimers();
});

describe("the studio's solver client", () => {
  it("posts each spec at once and passes on only the newest request's replies", () => {
    const got: WorkerEvent<SolveReply>[] = [];
    client.request({ spec: { n: 1 } }, (e) => got.push(e));
    client.request({ spec: { n: 2 } }, (e) => got.push(e));
    expect(workers.made).toHaveLength(1);
    expect(workers.made[0].sent.map((s) => s.spec)).toEqual([{ n: 1 }, { n: 2 }]);
    const [first, second] = workers.made[0].sent.map((s) => s.id);
    workers.made[0].reply(geometryReply(first));
    expect(got, "a reply for an overtaken request is dropped").toEqual([]);
    workers.made[0].reply(geometryReply(second));
    workers.made[0].reply(checkReply(second));
    expect(replies(got).map((r) => [r.id, r.stage])).toEqual([
      [second, "geometry"],
      [second, "check"],
    ]);
  });

  it("keeps a worker that is answering, and replaces one gone quiet on a stale solve", () => {
    client.request({ spec: { n: 1 } }, () => {});
    const w = workers.made[0];
    // Busy with the first request: the second waits behind it while the worker keeps talking.
    client.request({ spec: { n: 2 } }, () => {});
    vi.advanceTimersByTime(STALE_WORKER_MS - 50);
    w.reply(geometryReply(w.sent[0].id));
    vi.advanceTimersByTime(STALE_WORKER_MS - 100);
    expect(w.terminated).toBe(false);
    // Then silence (the stale request's check runs long): the newest request moves to a fresh worker.
    vi.advanceTimersByTime(2 * STALE_WORKER_MS);
    expect(w.terminated).toBe(true);
    expect(workers.made).toHaveLength(2);
    expect(workers.made[1].sent).toEqual([w.sent[1]]);
  });

  it("never restarts an idle worker, however long a single solve takes", () => {
    client.request({ spec: { n: 1 } }, () => {});
    vi.advanceTimersByTime(10 * STALE_WORKER_MS);
    expect(workers.made[0].terminated).toBe(false);
    expect(workers.made).toHaveLength(1);
  });

  it("counts a request done after its loads stage: a newer one then never replaces the worker", () => {
    client.request({ spec: { n: 1 } }, () => {});
    const w = workers.made[0];
    w.reply(geometryReply(1));
    w.reply(checkReply(1));
    w.reply(loadsReply(1));
    client.request({ spec: { n: 2 } }, () => {});
    vi.advanceTimersByTime(10 * STALE_WORKER_MS);
    expect(w.terminated).toBe(false);
  });

  it("says in plain words when the solver cannot start", () => {
    const got: WorkerEvent<SolveReply>[] = [];
    client.request({ spec: { n: 1 } }, (e) => got.push(e));
    workers.made[0].crash();
    expect(got).toEqual([{ type: "failed", message: "The solver could not start in this browser." }]);
  });
});
