/** A local stand-in for S3 on loopback (s3rver), with the photo bucket made on start. */
import fs from "node:fs";
import S3rver from "s3rver";

export interface FakeS3 {
  endpoint: string;
  stop(): Promise<void>;
}

export async function startFakeS3({ port, dir, bucket }: { port: number; dir: string; bucket: string }): Promise<FakeS3> {
  fs.mkdirSync(dir, { recursive: true });
  const server = new S3rver({ port, address: "127.0.0.1", directory: dir, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
  await server.run();
  return { endpoint: `http://127.0.0.1:${port}`, stop: () => server.close() };
}
