/**
 * Everything the app needs on one machine, on loopback: a private MariaDB (unless
 * DATABASE_URL is given), a fake SMTP server and a fake S3. Used by `npm start` and the tests.
 */
import path from "node:path";
import { startLocalMariadb, type LocalMariadb } from "../db/local-mariadb";
import { startFakeS3 } from "./fakes/s3";
import { startFakeSmtp } from "./fakes/smtp";

export interface LocalServices {
  env: Record<string, string>;
  ownDatabase: boolean;
  /** The private MariaDB's root socket, when it is ours. */
  dbSocket?: string;
  stop(): Promise<void>;
}

export async function startLocalServices(opts: {
  dataDir: string;
  database: string;
  dbPort: number;
  smtpPort: number;
  s3Port: number;
  databaseUrl?: string;
  log?: (line: string) => void;
}): Promise<LocalServices> {
  const bucket = "tankside-photos";
  let mariadb: LocalMariadb | undefined;
  if (!opts.databaseUrl) {
    mariadb = await startLocalMariadb({ dir: path.join(opts.dataDir, "mariadb"), port: opts.dbPort, database: opts.database, log: opts.log });
  }
  const smtp = await startFakeSmtp({ port: opts.smtpPort, dir: path.join(opts.dataDir, "outbox") });
  const s3 = await startFakeS3({ port: opts.s3Port, dir: path.join(opts.dataDir, "s3"), bucket });
  return {
    ownDatabase: !!mariadb,
    dbSocket: mariadb?.socketPath,
    env: {
      DATABASE_URL: opts.databaseUrl ?? mariadb!.url,
      SMTP_URL: smtp.url,
      MAIL_OUTBOX_DIR: smtp.dir,
      S3_ENDPOINT: s3.endpoint,
      S3_BUCKET: bucket,
      S3_ACCESS_KEY_ID: "S3RVER",
      S3_SECRET_ACCESS_KEY: "S3RVER",
    },
    async stop() {
      await Promise.allSettled([smtp.stop(), s3.stop()]);
      await mariadb?.stop();
    },
  };
}
