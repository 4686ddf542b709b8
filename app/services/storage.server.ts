import { GetObjectCommand, PutObjectCommand, S3Client } from "@aws-sdk/client-s3";
import { env } from "./env.server";

let client: S3Client | undefined;

function s3(): S3Client {
  const e = env();
  return (client ??= new S3Client({
    region: e.S3_REGION,
    endpoint: e.S3_ENDPOINT,
    forcePathStyle: !!e.S3_ENDPOINT,
    credentials: { accessKeyId: e.S3_ACCESS_KEY_ID, secretAccessKey: e.S3_SECRET_ACCESS_KEY },
    // With the SDK's default checksums, streamed uploads to the local fake are stored with their chunk framing.
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
  }));
}

export async function putObject(key: string, body: Uint8Array, contentType: string): Promise<void> {
  await s3().send(new PutObjectCommand({ Bucket: env().S3_BUCKET, Key: key, Body: body, ContentType: contentType }));
}

export async function getObject(key: string): Promise<{ body: ReadableStream; contentType: string; length?: number }> {
  const out = await s3().send(new GetObjectCommand({ Bucket: env().S3_BUCKET, Key: key }));
  return { body: out.Body!.transformToWebStream(), contentType: out.ContentType ?? "application/octet-stream", length: out.ContentLength };
}
