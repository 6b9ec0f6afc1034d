// MariaDB refuses a row that repeats a unique key with ER_DUP_ENTRY (error 1062, "Duplicate entry");
// Drizzle wraps the driver's error, so the code sits on the error or on its `cause`.
export function isDuplicateKey(error: unknown): boolean {
  const e = error as { code?: string; cause?: { code?: string } } | null;
  return e?.code === "ER_DUP_ENTRY" || e?.cause?.code === "ER_DUP_ENTRY";
}
