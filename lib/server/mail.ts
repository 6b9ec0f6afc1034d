import "server-only";
// Outgoing mail through nodemailer's SMTP transport: the local mail sink on loopback in development
// and tests, the shop's mail service in production (same settings, other host).
import nodemailer from "nodemailer";

let transport: nodemailer.Transporter | undefined;

function getTransport() {
  transport ??= nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? "127.0.0.1",
    port: Number(process.env.SMTP_PORT ?? 2525),
    secure: false,
    ignoreTLS: process.env.SMTP_HOST === "127.0.0.1",
    ...(process.env.SMTP_USER ? { auth: { user: process.env.SMTP_USER, pass: process.env.SMTP_PASSWORD } } : {}),
  });
  return transport;
}

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  /** An HTML alternative to the text; images in it are attachments referred to by `cid:`. */
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string; cid?: string }[];
}

/** Sends a message. A mail failure is logged and does not undo the change that caused it. */
export async function sendMail(message: MailMessage): Promise<boolean> {
  try {
    await getTransport().sendMail({ from: process.env.MAIL_FROM ?? "Axlewright <no-reply@example.test>", ...message });
    return true;
  } catch (error) {
    console.error("[axlewright] mail not sent:", error instanceof Error ? error.message : error);
    return false;
  }
}
