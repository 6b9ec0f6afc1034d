// Next.js calls register() once when a server instance starts: the worker pool's threads are started
// then, so the first solve or download after a deploy does not wait for them (lib/server/pool.ts).
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { warmPool } = await import("@/lib/server/pool");
    void warmPool();
  }
}
