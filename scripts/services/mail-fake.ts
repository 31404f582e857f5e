// Local mail fake: an SMTP server on loopback that keeps every message it accepts, plus a small
// HTTP API to read them back (tests, the admin outbox page). POST /control {"refuse": true}
// makes it refuse mail with a temporary error, so retry paths can be exercised for real.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import { createServer } from "node:http";
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { randomUUID } from "node:crypto";

const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const httpPort = Number(process.env.MAIL_HTTP_PORT ?? 8025);
const dir = process.env.MAIL_DIR ?? ".data/mail";
mkdirSync(dir, { recursive: true });
let refuse = false;

type Stored = { id: string; receivedAt: string; from: string; to: string[]; subject: string; text: string; html: string };

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  onRcptTo(_address, _session, cb) {
    if (refuse) return cb(Object.assign(new Error("Mail fake is refusing mail (test mode)"), { responseCode: 451 }));
    cb();
  },
  onData(stream, session, cb) {
    simpleParser(stream).then((mail) => {
      const msg: Stored = {
        id: `${Date.now()}-${randomUUID().slice(0, 8)}`,
        receivedAt: new Date().toISOString(),
        from: session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
        to: session.envelope.rcptTo.map((r) => r.address),
        subject: mail.subject ?? "",
        text: mail.text ?? "",
        html: typeof mail.html === "string" ? mail.html : "",
      };
      writeFileSync(path.join(dir, `${msg.id}.json`), JSON.stringify(msg));
      cb();
    }, cb);
  },
});

function listMessages(): Stored[] {
  return readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .sort()
    .map((f) => JSON.parse(readFileSync(path.join(dir, f), "utf8")) as Stored);
}

const http = createServer((req, res) => {
  const send = (status: number, body: unknown) => {
    res.writeHead(status, { "content-type": "application/json" });
    res.end(JSON.stringify(body));
  };
  if (req.method === "GET" && req.url?.startsWith("/messages")) return send(200, listMessages());
  if (req.method === "DELETE" && req.url === "/messages") {
    for (const f of readdirSync(dir)) rmSync(path.join(dir, f));
    return send(200, { ok: true });
  }
  if (req.method === "POST" && req.url === "/control") {
    let body = "";
    req.on("data", (c) => (body += c));
    req.on("end", () => {
      try {
        refuse = Boolean(JSON.parse(body || "{}").refuse);
        send(200, { refuse });
      } catch {
        send(400, { error: 'body must be JSON like {"refuse": true}' });
      }
    });
    return;
  }
  if (req.method === "GET" && req.url === "/health") return send(200, { ok: true, refuse });
  send(404, { error: "not found" });
});

smtp.listen(smtpPort, "127.0.0.1", () => {
  http.listen(httpPort, "127.0.0.1", () =>
    console.log(`mail fake: SMTP 127.0.0.1:${smtpPort}, messages at http://127.0.0.1:${httpPort}/messages`),
  );
});
smtp.on("error", (err) => {
  console.error(`mail fake SMTP error: ${err.message}`);
  process.exit(1);
});
for (const sig of ["SIGINT", "SIGTERM"] as const) process.on(sig, () => smtp.close(() => process.exit(0)));
