// A further app instance on the same database, object store and build as the one scripts/test.mjs
// started: `next start` on a free loopback port, with the same environment (secrets included, so a
// session signed by one instance is good on the other). It can be killed outright (SIGKILL) and
// started again on its port. What it prints is kept (the last 64 kB), for tests that read its log.
import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import path from "node:path";

const root = path.resolve(import.meta.dirname, "../../..");

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once("error", reject);
    s.listen(0, "127.0.0.1", () => {
      const port = (s.address() as { port: number }).port;
      s.close(() => resolve(port));
    });
  });
}

const KEPT_OUTPUT = 64 * 1024;

export class AppInstance {
  private child: ChildProcess | null = null;
  private printed = "";
  private constructor(
    readonly port: number,
    private readonly extraEnv: Record<string, string>,
  ) {}

  /** What the instance printed (standard output and error), the last 64 kB. */
  get output(): string {
    return this.printed;
  }

  get url(): string {
    return `http://127.0.0.1:${this.port}`;
  }

  /** Starts an instance; `env` adds to (or overrides) the main instance's environment. */
  static async start(env: Record<string, string> = {}): Promise<AppInstance> {
    const instance = new AppInstance(await freePort(), env);
    await instance.run();
    return instance;
  }

  /** Starts (again) on its port and waits for /api/health. */
  async run(): Promise<void> {
    const env = {
      ...process.env,
      NEXT_DIST_DIR: process.env.AXLEWRIGHT_TEST_DIST_DIR ?? ".next-test",
      ...this.extraEnv,
    };
    this.child = spawn(
      process.execPath,
      [path.join(root, "node_modules/next/dist/bin/next"), "start", "-H", "127.0.0.1", "-p", String(this.port)],
      { cwd: root, env, stdio: ["ignore", "pipe", "pipe"] },
    );
    const keep = (chunk: Buffer) => {
      this.printed = (this.printed + chunk.toString()).slice(-KEPT_OUTPUT);
    };
    this.child.stdout!.on("data", keep);
    this.child.stderr!.on("data", keep);
    const deadline = Date.now() + 60_000;
    for (;;) {
      try {
        if ((await fetch(`${this.url}/api/health`)).ok) return;
      } catch {
        // not listening yet
      }
      if (Date.now() > deadline) throw new Error(`the second app instance on ${this.port} did not start`);
      await new Promise((r) => setTimeout(r, 200));
    }
  }

  /** SIGKILL: no shutdown, no chance to finish what it was doing. */
  async kill(): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null) return;
    const exited = new Promise((r) => child.once("exit", r));
    child.kill("SIGKILL");
    await exited;
    this.child = null;
  }
}
