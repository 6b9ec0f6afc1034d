import { sql } from "drizzle-orm";
import { NextResponse } from "next/server";
import { db } from "@/db";

// Public on purpose: start-up scripts and load balancers ask whether the app and its database answer.
// It says nothing about any data.
export async function GET() {
  try {
    await db.execute(sql`select 1`);
    return NextResponse.json({ ok: true });
  } catch {
    return NextResponse.json({ status: 503, message: "The database does not answer." }, { status: 503 });
  }
}
