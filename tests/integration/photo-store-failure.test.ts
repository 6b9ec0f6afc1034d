// The object store dying in the middle of an upload leaves no row behind: the app talks to a store
// of this test's own (scripts/fakes/object-store.mjs) through a relay that cuts every connection and
// kills the store once part of the upload has gone through.
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import net from "node:net";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { count } from "drizzle-orm";
import * as logRoute from "@/app/api/projects/[id]/log/route";
import { db, pool } from "@/db";
import { buildLogEntries, buildLogPhotos } from "@/db/schema";
import { cameraJpeg } from "../support/images";
import { makeCallers, type CallerIds } from "./support/callers";
import { auditCount } from "./support/fixtures";
import { actAs } from "./support/session";

vi.mock("@/auth", async () => (await import("./support/session")).mockAuth);
vi.mock("next/cache", async () => (await import("./support/session")).mockCache);

let ids: CallerIds;
let projectId = 0;
let store: ChildProcess;
let relay: net.Server;
const sockets = new Set<net.Socket>();
let forwarded = 0;
let cutAfter = Infinity;

function freePort(): Promise<number> {
  return new Promise((r) => {
    const s = net.createServer().listen(0, "127.0.0.1", () => {
      const p = (s.address() as net.AddressInfo).port;
      s.close(() => r(p));
    });
  });
}

/** Cuts every connection and stops the store: what a crash of the store looks like from the app. */
function killStore() {
  for (const s of sockets) s.destroy();
  relay.close();
  store.kill("SIGKILL");
}

beforeAll(async () => {
  const storePort = await freePort();
  const relayPort = await freePort();
  store = spawn(process.execPath, [resolve("scripts/fakes/object-store.mjs")], {
    env: { ...process.env, S3_PORT: String(storePort), S3_DATA_DIR: mkdtempSync(join(tmpdir(), "axlewright-s3-")) },
    stdio: "ignore",
  });
  relay = net.createServer((client) => {
    const upstream = net.connect(storePort, "127.0.0.1");
    sockets.add(client).add(upstream);
    client.on("data", (chunk) => {
      forwarded += chunk.length;
      upstream.write(chunk);
      if (forwarded > cutAfter) killStore();
    });
    upstream.on("data", (chunk) => client.write(chunk));
    for (const s of [client, upstream])
      s.on("error", () => undefined).on("close", () => (client.destroy(), upstream.destroy()));
  });
  await new Promise<void>((r) => relay.listen(relayPort, "127.0.0.1", () => r()));
  for (
    let i = 0;
    i < 100 &&
    !(await new Promise((r) =>
      net
        .connect(storePort, "127.0.0.1")
        .once("connect", function (this: net.Socket) {
          this.destroy();
          r(true);
        })
        .once("error", () => r(false)),
    ));
    i++
  )
    await new Promise((r) => setTimeout(r, 100));
  // The app's storage module reads these on first use (this file has its own module graph).
  process.env.S3_ENDPOINT = `http://127.0.0.1:${relayPort}`;
  ({ ids, projectId } = await makeCallers("Store failure"));
});

afterAll(async () => {
  killStore();
  await pool.end();
});

describe("the store dying mid-upload", () => {
  it("answers 503 with a plain message and leaves no entry and no photo row", async () => {
    const photo = await cameraJpeg();
    // Let the first photo (and a little more) through, then kill the store while the rest is on its way.
    cutAfter = photo.length + 2000;
    const rows = async () =>
      Promise.all([
        auditCount(),
        ...[buildLogEntries, buildLogPhotos].map(async (t) => (await db.select({ n: count() }).from(t))[0].n),
      ]);
    const before = await rows();
    const form = new FormData();
    form.set("kind", "installed");
    form.set("text", "Three photos of the joints");
    for (let i = 0; i < 3; i++)
      form.append("photos[]", new File([new Uint8Array(photo)], `joint-${i}.jpg`, { type: "image/jpeg" }));
    actAs(ids["installer member"]);
    const res = await logRoute.POST(new Request("http://test.local/api/log", { method: "POST", body: form }), {
      params: Promise.resolve({ id: String(projectId) }),
    });
    const body = await res.json();
    expect(forwarded, "part of the upload reached the store before it died").toBeGreaterThan(photo.length);
    expect(res.status).toBe(503);
    expect(body.message).toMatch(/photo store did not answer; nothing was saved/);
    expect(await rows()).toEqual(before);
  });
});
