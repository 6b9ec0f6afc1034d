import "server-only";
import { eq } from "drizzle-orm";
import type { db } from "@/db";
import { organisations } from "@/db/schema";

type Tx = Parameters<Parameters<typeof db.transaction>[0]>[0] | typeof db;

/** The client organisation with this name, created when it is new; null for an empty name. */
export async function clientOrganisationId(tx: Tx, name: string | undefined): Promise<number | null> {
  if (!name) return null;
  const [found] = await tx
    .select({ id: organisations.id })
    .from(organisations)
    .where(eq(organisations.name, name))
    .limit(1);
  if (found) return found.id;
  const [res] = await tx.insert(organisations).values({ name, kind: "client" });
  return res.insertId;
}
