// The studio's side of the solve worker: every change is posted at once, only the newest request's
// replies get through, and a worker stuck on a stale solve is replaced (components/studio/solver-client.ts).
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { SolverClient, STALE_WORKER_MS } from "@/components/studio/solver-client";
import type { SolveReply, SolveRequest } from "@/components/studio/solve-worker";

/** Stands in for the Web Worker: records what it was sent and replies when told to. */
class FakeWorker {
  sent: SolveRequest[] = [];
  terminated = false;
  onmessage: ((event: MessageEvent<SolveReply>) => void) | null = null;
  onerror: (() => void) | null = null;
  postMessage(request: SolveRequest) {
    this.sent.push(request);
  }
  terminate() {
    this.terminated = true;
  }
  reply(reply: SolveReply) {
    this.onmessage?.({ data: reply } as MessageEvent<SolveReply>);
  }
}

const geometryReply = (id: number) => ({ id, stage: "geometry", ok: true, geometry: { specHash: `h${id}` }, ms: 1 }) as unknown as SolveReply;
const checkReply = (id: number) => ({ id, stage: "check", ok: true, check: { check: {}, warnings: [] }, ms: 1 }) as unknown as SolveReply;

let workers: FakeWorker[];
let client: SolverClient;
beforeEach(() => {
  vi.useFakeTimers({ toFake: ["setTimeout", "clearTimeout", "performance"] });
  workers = [];
  client = new SolverClient(() => {
    const w = new FakeWorker();
    workers.push(w);
    return w as unknown as Worker;
  });
});
afterEach(() => {
  client.dispose();
  vi.useRealTimers();
});

describe("SolverClient", () => {
  it("posts each spec at once and passes on only the newest request's replies", () => {
    const got: SolveReply[] = [];
    client.request({ n: 1 }, (r) => got.push(r));
    client.request({ n: 2 }, (r) => got.push(r));
    expect(workers).toHaveLength(1);
    expect(workers[0].sent.map((s) => s.spec)).toEqual([{ n: 1 }, { n: 2 }]);
    const [first, second] = workers[0].sent.map((s) => s.id);
    workers[0].reply(geometryReply(first));
    expect(got, "a reply for an overtaken request is dropped").toEqual([]);
    workers[0].reply(geometryReply(second));
    workers[0].reply(checkReply(second));
    expect(got.map((r) => [r.id, r.stage])).toEqual([
      [second, "geometry"],
      [second, "check"],
    ]);
  });

  it("keeps a worker that is answering, and replaces one gone quiet on a stale solve", () => {
    client.request({ n: 1 }, () => {});
    const w = workers[0];
    // Busy with the first request: the second waits behind it while the worker keeps talking.
    client.request({ n: 2 }, () => {});
    vi.advanceTimersByTime(STALE_WORKER_MS - 50);
    w.reply(geometryReply(w.sent[0].id));
    vi.advanceTimersByTime(STALE_WORKER_MS - 100);
    expect(w.terminated).toBe(false);
    // Then silence (the stale request's check runs long): the newest request moves to a fresh worker.
    vi.advanceTimersByTime(2 * STALE_WORKER_MS);
    expect(w.terminated).toBe(true);
    expect(workers).toHaveLength(2);
    expect(workers[1].sent).toEqual([w.sent[1]]);
  });

  it("never restarts an idle worker, however long a single solve takes", () => {
    client.request({ n: 1 }, () => {});
    vi.advanceTimersByTime(10 * STALE_WORKER_MS);
    expect(workers[0].terminated).toBe(false);
    expect(workers).toHaveLength(1);
  });
});
