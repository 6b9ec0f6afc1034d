// The signed-in user as the data layer takes it: who makes a change (audit rows, authorship) and
// whose projects a list shows. lib/server/dal.ts reads it from the session; queries only receive it.
import type { UserRole } from "@/db/schema";

export interface CurrentUser {
  id: number;
  email: string;
  name: string;
  role: UserRole;
}
