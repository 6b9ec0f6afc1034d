// The app's limits in one place: password length, request body sizes, upload sizes and the engine's
// time limits on the server. Plain constants with no imports, so forms in the browser, the route
// handlers and the server's wrappers all read the same figures.

export const PASSWORD_MIN_LENGTH = 10;

/** Poisson's ratio when none is given: 0.3, the usual figure for wood and metals (common practice; the column's default too). */
export const DEFAULT_POISSON = 0.3;

// A project's site figures and a cut plan's run (the project page's "Site and stock", lib/cut/settings.ts):
// the same bounds for both, so the figures a project records always start a cut plan the settings accept.

/** The run on site, mm: from 10 mm to 100 m (a gallery table to a long hall). */
export const RUN_LENGTH_MIN_MM = 10;
export const RUN_LENGTH_MAX_MM = 100_000;
/** Parallel track lines of one run (a trike has 2). */
export const TRACK_LINES_MAX = 16;

// Request bodies, in bytes, counted as they arrive and refused (413) before anything is parsed.

/** Any JSON body without a limit of its own. */
export const DEFAULT_BODY_LIMIT = 64 * 1024;
/** A design spec (new design, draft, revision, /api/solve): an uploaded outline of thousands of points fits. */
export const SPEC_BODY_LIMIT = 512 * 1024;
/** A cut plan's settings and its nest (every placement of every part). */
export const CUT_PLAN_BODY_LIMIT = 512 * 1024;
/** A payment service event; real ones are a few kilobytes. */
export const WEBHOOK_BODY_LIMIT = 256 * 1024;

// Site photos of the build log.

/** One photo: 15 MB. */
export const PHOTO_MAX_BYTES = 15 * 1024 * 1024;
/** Photos on one log entry. */
export const PHOTO_MAX_COUNT = 6;
/** A build-log form: every photo at its largest, plus 1 MB for the text fields and the multipart framing. */
export const LOG_FORM_LIMIT = PHOTO_MAX_COUNT * PHOTO_MAX_BYTES + 1024 * 1024;

// The engine's deadlines on the server (the engine checks them cooperatively and stops with a "timeout" error).

/** POST /api/solve: an interactive solve for whoever asks. */
export const SOLVE_ROUTE_DEADLINE_MS = 5_000;
/** A solve the server runs for itself: saving a revision, a cut plan, a review, a preview, a comparison. */
export const SERVER_SOLVE_DEADLINE_MS = 10_000;

// Waits on the services the server calls: one that does not answer is a clear failure, not a hung request.

/** The payment service (each attempt; the SDK retries once). */
export const PAYMENT_SERVICE_TIMEOUT_MS = 10_000;
/** The object store: connecting, and one whole request (a photo of up to PHOTO_MAX_BYTES). */
export const OBJECT_STORE_CONNECT_TIMEOUT_MS = 3_000;
export const OBJECT_STORE_REQUEST_TIMEOUT_MS = 20_000;

/** A session lasts this long after its last renewal, seconds (auth.config.ts). */
export const SESSION_MAX_AGE = 12 * 60 * 60;
/** While someone works, the browser renews the session at most this often, seconds (components/session-keeper.tsx). */
export const SESSION_UPDATE_AGE = 15 * 60;

// The worker-thread pool that runs the server's solves and renders (lib/server/pool.ts). Each can be
// set per instance in the environment (README, Deployment).

/** Threads: AXLEWRIGHT_POOL_THREADS, else one per core. Waiting tasks per thread: AXLEWRIGHT_POOL_QUEUE_PER_THREAD. */
export const POOL_QUEUE_PER_THREAD = 8;
/**
 * How far the pool's threads are lowered in priority (Linux nice, 0–19; AXLEWRIGHT_POOL_NICE): the
 * most, so pages, sign-ins and downloads on the event loop run first and the solves take the rest.
 */
export const POOL_NICE = 19;
/** A full queue answers 503 with this Retry-After, seconds. */
export const BUSY_RETRY_AFTER_S = 2;
/** Past its deadline a task gets this long to stop by itself before its thread is ended, ms. */
export const POOL_GRACE_MS = 1_000;
/** A render or file build without a deadline of its own (a PDF, a ZIP), ms. */
export const RENDER_DEADLINE_MS = 30_000;
/** Solve results kept on the main thread, bytes (AXLEWRIGHT_SOLVE_CACHE_MB). */
export const SOLVE_CACHE_BYTES = 64 * 1024 * 1024;
/** Solves and built cut jobs kept on each worker thread, bytes. */
export const WORKER_CACHE_BYTES = 64 * 1024 * 1024;
