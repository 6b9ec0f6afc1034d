// A local stand-in for the mail service: an SMTP server on loopback that keeps what it receives in
// memory and lists it as JSON over HTTP (GET /messages, DELETE /messages), for development and tests.
import http from "node:http";
import { SMTPServer } from "smtp-server";

const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const httpPort = Number(process.env.MAIL_SINK_HTTP_PORT ?? 2526);
const MAX_MESSAGES = 500;
const MAX_BYTES = 5 * 1024 * 1024;
let messages = [];

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  size: MAX_BYTES,
  onData(stream, session, callback) {
    const chunks = [];
    stream.on("data", (c) => chunks.push(c));
    stream.on("end", () => {
      const raw = Buffer.concat(chunks).toString("utf8");
      const subject = /^Subject: (.*)$/im.exec(raw)?.[1] ?? "";
      messages.push({
        from: session.envelope.mailFrom?.address ?? null,
        to: session.envelope.rcptTo.map((r) => r.address),
        subject,
        raw,
        receivedAt: new Date().toISOString(),
      });
      if (messages.length > MAX_MESSAGES) messages = messages.slice(-MAX_MESSAGES);
      callback();
    });
  },
});
smtp.listen(smtpPort, "127.0.0.1");

http
  .createServer((req, res) => {
    if (req.url === "/messages" && req.method === "GET") {
      res.writeHead(200, { "content-type": "application/json" });
      res.end(JSON.stringify(messages));
    } else if (req.url === "/messages" && req.method === "DELETE") {
      messages = [];
      res.writeHead(204).end();
    } else {
      res.writeHead(404).end();
    }
  })
  .listen(httpPort, "127.0.0.1");

const stop = () => smtp.close(() => process.exit(0));
process.on("SIGTERM", stop);
process.on("SIGINT", stop);
