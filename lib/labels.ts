// The words people see for the database's enum values (roles, machine kinds): one home, so a form,
// a table and a badge never show the raw value.
import type { MemberRole } from "@/db/schema";

export const ROLE_LABELS = {
  admin: "Admin",
  fabricator: "Fabricator",
  client: "Client",
  installer: "Installer",
} as const;
export const MACHINE_KIND_LABELS = {
  router: "CNC router",
  laser: "Laser",
  waterjet: "Waterjet",
  plasma: "Plasma",
} as const;
export const MATERIAL_KIND_LABELS = { sheet: "A sheet parts are cut from", tread: "A tread on a wheel's rim" } as const;

export const roleLabel = (role: keyof typeof ROLE_LABELS) => ROLE_LABELS[role];
export const machineKindLabel = (kind: keyof typeof MACHINE_KIND_LABELS) => MACHINE_KIND_LABELS[kind];

/** Select options for a list of roles, in the order given. */
export const roleOptions = (roles: ReadonlyArray<keyof typeof ROLE_LABELS>) =>
  roles.map((value) => ({ value, label: ROLE_LABELS[value] }));
export const MEMBER_ROLE_ORDER: MemberRole[] = ["fabricator", "client", "installer"];
