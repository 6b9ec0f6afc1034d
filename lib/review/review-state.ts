// Plain facts about a review that pages, routes and the server all read the same way.

/** Modes whose mock-up lays out a run: the track modes, and twin wheels (their track runs between them). A partner pair turns on fixed axles. */
export function showsRun(mode: string): boolean {
  return mode !== "partner-wheel";
}

export function reviewStatus(r: {
  decision: { decision: "approve" | "request-changes" } | null;
}): "open" | "approved" | "changes-requested" {
  return !r.decision ? "open" : r.decision.decision === "approve" ? "approved" : "changes-requested";
}
