// Reads what the app sent from the local mail sink (scripts/fakes/mail-sink.mjs) and takes each
// message apart here, independently of the code that built it: MIME multipart bodies split on their
// boundaries (RFC 2046 §5.1.1), parts decoded from base64 or quoted-printable (RFC 2045 §6.7, §6.8).
export interface SunkMessage {
  from: string | null;
  to: string[];
  subject: string;
  raw: string;
  receivedAt: string;
}

export interface MimePart {
  headers: Record<string, string>;
  body: Buffer;
}

const sinkUrl = () => `http://127.0.0.1:${process.env.MAIL_SINK_HTTP_PORT ?? 2536}/messages`;

export async function sunkMessages(): Promise<SunkMessage[]> {
  const res = await fetch(sinkUrl());
  if (!res.ok) throw new Error(`the mail sink answered ${res.status}`);
  return (await res.json()) as SunkMessage[];
}

/** Messages to this address whose subject matches, waiting briefly for SMTP to deliver them. */
export async function waitForMail(
  to: string,
  subject: RegExp,
  { count = 1, timeoutMs = 10_000 } = {},
): Promise<SunkMessage[]> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = (await sunkMessages()).filter((m) => m.to.includes(to) && subject.test(subjectOf(m)));
    if (found.length >= count || Date.now() > deadline) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
}

function splitHead(raw: string): { head: string; body: string } {
  const at = raw.search(/\r?\n\r?\n/);
  if (at < 0) return { head: raw, body: "" };
  const sep = raw.slice(at).match(/^\r?\n\r?\n/)![0];
  return { head: raw.slice(0, at), body: raw.slice(at + sep.length) };
}

function parseHeaders(head: string): Record<string, string> {
  const out: Record<string, string> = {};
  // Folded header lines continue with white space (RFC 5322 §2.2.3).
  for (const line of head.replace(/\r?\n[ \t]+/g, " ").split(/\r?\n/)) {
    const i = line.indexOf(":");
    if (i > 0) out[line.slice(0, i).trim().toLowerCase()] = line.slice(i + 1).trim();
  }
  return out;
}

function decodeQuotedPrintable(s: string): Buffer {
  const soft = s.replace(/=\r?\n/g, "");
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    if (soft[i] === "=" && /^[0-9A-F]{2}$/i.test(soft.slice(i + 1, i + 3))) {
      bytes.push(parseInt(soft.slice(i + 1, i + 3), 16));
      i += 2;
    } else bytes.push(...Buffer.from(soft[i], "utf8"));
  }
  return Buffer.from(bytes);
}

/** The subject as written, from the message's own (unfolded) header, encoded words decoded. */
export function subjectOf(m: SunkMessage): string {
  return decodeHeader(parseHeaders(splitHead(m.raw).head).subject ?? m.subject);
}

/** An encoded-word subject (RFC 2047) as text. */
export function decodeHeader(value: string): string {
  return value.replace(/=\?([^?]+)\?([BQ])\?([^?]*)\?=\s*/gi, (_m, _cs, enc: string, text: string) =>
    enc.toUpperCase() === "B"
      ? Buffer.from(text, "base64").toString("utf8")
      : decodeQuotedPrintable(text.replace(/_/g, " ")).toString("utf8"),
  );
}

/** Every leaf part of a message, multiparts opened recursively. */
export function mimeParts(raw: string): MimePart[] {
  const { head, body } = splitHead(raw);
  const headers = parseHeaders(head);
  const type = headers["content-type"] ?? "text/plain";
  const boundary = /boundary="?([^";]+)"?/i.exec(type)?.[1];
  if (/^multipart\//i.test(type) && boundary) {
    const pieces = body.split(
      new RegExp(`\\r?\\n?--${boundary.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}(?:--)?\\r?\\n?`),
    );
    return pieces.filter((p) => p.trim() !== "").flatMap((p) => (/^[\w-]+:/.test(p) ? mimeParts(p) : []));
  }
  const encoding = (headers["content-transfer-encoding"] ?? "7bit").toLowerCase();
  const bytes =
    encoding === "base64"
      ? Buffer.from(body.replace(/\s+/g, ""), "base64")
      : encoding === "quoted-printable"
        ? decodeQuotedPrintable(body)
        : Buffer.from(body, "utf8");
  return [{ headers, body: bytes }];
}

export function partOfType(parts: MimePart[], type: RegExp): MimePart | undefined {
  return parts.find((p) => type.test(p.headers["content-type"] ?? ""));
}
