// The one way the pages talk to a Web Worker (components/worker/worker-client.ts), against a fake
// worker: request ids and "the newest request wins", the last reply of a request, the three ways
// of meeting a busy worker, cancel messages, and failures turned into plain messages.
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { WorkerClient, type WorkerEvent } from "@/components/worker/worker-client";
import { fakeWorkers } from "../../support/fake-worker";

interface Reply {
  id: number;
  kind: "progress" | "done";
}
type Sent = { job: string; id: number } | { type: "cancel"; id: number };

let workers: ReturnType<typeof fakeWorkers<Sent, Reply>>;
const clients: WorkerClient<object, Reply>[] = [];
function client(options: Partial<ConstructorParameters<typeof WorkerClient<object, Reply>>[0]> = {}) {
  const c = new WorkerClient<{ job: string }, Reply>({
    create: workers.create,
    crashMessage: "It could not start.",
    isLast: (r) => r.kind === "done",
    ...options,
  });
  clients.push(c);
  return c;
}
const heard = () => {
  const events: WorkerEvent<Reply>[] = [];
  return { events, listen: (e: WorkerEvent<Reply>) => events.push(e) };
};

beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "performance"] });
  workers = fakeWorkers<Sent, Reply>();
});
afterEach(() => {
  clients.splice(0).forEach((c) => c.dispose());
  vi.useRealTimers();
});

describe("WorkerClient", () => {
  it("starts its worker on the first request and numbers the requests", () => {
    const c = client();
    expect(workers.made).toHaveLength(0);
    expect(c.request({ job: "a" }, () => {})).toBe(1);
    expect(c.request({ job: "b" }, () => {})).toBe(2);
    expect(c.current).toBe(2);
    expect(workers.made).toHaveLength(1);
    expect(workers.made[0].sent).toEqual([
      { job: "a", id: 1 },
      { job: "b", id: 2 },
    ]);
  });

  it("passes on only the newest request's replies, up to its last", () => {
    const c = client();
    const old = heard();
    const now = heard();
    c.request({ job: "a" }, old.listen);
    c.request({ job: "b" }, now.listen);
    const w = workers.made[0];
    w.reply({ id: 1, kind: "done" });
    w.reply({ id: 2, kind: "progress" });
    w.reply({ id: 2, kind: "done" });
    w.reply({ id: 2, kind: "done" });
    expect(old.events).toEqual([]);
    expect(now.events, "nothing is heard after a request's last reply").toEqual([
      { type: "reply", reply: { id: 2, kind: "progress" } },
      { type: "reply", reply: { id: 2, kind: "done" } },
    ]);
  });

  it("queues behind a busy worker by default", () => {
    const c = client();
    c.request({ job: "a" }, () => {});
    c.request({ job: "b" }, () => {});
    vi.advanceTimersByTime(60_000);
    expect(workers.made).toHaveLength(1);
    expect(workers.made[0].terminated).toBe(false);
  });

  it("with replaceBusyAfterMs 0, ends a busy worker at once and gives the new request a fresh one", () => {
    const c = client({ replaceBusyAfterMs: 0 });
    c.request({ job: "a" }, () => {});
    const now = heard();
    c.request({ job: "b" }, now.listen);
    expect(workers.made).toHaveLength(2);
    expect(workers.made[0].terminated).toBe(true);
    expect(workers.made[1].sent).toEqual([{ job: "b", id: 2 }]);
    // A late word from the ended worker is not heard.
    workers.made[0].reply({ id: 2, kind: "done" });
    expect(now.events).toEqual([]);
    workers.made[1].reply({ id: 2, kind: "done" });
    expect(now.events).toHaveLength(1);
  });

  it("with replaceBusyAfterMs n, keeps a worker that is talking and replaces one gone quiet", () => {
    const c = client({ replaceBusyAfterMs: 300 });
    c.request({ job: "a" }, () => {});
    c.request({ job: "b" }, () => {});
    const w = workers.made[0];
    vi.advanceTimersByTime(250);
    w.reply({ id: 1, kind: "progress" });
    vi.advanceTimersByTime(200);
    expect(w.terminated).toBe(false);
    vi.advanceTimersByTime(600);
    expect(w.terminated).toBe(true);
    expect(workers.made[1].sent).toEqual([{ job: "b", id: 2 }]);
  });

  it("never replaces an idle worker, however long one request takes", () => {
    const c = client({ replaceBusyAfterMs: 300 });
    c.request({ job: "a" }, () => {});
    vi.advanceTimersByTime(10_000);
    expect(workers.made).toHaveLength(1);
    expect(workers.made[0].terminated).toBe(false);
  });

  it("sends a cancel to the running worker, and still hears the answer it gives", () => {
    const c = client();
    const now = heard();
    c.request({ job: "a" }, now.listen);
    c.send({ type: "cancel", id: c.current });
    expect(workers.made[0].sent.at(-1)).toEqual({ type: "cancel", id: 1 });
    workers.made[0].reply({ id: 1, kind: "done" });
    expect(now.events).toEqual([{ type: "reply", reply: { id: 1, kind: "done" } }]);
  });

  it("turns a worker that cannot start into the plain message, and starts afresh next time", () => {
    const c = client();
    const now = heard();
    c.request({ job: "a" }, now.listen);
    workers.made[0].crash();
    expect(now.events).toEqual([{ type: "failed", message: "It could not start." }]);
    expect(workers.made[0].terminated).toBe(true);
    c.request({ job: "b" }, () => {});
    expect(workers.made).toHaveLength(2);
  });

  it("gives up a request that goes silent, but not one that keeps reporting", () => {
    const c = client({ silenceLimitMs: 1_000, silenceMessage: "It stopped answering." });
    const now = heard();
    c.request({ job: "a" }, now.listen);
    for (let i = 0; i < 5; i++) {
      vi.advanceTimersByTime(800);
      workers.made[0].reply({ id: 1, kind: "progress" });
    }
    expect(now.events.filter((e) => e.type === "failed")).toEqual([]);
    vi.advanceTimersByTime(2_500);
    expect(now.events.at(-1)).toEqual({ type: "failed", message: "It stopped answering." });
    expect(workers.made[0].terminated).toBe(true);
  });

  it("does not time out once the last reply has come", () => {
    const c = client({ silenceLimitMs: 1_000 });
    const now = heard();
    c.request({ job: "a" }, now.listen);
    workers.made[0].reply({ id: 1, kind: "done" });
    vi.advanceTimersByTime(5_000);
    expect(now.events).toHaveLength(1);
    expect(workers.made[0].terminated).toBe(false);
  });

  it("stop ends the worker and drops the request's listener", () => {
    const c = client();
    const now = heard();
    c.request({ job: "a" }, now.listen);
    c.stop();
    expect(workers.made[0].terminated).toBe(true);
    workers.made[0].reply({ id: 1, kind: "done" });
    expect(now.events).toEqual([]);
  });
});
