import "server-only";
// The review e-mails: a request to the client (with the animated preview inline and a link to the
// review), and the decision back to the shop. Plain text first, HTML as the alternative
// (multipart/alternative, RFC 2046 §5.1.4); the picture is a related part referred to by cid
// (RFC 2392), so it shows without the mail client fetching anything.
import type { MailMessage } from "./mail";

const PREVIEW_CID = "rolling-preview@axlewright";

interface Person {
  name: string;
  email: string;
}

export interface PreviewImage {
  data: Buffer;
  contentType: string;
  width: number;
  height: number;
}

function escapeHtml(s: string): string {
  return s
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#39;");
}

const paragraphs = (s: string) =>
  escapeHtml(s)
    .split(/\n{2,}/)
    .map((p) => `<p>${p.replace(/\n/g, "<br>")}</p>`)
    .join("");

function page(body: string): string {
  return `<!doctype html><html><body style="margin:0;background:#f6f0e1;color:#1d3557;font-family:Helvetica,Arial,sans-serif;font-size:15px;line-height:1.5"><div style="max-width:620px;margin:0 auto;padding:20px">${body}<p style="color:#6b6658;font-size:12px;margin-top:28px">Sent by Axlewright for the shop building your piece. Figures are engineering estimates; anything people ride or touch is checked against local codes by the authority having jurisdiction and a licensed engineer.</p></div></body></html>`;
}

export function reviewRequestMail(m: {
  to: Person;
  from: string;
  project: string;
  design: string;
  revision: number;
  message: string;
  link: string;
  deposit: string | null;
  preview: PreviewImage | null;
}): MailMessage & { to: string } {
  const what = `${m.design}, revision ${m.revision}`;
  const depositLine = m.deposit
    ? `A deposit of ${m.deposit} is due when you approve; the review page takes you to pay it.`
    : "";
  const text = [
    `Hello ${m.to.name},`,
    "",
    `${m.from} asks you to review ${what}, for ${m.project}.`,
    "",
    ...m.message.split("\n").map((l) => `> ${l}`),
    "",
    `Open the review: ${m.link}`,
    "",
    "There you can watch the piece roll at its real size beside a person for scale, read the key figures, comment on any place along the run, and approve this revision for fabrication or ask for changes.",
    ...(depositLine ? ["", depositLine] : []),
    ...(m.preview ? ["", "The picture in this message shows the piece rolling."] : []),
  ].join("\n");
  const img = m.preview
    ? `<p><a href="${escapeHtml(m.link)}"><img src="cid:${PREVIEW_CID}" width="${m.preview.width}" height="${m.preview.height}" alt="${escapeHtml(`${m.design} rolling`)}" style="max-width:100%;height:auto;border:1px solid #d8cfb8;border-radius:4px"></a></p>`
    : "";
  const html = page(
    `<h1 style="font-size:20px;margin:0 0 12px">Please review ${escapeHtml(what)}</h1>` +
      `<p>Hello ${escapeHtml(m.to.name)},</p><p>${escapeHtml(m.from)} asks you to review <strong>${escapeHtml(what)}</strong>, for ${escapeHtml(m.project)}.</p>` +
      `<blockquote style="margin:12px 0;padding:8px 12px;border-left:3px solid #1d3557;background:#fffaf0">${paragraphs(m.message)}</blockquote>` +
      img +
      `<p><a href="${escapeHtml(m.link)}" style="display:inline-block;background:#1d3557;color:#f6f0e1;padding:10px 16px;border-radius:4px;text-decoration:none;font-weight:bold">Open the review</a></p>` +
      `<p style="font-size:13px">Or paste this address into your browser: ${escapeHtml(m.link)}</p>` +
      (depositLine ? `<p>${escapeHtml(depositLine)}</p>` : ""),
  );
  return {
    to: m.to.email,
    subject: `Review requested: ${m.project} — ${m.design} R${m.revision}`,
    text,
    html,
    attachments: m.preview
      ? [
          {
            filename: `${m.design.replace(/[^A-Za-z0-9]+/g, "-").toLowerCase() || "design"}-r${m.revision}-rolling.${m.preview.contentType === "image/gif" ? "gif" : "webp"}`,
            content: m.preview.data,
            contentType: m.preview.contentType,
            cid: PREVIEW_CID,
          },
        ]
      : [],
  };
}

export function reviewDecidedMail(m: {
  to: Person;
  project: string;
  design: string;
  revision: number;
  decision: "approve" | "request-changes";
  by: string;
  reference: string;
  signedAt: string;
  comment: string | null;
  link: string;
}): MailMessage & { to: string } {
  const approved = m.decision === "approve";
  const what = `${m.design} R${m.revision}`;
  const headline = approved ? `${m.by} approved ${what} for fabrication.` : `${m.by} asked for changes to ${what}.`;
  const when = new Date(m.signedAt).toISOString().replace("T", " ").slice(0, 19) + " UTC";
  const text = [
    `Hello ${m.to.name},`,
    "",
    headline,
    "",
    ...(approved
      ? [`Approval reference: ${m.reference} (signed ${when})`, "Cut files of this revision now carry the reference."]
      : [`Saved ${when}. A new revision, sent for review again, is needed.`]),
    ...(m.comment ? ["", "Their comment:", ...m.comment.split("\n").map((l) => `> ${l}`)] : []),
    "",
    `The review: ${m.link}`,
  ].join("\n");
  const html = page(
    `<h1 style="font-size:20px;margin:0 0 12px">${approved ? "Approved" : "Changes requested"}: ${escapeHtml(what)}</h1>` +
      `<p>Hello ${escapeHtml(m.to.name)},</p><p>${escapeHtml(headline)}</p>` +
      (approved
        ? `<p>Approval reference: <code>${escapeHtml(m.reference)}</code> (signed ${escapeHtml(when)}).</p>`
        : `<p>A new revision, sent for review again, is needed.</p>`) +
      (m.comment
        ? `<blockquote style="margin:12px 0;padding:8px 12px;border-left:3px solid #1d3557;background:#fffaf0">${paragraphs(m.comment)}</blockquote>`
        : "") +
      `<p><a href="${escapeHtml(m.link)}">Open the review</a></p>`,
  );
  return {
    to: m.to.email,
    subject: `${approved ? "Approved" : "Changes requested"}: ${m.project} — ${what}`,
    text,
    html,
  };
}
