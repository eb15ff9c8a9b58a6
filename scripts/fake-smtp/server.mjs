#!/usr/bin/env node
// Local SMTP fake for development and tests: accepts every message on 127.0.0.1:SMTP_PORT (no TLS,
// no auth), parses it with mailparser and keeps it as JSON in FAKE_SMTP_DIR. A small HTTP API on
// SMTP_API_PORT lets tests and the dev outbox page read what was "sent":
//   GET /_fake/health            { service: "fake-smtp" }
//   GET /messages?to=&limit=     newest first (limit 1-200, default 50)
//   GET /messages/<id>           one message
//   DELETE /messages             forget them all
import http from "node:http";
import { simpleParser } from "mailparser";
import { SMTPServer } from "smtp-server";
import { loadConfig } from "./config.mjs";
import { MailStore } from "./store.mjs";

const config = loadConfig();
const store = new MailStore(config.dir);
const log = (message) => console.log(`${new Date().toISOString()} ${message}`);

const smtp = new SMTPServer({
  secure: false,
  authOptional: true,
  disabledCommands: ["STARTTLS", "AUTH"],
  size: 10 * 1024 * 1024,
  banner: "Presswright local SMTP fake",
  onData(stream, session, callback) {
    simpleParser(stream)
      .then(async (mail) => {
        const id = await store.save({
          receivedAt: new Date().toISOString(),
          envelope: { from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null, to: session.envelope.rcptTo.map((r) => r.address) },
          messageId: mail.messageId ?? null,
          from: mail.from?.text ?? null,
          to: mail.to ? [mail.to].flat().map((a) => a.text).join(", ") : null,
          subject: mail.subject ?? "",
          text: mail.text ?? "",
          html: typeof mail.html === "string" ? mail.html : "",
          attachments: (mail.attachments ?? []).map((a) => ({
            filename: a.filename ?? null,
            contentType: a.contentType,
            size: a.size,
            // Small text attachments (calendar files) are kept readable for tests; others by size only.
            content: a.contentType?.startsWith("text/") && a.size <= 64 * 1024 ? a.content.toString("utf8") : null,
          })),
        });
        log(`stored ${id} for ${session.envelope.rcptTo.map((r) => r.address).join(", ")}`);
        callback();
      })
      .catch((error) => {
        log(`could not parse a message: ${error.message}`);
        callback(error);
      });
  },
});

function send(res, status, body) {
  res.writeHead(status, { "content-type": "application/json", "cache-control": "no-store" });
  res.end(JSON.stringify(body));
}

const api = http.createServer((req, res) => {
  const url = new URL(req.url ?? "/", "http://fake");
  const parts = url.pathname.split("/").filter(Boolean);
  const handle = async () => {
    if (req.method === "GET" && url.pathname === "/_fake/health") return send(res, 200, { service: "fake-smtp", smtpPort: config.smtpPort });
    if (req.method === "GET" && url.pathname === "/messages") {
      const limit = Math.min(200, Math.max(1, Number(url.searchParams.get("limit")) || 50));
      return send(res, 200, { messages: await store.list({ to: url.searchParams.get("to"), limit }) });
    }
    if (req.method === "GET" && parts[0] === "messages" && parts.length === 2) {
      const message = await store.get(parts[1]);
      return message ? send(res, 200, message) : send(res, 404, { error: "No such message" });
    }
    if (req.method === "DELETE" && url.pathname === "/messages") {
      await store.clear();
      return send(res, 200, { ok: true });
    }
    return send(res, 404, { error: "Not found" });
  };
  handle().catch((error) => {
    log(`api error: ${error.stack ?? error}`);
    send(res, 500, { error: "Internal error in the SMTP fake" });
  });
});

function listen(server, port) {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve((server.server ?? server).address().port));
  });
}

await store.init();
const smtpPort = await listen(smtp, config.smtpPort);
const apiPort = await listen(api, config.apiPort);
log(`fake-smtp ready: SMTP on 127.0.0.1:${smtpPort}, messages API on http://127.0.0.1:${apiPort} (files in ${config.dir})`);

for (const signal of ["SIGTERM", "SIGINT"]) {
  process.on(signal, () => {
    smtp.close(() => api.close(() => process.exit(0)));
    setTimeout(() => process.exit(0), 2000).unref();
  });
}
