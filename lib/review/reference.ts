// The short reference of a sign-off that every later file carries: the first 12 hex digits of the
// signed spec hash (48 bits of SHA-256, FIPS 180-4) and the UTC date of signing, e.g.
// "3f9a1c0d2b4e/2026-12-02". Short enough to engrave or read over the phone, and it still names the
// exact spec: the full hash sits in the sign-off record.
export interface SignedRef {
  specHash: string;
  signedAt: string | Date;
}

export function approvalReference(s: SignedRef): string {
  const when = typeof s.signedAt === "string" ? new Date(s.signedAt) : s.signedAt;
  return `${s.specHash.slice(0, 12)}/${when.toISOString().slice(0, 10)}`;
}

export interface ApprovalStamp {
  reference: string;
  revision: number;
  typedName: string;
  organisation: string | null;
  signedAt: string;
}

export const NOT_APPROVED = "NOT APPROVED — FOR REVIEW ONLY";
/** The same in plain ASCII, for DXF text (older readers mangle the dash). */
export const NOT_APPROVED_ASCII = "NOT APPROVED - FOR REVIEW ONLY";

/** One line for a file: the approval, or the not-approved mark. */
export function approvalLine(stamp: ApprovalStamp | null, opts: { ascii?: boolean } = {}): string {
  if (!stamp) return opts.ascii ? NOT_APPROVED_ASCII : NOT_APPROVED;
  const by = `${stamp.typedName}${stamp.organisation ? `, ${stamp.organisation}` : ""}`;
  return `APPROVED R${stamp.revision} ${stamp.reference} by ${opts.ascii ? asciiOnly(by) : by}`;
}

function asciiOnly(s: string): string {
  return s
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[^\x20-\x7e]/g, "?");
}
