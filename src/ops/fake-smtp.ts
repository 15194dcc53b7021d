/**
 * The local mail catcher for development and tests: an SMTP server on
 * loopback that accepts every message and stores it in the `captured_mail`
 * table, where the dev-only mail page and the tests read it. A real provider
 * replaces it by setting SMTP_URL; nothing else changes.
 */
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import { Pool } from "pg";

const portArg = process.argv.indexOf("--port");
const port = Number(portArg > 0 ? process.argv[portArg + 1] : (process.env.HETEROLANE_SMTP_PORT ?? 2525));
const url = process.env.DATABASE_URL;
if (!url) {
  console.error("[mail] DATABASE_URL is not set");
  process.exit(1);
}
const pool = new Pool({ connectionString: url, max: 2 });
pool.on("error", (err) => console.error("[mail] db error:", err.message));

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  logger: false,
  onData(stream, session, callback) {
    simpleParser(stream)
      .then(async (mail) => {
        const to = session.envelope.rcptTo.map((r) => r.address.toLowerCase());
        await pool.query(
          `insert into captured_mail (recipients, sender, subject, text, html) values ($1, $2, $3, $4, $5)`,
          [
            to,
            session.envelope.mailFrom ? session.envelope.mailFrom.address : "",
            mail.subject ?? "",
            mail.text ?? "",
            typeof mail.html === "string" ? mail.html : "",
          ],
        );
        callback();
      })
      .catch((err: Error) => {
        console.error("[mail] could not store message:", err.message);
        callback(err);
      });
  },
});

server.listen(port, "127.0.0.1", () => {
  console.log(`[mail] catching SMTP on 127.0.0.1:${port}`);
});

function stop() {
  server.close(() => {
    void pool.end().then(() => process.exit(0));
  });
}
process.on("SIGINT", stop);
process.on("SIGTERM", stop);
