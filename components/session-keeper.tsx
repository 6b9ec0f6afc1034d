"use client";
// Keeps the session alive while someone works: on a key press, a click or a touch, at most once per
// SESSION_UPDATE_AGE, it asks Auth.js for the session, which re-signs the token with a fresh expiry
// (Auth.js's own renewal, GET /api/auth/session). Someone who walks away is signed out
// SESSION_MAX_AGE after their last renewal; someone who signed out stays out (auth.ts).
import { useEffect } from "react";
import { SESSION_UPDATE_AGE } from "@/lib/validation/limits";

export function SessionKeeper() {
  useEffect(() => {
    let last = Date.now();
    const renew = () => {
      if (Date.now() - last < SESSION_UPDATE_AGE * 1000) return;
      last = Date.now();
      void fetch("/api/auth/session", { cache: "no-store", credentials: "same-origin" }).catch(() => undefined);
    };
    const events = ["keydown", "pointerdown", "touchstart"] as const;
    for (const e of events) window.addEventListener(e, renew, { passive: true });
    return () => {
      for (const e of events) window.removeEventListener(e, renew);
    };
  }, []);
  return null;
}
