/**
 * A local stand-in for an SMTP provider: accepts every message on loopback and keeps it as
 * a JSON file (envelope + raw message) in a folder that the app's /admin/outbox reads.
 */
import fs from "node:fs";
import path from "node:path";
import { SMTPServer } from "smtp-server";

export interface FakeSmtp {
  url: string;
  dir: string;
  stop(): Promise<void>;
}

export async function startFakeSmtp({ port, dir }: { port: number; dir: string }): Promise<FakeSmtp> {
  fs.mkdirSync(dir, { recursive: true });
  let n = 0;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on("data", (c: Buffer) => chunks.push(c));
      stream.on("end", () => {
        const record = {
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
          to: session.envelope.rcptTo.map((r) => r.address),
          raw: Buffer.concat(chunks).toString("utf8"),
        };
        const name = `${Date.now()}-${String(++n).padStart(4, "0")}.json`;
        fs.writeFileSync(path.join(dir, name), JSON.stringify(record));
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  return {
    url: `smtp://127.0.0.1:${port}`,
    dir,
    stop: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
