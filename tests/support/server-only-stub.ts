// Vitest runs server modules outside Next, where the real "server-only" marker would throw on import.
export {};
